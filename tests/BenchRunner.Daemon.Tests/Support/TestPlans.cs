namespace BenchRunner.Daemon.Tests.Support;

/// <summary>Plan files for the daemon's tests: short sweeps of the virtual bench's instruments (the 137 MHz preselector scenario).</summary>
internal static class TestPlans
{
    /// <summary>A network-analyser plan: setup, <paramref name="sweeps"/> S21 sweeps with a wait after each, and a centre check.</summary>
    public static string Vna(string name, int sweeps = 1, string wait = "10 ms") => $"""
        plan: {name}
        roles:
          vna: network-analyser
        steps:
          - name: passband setup
            set-network-analyser:
              role: vna
              start: 127.5 MHz
              stop: 147.5 MHz
              points: 201
              if-bandwidth: 1 kHz
          - name: sweeps
            repeat:
              times: {sweeps}
              steps:
                - name: passband sweep
                  sweep:
                    role: vna
                    traces:
                      S21: passband
                - wait: {wait}
          - name: centre
            check-figures:
              trace: passband
              figures:
                center_hz: {"{"} target: 137.5 MHz, tolerance: 0.3 MHz {"}"}
        """;

    /// <summary>A spectrum-analyser plan: setup, <paramref name="sweeps"/> sweeps with a wait after each.</summary>
    public static string Sa(string name, int sweeps = 1, string wait = "10 ms") => $"""
        plan: {name}
        roles:
          sa: spectrum-analyser
        steps:
          - name: analyser setup
            set-spectrum-analyser:
              role: sa
              centre: 137.5 MHz
              span: 2 MHz
              rbw: 10 kHz
              attenuation: 10 dB
              reference-level: 0 dBm
          - name: sweeps
            repeat:
              times: {sweeps}
              steps:
                - name: floor sweep
                  sweep:
                    role: sa
                    traces:
                      power: floor
                - wait: {wait}
        """;
}
