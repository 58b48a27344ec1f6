using BenchRunner.Core.Figures;

namespace BenchRunner.Core.Tests.Figures;

public class FigureResultTests
{
    [Fact]
    public void Available_HoldsValue_AndNoReason()
    {
        var r = FigureResult<double>.Available(59.84);
        Assert.True(r.IsAvailable);
        Assert.Null(r.Reason);
        Assert.Equal(59.84, r.Value);
    }

    [Fact]
    public void Value_WhenUnavailable_ThrowsWithTheReason()
    {
        var r = FigureResult<double>.Unavailable("no crossing above the peak");
        Assert.False(r.IsAvailable);
        var ex = Assert.Throws<InvalidOperationException>(() => r.Value);
        Assert.Equal("no crossing above the peak", ex.Message);
    }

    [Fact]
    public void Default_IsUnavailable_SoAnUnsetFieldNeverReadsAsZero()
    {
        FigureResult<double> r = default;
        Assert.False(r.IsAvailable);
        Assert.False(string.IsNullOrWhiteSpace(r.Reason));
    }

    [Fact]
    public void Unavailable_EmptyReason_Throws()
    {
        Assert.Throws<ArgumentException>(() => FigureResult<double>.Unavailable(" "));
    }

    [Fact]
    public void SelectAndThen_PassTheReasonThrough()
    {
        var missing = FigureResult<double>.Unavailable("empty range");
        Assert.Equal("empty range", missing.Select(v => v * 2).Reason);
        Assert.Equal("empty range", missing.Then(v => FigureResult<int>.Available(1)).Reason);
        Assert.Equal(6.0, FigureResult<double>.Available(3).Select(v => v * 2).Value);
        Assert.Equal("too small", FigureResult<double>.Available(3).Then(_ => FigureResult<int>.Unavailable("too small")).Reason);
    }
}
