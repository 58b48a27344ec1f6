using BenchRunner.Core.Diagnostics;

namespace BenchRunner.Core.Tests.Diagnostics;

public sealed class InputFileTests
{
    [Fact]
    public void ReadAllText_MissingFile_IsBadInputNamingThePath()
    {
        var path = Path.Combine(Path.GetTempPath(), "benchrunner-missing-" + Guid.NewGuid().ToString("N") + ".yaml");

        var ex = Assert.Throws<InputFormatException>(() => InputFile.ReadAllText(path));

        Assert.Equal(path, ex.Location.File);
        Assert.Equal(0, ex.Location.Line);
        Assert.Equal($"{path}: no such file", ex.Message);
    }

    [Fact]
    public void ReadAllText_Folder_IsBadInputSayingSo()
    {
        var ex = Assert.Throws<InputFormatException>(() => InputFile.ReadAllText(Path.GetTempPath()));

        Assert.Contains("folder", ex.Detail);
    }

    [Fact]
    public void ReadAllText_ExistingFile_ReturnsItsText()
    {
        var path = Path.GetTempFileName();
        try
        {
            File.WriteAllText(path, "mask: x\n");
            Assert.Equal("mask: x\n", InputFile.ReadAllText(path));
        }
        finally
        {
            File.Delete(path);
        }
    }
}
