using System.Collections.Immutable;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using BenchRunner.Instruments.Capabilities;
using BenchRunner.Instruments.Errors;
using BenchRunner.Instruments.Transports;

namespace BenchRunner.Instruments.Scpi;

/// <summary>
/// An IEEE 488.2 / SCPI instrument whose commands come from a <see cref="ScpiCommandSet"/>. It offers
/// the capability of each kind whose section the command set enables (<see cref="INetworkAnalyser"/>,
/// <see cref="ISpectrumAnalyser"/>, <see cref="ISignalGenerator"/>, or a registered kind's) through
/// <see cref="GetCapability{T}"/>, each built by its <see cref="Kinds.InstrumentKind"/>.
/// <para>
/// Connecting opens the session, sends <c>*CLS</c>, reads <c>*IDN?</c>, sends <c>*RST</c> only when
/// <see cref="ScpiInstrumentOptions.ResetOnConnect"/> is set, and selects the data format and byte
/// order when traces are fetched. Every operation drains the error queue unless that is switched off.
/// </para>
/// Settings outside the declared <see cref="Limits"/> are refused before anything is sent.
/// </summary>
public sealed class ScpiInstrument : IInstrument
{
    private readonly IReadOnlyList<object> _capabilities;

    /// <summary>Creates the instrument; nothing is sent until <see cref="ConnectAsync"/>.</summary>
    /// <param name="name">The bench name, e.g. <c>vna</c>.</param>
    /// <param name="transport">The connection to the instrument.</param>
    /// <param name="commands">The command set; validated here.</param>
    /// <param name="options">Timeouts, error draining, reset on connect; defaults when null.</param>
    /// <param name="limits">The declared limits; none when null.</param>
    /// <param name="timeProvider">The clock that measures timeouts; the system clock when null.</param>
    /// <exception cref="ArgumentException">An invalid command set or options (every problem is listed).</exception>
    public ScpiInstrument(
        string name, ITransport transport, ScpiCommandSet commands, ScpiInstrumentOptions? options = null,
        InstrumentLimits? limits = null, TimeProvider? timeProvider = null)
    {
        ArgumentNullException.ThrowIfNull(commands);
        commands.Validate();
        Options = options ?? new ScpiInstrumentOptions();
        Options.Validate();
        Commands = commands;
        Limits = limits ?? InstrumentLimits.None;
        Session = new ScpiSession(name, transport, Options.Session, Options.Framing, timeProvider);
        Name = name;
        _capabilities = [.. commands.Sections.Where(s => s.Value.Enabled).Select(s => s.Key.ScpiCapability(this, s.Value))];
    }

    /// <inheritdoc/>
    public string Name { get; }

    /// <inheritdoc/>
    public InstrumentIdentity Identity { get; private set; } = InstrumentIdentity.Unknown;

    /// <inheritdoc/>
    public InstrumentLimits Limits { get; }

    /// <summary>The command set in use.</summary>
    public ScpiCommandSet Commands { get; }

    /// <summary>The options in use.</summary>
    public ScpiInstrumentOptions Options { get; }

    /// <summary>The SCPI session underneath, for its state and for <see cref="ScpiSession.ResetAsync"/>.</summary>
    public ScpiSession Session { get; }

    /// <summary>
    /// Opens the session (or re-synchronises a broken one), sends <c>*CLS</c>, reads the identity,
    /// resets when so configured, and selects the data format and byte order.
    /// </summary>
    /// <exception cref="InstrumentException">The instrument cannot be reached, does not identify itself, or reports an error.</exception>
    public async Task ConnectAsync(CancellationToken cancellationToken)
    {
        switch (Session.State)
        {
            case SessionState.Closed:
                await Session.OpenAsync(cancellationToken).ConfigureAwait(false);
                break;
            case SessionState.Broken:
                await Session.ResetAsync(cancellationToken).ConfigureAwait(false);
                break;
        }

        await Session.ClearStatusAsync(cancellationToken).ConfigureAwait(false);
        Identity = await Session.IdentifyAsync(cancellationToken).ConfigureAwait(false);
        if (Options.ResetOnConnect)
        {
            await Session.ResetInstrumentAsync(cancellationToken).ConfigureAwait(false);
        }

        if (Commands.FetchesTraces)
        {
            if (Commands.DataFormatCommand is { } format)
            {
                await Session.WriteAsync(Template(format, ScpiPlaceholder.Format).Render(Commands.DataFormat), cancellationToken).ConfigureAwait(false);
            }

            if (Commands.DataFormat != ScpiDataFormat.Ascii && Commands.ByteOrderCommand is { } order)
            {
                await Session.WriteAsync(Template(order, ScpiPlaceholder.Order).Render(Commands.ByteOrder), cancellationToken).ConfigureAwait(false);
            }
        }
    }

    /// <inheritdoc/>
    public T? GetCapability<T>() where T : class => _capabilities.OfType<T>().FirstOrDefault();

    /// <inheritdoc/>
    public ValueTask DisposeAsync() => Session.DisposeAsync();

    internal static ScpiCommandTemplate Template(string text, ScpiPlaceholder? placeholder) =>
        ScpiCommandChecks.Template(text, placeholder);

    /// <summary>Starts one sweep and waits for it with <c>*OPC?</c> (the longer completion timeout).</summary>
    internal async Task SweepAsync(CancellationToken cancellationToken)
    {
        await Session.WriteAsync(Template(Commands.Trigger!, null).Render(), cancellationToken).ConfigureAwait(false);
        await Session.WaitForCompletionAsync(cancellationToken).ConfigureAwait(false);
    }

    /// <summary>Fetches numbers in the command set's data format, with a short description of what came.</summary>
    internal async Task<(ImmutableArray<double> Values, string Reply)> FetchNumbersAsync(string query, CancellationToken cancellationToken)
    {
        if (Commands.DataFormat == ScpiDataFormat.Ascii)
        {
            var text = await Session.QueryAsync(query, cancellationToken).ConfigureAwait(false);
            var list = ScpiNumberList.Parse(text);
            return list.Success ? (list.Value, text) : throw Unreadable(query, list.Error, text);
        }

        var payload = await Session.QueryBlockAsync(query, cancellationToken).ConfigureAwait(false);
        var reply = $"a block of {payload.Length} bytes";
        var numbers = ScpiBinaryBlock.Decode(payload, Commands.DataFormat, Commands.ByteOrder);
        return numbers.Success ? (numbers.Value, reply) : throw Unreadable(query, numbers.Error, reply);
    }

    /// <summary>Reads a frequency list (hertz) and makes an axis of it.</summary>
    internal async Task<FrequencyAxis> FetchAxisAsync(string query, CancellationToken cancellationToken)
    {
        var (hertz, reply) = await FetchNumbersAsync(query, cancellationToken).ConfigureAwait(false);
        try
        {
            return FrequencyAxis.FromHertz(hertz);
        }
        catch (ArgumentException ex)
        {
            throw Unreadable(query, "the frequency list is not usable: " + ex.Message, reply);
        }
    }

    /// <summary>Fails unless <paramref name="received"/> values are the <paramref name="expected"/> ones.</summary>
    internal void CheckCount(string what, string query, int expected, int received, int valuesPerPoint, string reply, string hint)
    {
        if (received == expected * valuesPerPoint)
        {
            return;
        }

        var got = valuesPerPoint == 1
            ? $"{received} values"
            : $"{received} values ({(received % valuesPerPoint == 0 ? (received / valuesPerPoint).ToString(System.Globalization.CultureInfo.InvariantCulture) : "not a whole number of")} points of {valuesPerPoint} values)";
        throw new InstrumentException($"{what}: expected {expected} points but the instrument sent {got}; {hint}", isTransient: false)
        {
            Instrument = Name,
            Command = query,
            Reply = reply,
        };
    }

    /// <summary>Fails when a value is the instrument's not-a-number or infinity marker.</summary>
    internal void CheckMeasured(string what, string query, ImmutableArray<double> values, FrequencyAxis axis, int valuesPerPoint, string reply)
    {
        for (int i = 0; i < values.Length; i++)
        {
            if (ScpiNumber.IsMarker(values[i]))
            {
                int point = i / valuesPerPoint;
                throw new InstrumentException(
                    $"{what}: point {point + 1} ({axis[point]}) holds {values[i]:G4}, the instrument's mark for no valid value",
                    isTransient: false)
                {
                    Instrument = Name,
                    Command = query,
                    Reply = reply,
                };
            }
        }
    }

    /// <summary>Refuses a frequency outside the declared range.</summary>
    /// <exception cref="ArgumentOutOfRangeException">The frequency is outside <see cref="Limits"/>' range.</exception>
    public void CheckFrequency(Frequency frequency, string what)
    {
        if (Limits.FrequencyRange is { } range && !range.Contains(frequency))
        {
            throw new ArgumentOutOfRangeException(what, frequency.Hertz, $"{Name}: the {what} {frequency} is outside the declared range {range}.");
        }
    }

    /// <summary>The failure for a setting the command set has no command for.</summary>
    internal InstrumentException Unsupported(string setting) =>
        new($"the command set has no command for {setting}, so it cannot be set", isTransient: false) { Instrument = Name };

    private InstrumentException Unreadable(string query, string detail, string reply) =>
        new($"the data could not be read: {detail}", isTransient: false)
        {
            Instrument = Name,
            Command = query,
            Reply = reply,
        };
}
