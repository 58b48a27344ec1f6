using System.Text;
using BenchRunner.Simulator.Protocols.Hosting;
using BenchRunner.Simulator.Protocols.Raw;
using BenchRunner.Simulator.Tests.Support;

namespace BenchRunner.Simulator.Tests.Protocols.Raw;

public class BenchDialectGarbageTests
{
    public static TheoryData<string> Servers => ["vna", "sa", "gen"];

    [Theory]
    [MemberData(nameof(Servers))]
    public void Handle_RandomLines_AreRefusedAndNeverThrow(string which)
    {
        var (server, identity, prompt) = Create(which);
        var random = new Random(1375);
        string[] words = ["band", "span", "ifbw", "avg", "go", "data", "trace", "rbw", "att", "ref", "pts", "tone", "lvl", "rf", "who"];
        for (int i = 0; i < 2000; i++)
        {
            var line = new StringBuilder(words[random.Next(words.Length)]);
            for (int w = random.Next(0, 4); w > 0; w--)
            {
                line.Append(' ').Append(random.Next(3) switch
                {
                    0 => random.NextDouble() * Math.Pow(10, random.Next(-3, 40)) * (random.Next(2) == 0 ? -1 : 1),
                    1 => random.Next(),
                    // Any byte but CR and LF, which the host never passes inside a line.
                    _ => (object)new string((char)random.Next(14, 256), random.Next(1, 5)),
                });
            }

            var reply = Encoding.Latin1.GetString(server.Handle(line.ToString()));
            // Each reply is complete: it ends with the prompt, or (without one) with its single CR LF line.
            Assert.EndsWith(prompt ?? "\r\n", reply);
            var lines = reply[..^(prompt ?? "").Length].Split("\r\n")[..^1];
            var answer = which == "vna" ? lines.Skip(1).ToArray() : lines;
            Assert.True(answer.Length <= 1 || answer[0].StartsWith('#'), reply);
            Assert.All(answer.Where(l => !l.StartsWith('#')), l => Assert.Matches(@"^(err [1-5] [a-z ]+|ok|benchrunner/.*|[-0-9,]+)$", l));
        }

        // After all that the device still answers its identity.
        Assert.Contains(identity + "\r\n", Encoding.Latin1.GetString(server.Handle("who")));
    }

    private static (IDeviceProtocol Server, string Identity, string? Prompt) Create(string which) => which switch
    {
        "vna" => (new BenchVnaServer(new FakeNetworkAnalyser()), "benchrunner/sim-vna sn SIM-VNA-0001 fw 1.0", BenchVnaServer.Prompt),
        "sa" => (new BenchSaServer(new FakeSpectrumAnalyser()), "benchrunner/sim-sa sn SIM-SA-0001 fw 1.0", BenchSaServer.Prompt),
        _ => (new BenchGenServer(new FakeSignalGenerator()), "benchrunner/sim-gen sn SIM-GEN-0001 fw 1.0", null),
    };
}
