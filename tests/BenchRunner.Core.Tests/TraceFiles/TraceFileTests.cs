using BenchRunner.Core.Diagnostics;
using BenchRunner.Core.Tests.Support;
using BenchRunner.Core.TraceFiles;
using BenchRunner.Core.Traces;

namespace BenchRunner.Core.Tests.TraceFiles;

public sealed class TraceFileTests : IDisposable
{
    private readonly TempDirectory _dir = new();

    public void Dispose() => _dir.Dispose();

    private static string Lines(params string[] lines) => string.Join("\n", lines) + "\n";

    [Theory]
    [InlineData("psf.s2p")]
    [InlineData("PSF.S2P")]
    public void Read_S2p_GivesFourSParameters(string name)
    {
        var path = _dir.Write(name, Lines("# MHz S DB R 50", "137.5 -30 0 -2.5 10 -2.5 10 -30 0"));

        var set = TraceFile.Read(path);

        Assert.Equal(4, set.Traces.Count);
        Assert.Equal(-2.5, set.Find(TraceQuantity.S21)!.LevelsDb[0], 12);
    }

    [Fact]
    public void Read_S1p_GivesS11()
    {
        var path = _dir.Write("load.s1p", Lines("# MHz S RI R 50", "137.5 0.1 0"));

        var set = TraceFile.Read(path);

        Assert.Equal(TraceQuantity.S11, Assert.Single(set.Traces).Quantity);
    }

    [Fact]
    public void Read_Ts_ReadsVersion2()
    {
        var path = _dir.Write("psf.ts", Lines(
            "[Version] 2.0", "# MHz S RI R 75", "[Number of Ports] 1", "[Number of Frequencies] 1", "[Network Data]", "137.5 0.2 0", "[End]"));

        var set = TraceFile.Read(path);

        Assert.Equal(75, set.ReferenceOhms);
        Assert.Single(set.Traces);
    }

    [Fact]
    public void Read_Csv_ReadsTheProjectLayout()
    {
        var path = _dir.Write("noise.csv", Lines("frequency_hz,power_dbm", "21400000,-97"));

        var set = TraceFile.Read(path);

        Assert.IsType<PowerTrace>(Assert.Single(set.Traces));
    }

    [Theory]
    [InlineData("psf.txt", "unknown trace file type (\".txt\"); expected .s1p, .s2p, .ts, .csv")]
    [InlineData("psf.s3p", "unknown trace file type (\".s3p\"); expected .s1p, .s2p, .ts, .csv")]
    [InlineData("psf", "unknown trace file type (no extension); expected .s1p, .s2p, .ts, .csv")]
    public void Read_UnknownExtension_ThrowsNamingTheFile(string name, string detail)
    {
        var path = _dir.Write(name, "");

        var ex = Assert.Throws<InputFormatException>(() => TraceFile.Read(path));

        Assert.Equal(SourceLocation.OfFile(path), ex.Location);
        Assert.Equal(detail, ex.Detail);
    }

    [Fact]
    public void Read_MissingFile_ThrowsFileNotFound()
    {
        var path = Path.Combine(_dir.Path, "psf-24-9999.s2p");

        var ex = Assert.Throws<InputFormatException>(() => TraceFile.Read(path));

        Assert.Equal(SourceLocation.OfFile(path), ex.Location);
        Assert.Equal("file not found", ex.Detail);
    }

    [Fact]
    public void Read_TsWithThreePorts_ThrowsBecauseASetHoldsTwo()
    {
        var path = _dir.Write("coupler.ts", Lines(
            "[Version] 2.0", "# Hz S RI R 50", "[Number of Ports] 3", "[Number of Frequencies] 1", "[Network Data]",
            "1 0 0 0 0 0 0", "0 0 0 0 0 0", "0 0 0 0 0 0", "[End]"));

        var ex = Assert.Throws<InputFormatException>(() => TraceFile.Read(path));

        Assert.Equal("the file has 3 ports; a trace set holds 1- or 2-port data", ex.Detail);
    }

    [Fact]
    public void Read_TsWithDifferentReferences_ThrowsBecauseASetHasOne()
    {
        var path = _dir.Write("pad.ts", Lines(
            "[Version] 2.0", "# Hz S RI R 50", "[Number of Ports] 2", "[Two-Port Data Order] 12_21", "[Number of Frequencies] 1",
            "[Reference] 50 75", "[Network Data]", "1 0 0 1 0 1 0 0 0", "[End]"));

        var ex = Assert.Throws<InputFormatException>(() => TraceFile.Read(path));

        Assert.Equal(SourceLocation.OfFile(path), ex.Location);
        Assert.Contains("different reference impedances (50, 75 ohms)", ex.Detail);
    }

    [Fact]
    public void Read_MalformedContent_ReportsLineAndColumn()
    {
        var path = _dir.Write("psf.s2p", Lines("# MHz S DB R 50", "137.5 -30 0 -2.5 1O -2.5 10 -30 0"));

        var ex = Assert.Throws<InputFormatException>(() => TraceFile.Read(path));

        Assert.Equal(new SourceLocation(path, 2, 18), ex.Location);
        Assert.Equal("expected a number, found \"1O\"", ex.Detail);
    }
}
