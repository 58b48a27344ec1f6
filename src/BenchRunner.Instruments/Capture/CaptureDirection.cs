namespace BenchRunner.Instruments.Capture;

/// <summary>Which way a chunk of bytes travelled on the recorded connection.</summary>
public enum CaptureDirection
{
    /// <summary>Written by the host (this program) to the device: commands. Marked <c>&gt;</c> in a capture file.</summary>
    HostToDevice,

    /// <summary>Sent by the device to the host: replies, prompts, echoes. Marked <c>&lt;</c> in a capture file.</summary>
    DeviceToHost,
}
