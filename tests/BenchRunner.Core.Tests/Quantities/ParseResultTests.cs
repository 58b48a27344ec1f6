using BenchRunner.Core.Quantities;

namespace BenchRunner.Core.Tests.Quantities;

public sealed class ParseResultTests
{
    [Fact]
    public void Default_IsNotASuccess()
    {
        ParseResult<Frequency> result = default;

        Assert.False(result.Success);
        Assert.NotNull(result.Error);
        Assert.Throws<InvalidOperationException>(() => result.Value);
    }

    [Fact]
    public void Ok_CarriesTheValue_AndFailCarriesTheMessage()
    {
        var ok = ParseResult<int>.Ok(7);
        var fail = ParseResult<int>.Fail("expected a number");

        Assert.True(ok.Success);
        Assert.Equal(7, ok.Value);
        Assert.Null(ok.Error);
        Assert.False(fail.Success);
        Assert.Equal("expected a number", fail.Error);
        Assert.Equal("expected a number", Assert.Throws<FormatException>(() => fail.GetValueOrThrow()).Message);
        Assert.Equal(14, ok.Select(v => v * 2).Value);
        Assert.Equal("expected a number", fail.Select(v => v * 2).Error);
    }
}
