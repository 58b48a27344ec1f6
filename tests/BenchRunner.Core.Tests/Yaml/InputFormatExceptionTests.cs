using BenchRunner.Core.Diagnostics;

namespace BenchRunner.Core.Tests.Yaml;

public class InputFormatExceptionTests
{
    [Fact]
    public void Constructor_OneProblem_HasItAsTheOnlyProblem()
    {
        var e = new InputFormatException(new SourceLocation("m.yaml", 3, 9), "expected a frequency");

        Assert.Equal("m.yaml:3:9: expected a frequency", e.Message);
        Assert.Equal(new InputProblem(new SourceLocation("m.yaml", 3, 9), "expected a frequency"), Assert.Single(e.Problems));
    }

    [Fact]
    public void Constructor_SeveralProblems_PutsOneLinePerProblemAndTheFirstInFront()
    {
        var e = new InputFormatException([new(new SourceLocation("p.yaml", 2, 1), "one"), new(new SourceLocation("p.yaml", 5, 3), "two")]);

        Assert.Equal("p.yaml:2:1: one\np.yaml:5:3: two", e.Message);
        Assert.Equal(new SourceLocation("p.yaml", 2, 1), e.Location);
        Assert.Equal("one", e.Detail);
        Assert.Equal(2, e.Problems.Count);
    }

    [Fact]
    public void Constructor_NoProblems_IsRefused()
    {
        Assert.Throws<ArgumentException>(() => new InputFormatException(Array.Empty<InputProblem>()));
    }
}
