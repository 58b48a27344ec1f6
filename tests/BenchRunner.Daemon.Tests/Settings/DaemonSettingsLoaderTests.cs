using BenchRunner.Core.Diagnostics;
using BenchRunner.Daemon.Settings;
using Microsoft.Extensions.Logging;

namespace BenchRunner.Daemon.Tests.Settings;

public sealed class DaemonSettingsLoaderTests
{
    private static readonly Dictionary<string, string> NoEnvironment = [];

    private static string Bench => RepositoryFiles.Example("bench-virtual.yaml");

    [Fact]
    public void Load_OnlyABench_PutsEveryFolderUnderTheHomeFolderAndCreatesThem()
    {
        using var dir = new TempDirectory();

        var settings = DaemonSettingsLoader.Load(new CommandLineSettings { Bench = Bench, Home = "station" }, NoEnvironment, dir.Path);

        var home = dir.PathOf("station");
        Assert.Equal(home, settings.Home);
        Assert.Equal(Path.Combine(home, "inbox"), settings.InboxFolder);
        Assert.Equal(Path.Combine(home, "done"), settings.DoneFolder);
        Assert.Equal(Path.Combine(home, "rejected"), settings.RejectedFolder);
        Assert.Equal(Path.Combine(home, "results.db"), settings.DatabasePath);
        Assert.Equal(Path.Combine(home, "state", "daemon-status.json"), settings.StatusFile);
        Assert.True(Directory.Exists(settings.InboxFolder));
        Assert.True(Directory.Exists(settings.LogFolder));
        Assert.Equal(DaemonDefaults.StopWithin, settings.StopWithin);
        Assert.Empty(settings.Schedules);
    }

    [Fact]
    public void Load_AllThreeSources_TheCommandLineWinsOverTheEnvironmentWhichWinsOverTheFile()
    {
        using var dir = new TempDirectory();
        File.Copy(Bench, dir.PathOf("bench.yaml"));
        Directory.CreateDirectory(dir.PathOf("profiles"));
        foreach (var profile in Directory.GetFiles(RepositoryFiles.Example("profiles")))
        {
            File.Copy(profile, Path.Combine(dir.PathOf("profiles"), Path.GetFileName(profile)));
        }

        var file = dir.Write("daemon.yaml", """
            bench: bench.yaml
            inbox: from-file-inbox
            logs: from-file-logs
            log-level: warning
            timing:
              settle: 500 ms
              stop-within: 45 s
            instrument-retry:
              first: 2 s
              longest: 1 min
              runs: 5
            """);
        var environment = new Dictionary<string, string> { ["BENCHRUNNER_INBOX"] = "from-env-inbox", ["BENCHRUNNER_LOGS"] = "from-env-logs" };

        var settings = DaemonSettingsLoader.Load(new CommandLineSettings { SettingsFile = file, Inbox = "from-cli-inbox" }, environment, dir.Path);

        Assert.Equal(dir.PathOf("from-cli-inbox"), settings.InboxFolder);
        Assert.Equal(dir.PathOf("from-env-logs"), settings.LogFolder);
        Assert.Equal(dir.PathOf("bench.yaml"), settings.BenchPath);
        Assert.Equal(LogLevel.Warning, settings.LogLevel);
        Assert.Equal(TimeSpan.FromMilliseconds(500), settings.Settle);
        Assert.Equal(TimeSpan.FromSeconds(45), settings.StopWithin);
        Assert.Equal(TimeSpan.FromSeconds(2), settings.RetryFirst);
        Assert.Equal(TimeSpan.FromMinutes(1), settings.RetryLongest);
        Assert.Equal(5, settings.RunAttempts);
    }

    [Fact]
    public void Load_ProblemsInEverySource_AreReportedTogetherEachWithItsPlace()
    {
        using var dir = new TempDirectory();
        var file = dir.Write("daemon.yaml", $"""
            bench: {Bench}
            timing:
              settle: 2 parsecs
            colour: blue
            schedules:
              - plan: missing-plan.yaml
                every: 1 h
              - plan: also-missing.yaml
            """);
        var environment = new Dictionary<string, string> { ["BENCHRUNNER_LOG_LEVEL"] = "chatty" };

        var error = Assert.Throws<InputFormatException>(() => DaemonSettingsLoader.Load(
            new CommandLineSettings { SettingsFile = file, Schedules = ["hourly=plan.yaml"] }, environment, dir.Path));

        var lines = error.Problems.Select(p => p.ToString()).ToList();
        Assert.Contains(lines, l => l.StartsWith($"{file}:3:11: ", StringComparison.Ordinal) && l.Contains("parsecs", StringComparison.Ordinal));
        Assert.Contains(lines, l => l.StartsWith($"{file}:4:1: unknown key \"colour\"", StringComparison.Ordinal));
        Assert.Contains(lines, l => l.StartsWith($"{file}:8:5: missing key \"every\"", StringComparison.Ordinal));
        Assert.Contains(lines, l => l.StartsWith("environment BENCHRUNNER_LOG_LEVEL: unknown log level \"chatty\"", StringComparison.Ordinal));
        Assert.Contains(lines, l => l.StartsWith("command line --schedule hourly=plan.yaml: ", StringComparison.Ordinal));
        Assert.Contains(lines, l => l.Contains("missing-plan.yaml: no such file", StringComparison.Ordinal));
    }

    [Fact]
    public void Load_NoBenchAnywhere_SaysWhereOneCanBeGiven()
    {
        using var dir = new TempDirectory();

        var error = Assert.Throws<InputFormatException>(() => DaemonSettingsLoader.Load(new CommandLineSettings(), NoEnvironment, dir.Path));

        var problem = Assert.Single(error.Problems);
        Assert.Equal("command line", problem.Location.File);
        Assert.Contains("--bench", problem.Detail, StringComparison.Ordinal);
        Assert.Contains("BENCHRUNNER_BENCH", problem.Detail, StringComparison.Ordinal);
    }

    [Fact]
    public void Load_InboxAndDoneTheSameFolder_IsRefused()
    {
        using var dir = new TempDirectory();
        var file = dir.Write("daemon.yaml", $"bench: {Bench}\ninbox: plans\ndone: plans\n");

        var error = Assert.Throws<InputFormatException>(() => DaemonSettingsLoader.Load(new CommandLineSettings { SettingsFile = file }, NoEnvironment, dir.Path));

        Assert.Contains(error.Problems, p => p.Location == new SourceLocation(file, 3, 7) && p.Detail.Contains("is the inbox folder", StringComparison.Ordinal));
    }

    [Fact]
    public void Load_ScheduleOnTheCommandLine_RunsThePlanEveryIntervalWithThatAsItsTimeLimit()
    {
        using var dir = new TempDirectory();
        var plan = dir.Write("reference.yaml", Support.TestPlans.Vna("reference"));

        var settings = DaemonSettingsLoader.Load(new CommandLineSettings { Bench = Bench, Schedules = ["15 min=reference.yaml"] }, NoEnvironment, dir.Path);

        var schedule = Assert.Single(settings.Schedules);
        Assert.Equal("reference", schedule.Name);
        Assert.Equal(plan, schedule.PlanPath);
        Assert.Equal(TimeSpan.FromMinutes(15), schedule.Every);
        Assert.Equal(TimeSpan.FromMinutes(15), schedule.TimeLimit);
    }

    [Fact]
    public void Load_ScheduledPlanNeedingAnInstrumentTheBenchLacks_IsRefusedAtStart()
    {
        using var dir = new TempDirectory();
        dir.Write("scope.yaml", "plan: scope\nroles:\n  scope: network-analyser\nsteps:\n  - sweep:\n      role: scope\n      traces:\n        S21: passband\n");
        var file = dir.Write("daemon.yaml", $"bench: {Bench}\nschedules:\n  - plan: scope.yaml\n    every: 1 h\n    time-limit: 5 min\n");

        var error = Assert.Throws<InputFormatException>(() => DaemonSettingsLoader.Load(new CommandLineSettings { SettingsFile = file }, NoEnvironment, dir.Path));

        Assert.Contains(error.Problems, p => p.Location.File.EndsWith("scope.yaml", StringComparison.Ordinal) && p.Detail.Contains("has no instrument of that name", StringComparison.Ordinal));
    }
}
