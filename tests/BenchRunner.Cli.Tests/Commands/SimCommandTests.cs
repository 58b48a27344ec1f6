using System.Text.Json;
using BenchRunner.Cli.Tests.Support;

namespace BenchRunner.Cli.Tests.Commands;

public sealed class SimCommandTests
{
    [Fact]
    public async Task Sim_ServesEveryInstrumentInBothDialects_ReachableWhileItRuns()
    {
        var output = new StringWriter();
        var synchronizedOut = TextWriter.Synchronized(output);
        var serving = Task.Run(() => CliApplication.Run(["sim", "--tcp", "0", "--duration", "4 s", "--json"], new CliConsole(synchronizedOut, TextWriter.Null)));
        JsonElement endpoints = default;
        for (var deadline = DateTime.UtcNow.AddSeconds(20); DateTime.UtcNow < deadline && endpoints.ValueKind == JsonValueKind.Undefined; await Task.Delay(50))
        {
            var text = output.ToString();
            if (text.Contains('\n'))
            {
                endpoints = JsonDocument.Parse(text).RootElement.GetProperty("endpoints").Clone();
            }
        }

        Assert.Equal(6, endpoints.GetArrayLength());
        var rawVna = endpoints.EnumerateArray().Single(e => e.GetProperty("instrument").GetString() == "vna" && e.GetProperty("dialect").GetString() == "raw");
        var identified = CliRun.Of("identify", rawVna.GetProperty("connection").GetString()!,
            "--profile", RepositoryFiles.PathOf(rawVna.GetProperty("profile").GetString()!));
        Assert.Equal(0, identified.ExitCode);
        Assert.Contains("Model         SIM-VNA", identified.Out);
        Assert.Contains("Capabilities  network analyser", identified.Out);
        Assert.Equal(0, await serving.WaitAsync(TimeSpan.FromSeconds(40)));
    }

    [Fact]
    public void Identify_InProcessVirtualBench_NeedsNoServer()
    {
        var run = CliRun.Of("identify", "sim:sa", "--profile", RepositoryFiles.Example("profiles/bench-sa-scpi.yaml"), "--json");

        Assert.Equal(0, run.ExitCode);
        using var doc = JsonDocument.Parse(run.Out);
        Assert.Equal("SIM-SA", doc.RootElement.GetProperty("model").GetString());
        Assert.Equal("spectrum analyser", doc.RootElement.GetProperty("capabilities")[0].GetString());
    }

    [Fact]
    public void Sim_BadDuration_IsBadInput()
    {
        var run = CliRun.Of("sim", "--tcp", "0", "--duration", "soon");

        Assert.Equal(2, run.ExitCode);
        Assert.Contains("--duration", run.Error);
    }
}
