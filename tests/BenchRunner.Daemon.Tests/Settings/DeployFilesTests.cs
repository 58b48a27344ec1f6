using BenchRunner.Core.Diagnostics;
using BenchRunner.Daemon.Settings;

namespace BenchRunner.Daemon.Tests.Settings;

public sealed class DeployFilesTests
{
    [Fact]
    public void ExampleSettingsFile_ReadsWithoutProblems_AndStatesTheDefaults()
    {
        var problems = new List<InputProblem>();

        var content = SettingsFileReader.Read(RepositoryFiles.PathOf("deploy/daemon.yaml"), problems);

        Assert.Empty(problems);
        Assert.Equal(DaemonDefaults.Settle, content.Settle);
        Assert.Equal(DaemonDefaults.ScanEvery, content.ScanEvery);
        Assert.Equal(DaemonDefaults.StopWithin, content.StopWithin);
        Assert.Equal(DaemonDefaults.RetryFirst, content.RetryFirst);
        Assert.Equal(DaemonDefaults.RetryLongest, content.RetryLongest);
        Assert.Equal(DaemonDefaults.RunAttempts, content.RunAttempts);
        Assert.Equal(DaemonDefaults.Inbox, content.Values["inbox"].Text);
        var schedule = Assert.Single(content.Schedules);
        Assert.Equal(TimeSpan.FromHours(1), schedule.Every);
    }

    [Fact]
    public void SystemdUnit_IsOfTypeNotify_RunsAsItsOwnUserInDialout_AndWaitsLongerThanTheStopBound()
    {
        var unit = File.ReadAllLines(RepositoryFiles.PathOf("deploy/benchrunner.service"));

        Assert.Contains("Type=notify", unit);
        Assert.Contains("User=benchrunner", unit);
        Assert.Contains("SupplementaryGroups=dialout", unit);
        Assert.Contains("ProtectSystem=strict", unit);
        var stopSeconds = int.Parse(unit.Single(l => l.StartsWith("TimeoutStopSec=", StringComparison.Ordinal))["TimeoutStopSec=".Length..], System.Globalization.CultureInfo.InvariantCulture);
        Assert.True(TimeSpan.FromSeconds(stopSeconds) > DaemonDefaults.StopWithin + TimeSpan.FromSeconds(10));
    }
}
