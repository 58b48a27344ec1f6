using BenchRunner.Core.Diagnostics;
using BenchRunner.Daemon.Inbox;

namespace BenchRunner.Daemon.Tests.Inbox;

public sealed class PlanFilerTests
{
    [Fact]
    public void FileAsDone_NameAlreadyUsed_NumbersTheNewOneAndWritesItsSummaryBeside()
    {
        using var dir = new TempDirectory();
        var done = Directory.CreateDirectory(dir.PathOf("done")).FullName;
        File.WriteAllText(Path.Combine(done, "board.yaml"), "earlier");
        var plan = dir.Write("board.yaml", "plan: board\n");

        var filed = PlanFiler.FileAsDone(plan, done, "status: passed\n");

        Assert.Equal(Path.Combine(done, "board-2.yaml"), filed);
        Assert.Equal("plan: board\n", File.ReadAllText(filed));
        Assert.Equal("status: passed\n", File.ReadAllText(filed + PlanFiler.ResultSuffix));
        Assert.False(File.Exists(plan));
    }

    [Fact]
    public void FileAsRejected_NamesTheProblemsAtThePlansNewPlace()
    {
        using var dir = new TempDirectory();
        var rejected = Directory.CreateDirectory(dir.PathOf("rejected")).FullName;
        var plan = dir.Write("board.yaml", "plan: board\n");

        var filed = PlanFiler.FileAsRejected(plan, rejected, [new InputProblem(new SourceLocation(plan, 2, 3), "expected a mapping")]);

        Assert.Equal($"{filed}:2:3: expected a mapping\n", File.ReadAllText(filed + PlanFiler.ErrorsSuffix));
    }
}
