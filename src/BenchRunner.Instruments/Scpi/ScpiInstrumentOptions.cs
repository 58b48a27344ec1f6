using BenchRunner.Instruments.Framing;

namespace BenchRunner.Instruments.Scpi;

/// <summary>How a <see cref="ScpiInstrument"/> connects and talks.</summary>
public sealed class ScpiInstrumentOptions
{
    /// <summary>Timeouts (per command, per sweep) and error-queue draining; see <see cref="ScpiSessionOptions"/>.</summary>
    public ScpiSessionOptions Session { get; init; } = new();

    /// <summary>Message framing; null (the default) for LF-terminated lines, no echo, no prompt.</summary>
    public FramingOptions? Framing { get; init; }

    /// <summary>
    /// Whether connecting sends <c>*RST</c>. Default false, for safety: a reset returns every
    /// setting to the instrument's reset state, which may switch a generator's or a network
    /// analyser's RF output on, or change its level or its input attenuation, while a device under
    /// test or a sensitive input is connected. Enable it only where the bench is known to be safe
    /// for the instrument's reset state.
    /// </summary>
    public bool ResetOnConnect { get; init; }

    /// <summary>Throws <see cref="ArgumentException"/> naming every invalid setting.</summary>
    public void Validate()
    {
        if (Session is null)
        {
            throw new ArgumentException("Invalid SCPI instrument options: the session options must not be null.");
        }

        Session.Validate();
        Framing?.Validate();
    }
}
