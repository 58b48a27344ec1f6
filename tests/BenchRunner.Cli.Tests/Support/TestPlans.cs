namespace BenchRunner.Cli.Tests.Support;

/// <summary>Small plans the command tests write into their temporary folder.</summary>
internal static class TestPlans
{
    /// <summary>
    /// Writes <c>tight.yaml</c>: one S21 sweep of the preselector's passband with an insertion-loss
    /// limit of 1 dB, which no demo board meets. Returns its path.
    /// </summary>
    public static string WriteTight(TempDirectory dir, int points) => dir.Write("tight.yaml", $$"""
        plan: tight
        roles:
          vna: network-analyser
        steps:
          - set-network-analyser:
              role: vna
              start: 127.5 MHz
              stop: 147.5 MHz
              points: {{points}}
          - sweep:
              role: vna
              traces:
                S21: passband
          - check-figures:
              trace: passband
              figures:
                insertion_loss_db: { max: 1 dB }
        """);
}
