using BenchRunner.Execution.Batch;

namespace BenchRunner.Execution.Tests.Batch;

public sealed class BoardSerialTests
{
    [Theory]
    [InlineData("PSF-24-0001", "PSF-24-0001")]
    [InlineData("  PSF-24-0001\r", "PSF-24-0001")]
    [InlineData("psf/24#7", "psf/24#7")]
    public void TryRead_ScannedOrTypedSerial_IsTrimmed(string line, string expected)
    {
        Assert.True(BoardSerial.TryRead(line, out var serial, out var problem));
        Assert.Equal(expected, serial);
        Assert.Null(problem);
    }

    [Theory]
    [InlineData("", "empty")]
    [InlineData("   ", "empty")]
    [InlineData("PSF 24 0001", "no spaces")]
    [InlineData("PSF-24-\u00070001", "printable")]
    public void TryRead_NotASerial_SaysWhy(string line, string expected)
    {
        Assert.False(BoardSerial.TryRead(line, out var serial, out var problem));
        Assert.Null(serial);
        Assert.Contains(expected, problem);
    }

    [Fact]
    public void TryRead_TooLong_IsRefused()
    {
        Assert.False(BoardSerial.TryRead(new string('A', BoardSerial.MaxLength + 1), out _, out var problem));
        Assert.Contains($"at most {BoardSerial.MaxLength}", problem);
        Assert.True(BoardSerial.TryRead(new string('A', BoardSerial.MaxLength), out _, out _));
    }
}
