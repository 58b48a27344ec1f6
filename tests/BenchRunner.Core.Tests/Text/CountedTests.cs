using BenchRunner.Core.Text;

namespace BenchRunner.Core.Tests.Text;

public sealed class CountedTests
{
    // English number agreement: singular for exactly one, plural for zero and for more than one
    // (common practice, no source).
    [Theory]
    [InlineData(0, "0 problems")]
    [InlineData(1, "1 problem")]
    [InlineData(2, "2 problems")]
    [InlineData(401, "401 problems")]
    public void Of_Count_AgreesWithTheNoun(long count, string expected) =>
        Assert.Equal(expected, Counted.Of(count, "problem"));

    [Fact]
    public void Of_IrregularPlural_UsesTheGivenPlural()
    {
        Assert.Equal("1 plan stays", Counted.Of(1, "plan stays", "plans stay"));
        Assert.Equal("3 plans stay", Counted.Of(3, "plan stays", "plans stay"));
    }

    [Fact]
    public void Noun_One_IsSingularAndOtherwisePlural()
    {
        Assert.Equal("sweep", Counted.Noun(1, "sweep"));
        Assert.Equal("sweeps", Counted.Noun(12, "sweep"));
    }

    [Fact]
    public void Of_BlankNoun_Throws() => Assert.Throws<ArgumentException>(() => Counted.Of(1, " "));
}
