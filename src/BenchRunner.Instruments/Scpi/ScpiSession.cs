using BenchRunner.Instruments.Capabilities;
using BenchRunner.Instruments.Errors;
using BenchRunner.Instruments.Framing;
using BenchRunner.Instruments.Transports;

namespace BenchRunner.Instruments.Scpi;

/// <summary>
/// A conversation with one IEEE 488.2 / SCPI instrument over a <see cref="FramedConnection"/>:
/// commands, queries and block queries, each with a timeout and (when
/// <see cref="ScpiSessionOptions.DrainErrors"/> is on) followed by draining the error queue, so
/// that an error the instrument reports is raised against the command that caused it.
/// <para>
/// The session keeps an explicit <see cref="State"/> and does work only when
/// <see cref="SessionState.Ready"/>. A reply that times out, cannot be framed, or is cut short by
/// cancellation leaves the session <see cref="SessionState.Broken"/>, since the instrument may still
/// send it later and every reply after it would be taken for the wrong command;
/// <see cref="ResetAsync"/> brings it back in step. Operations are carried out one at a time.
/// </para>
/// Every <see cref="InstrumentException"/> raised names the instrument, the command and what came back.
/// </summary>
public sealed class ScpiSession : IAsyncDisposable
{
    private const int MaxResyncReplies = 64;

    private readonly FramedConnection _connection;
    private readonly ScpiSessionOptions _options;
    private readonly TimeProvider _time;
    private readonly SemaphoreSlim _gate = new(1, 1);
    private volatile SessionState _state = SessionState.Closed;

    /// <summary>Creates a closed session; <see cref="OpenAsync"/> opens it.</summary>
    /// <param name="instrument">The instrument's bench name, used in every message.</param>
    /// <param name="transport">The connection to the instrument.</param>
    /// <param name="options">Timeouts and error checking; defaults when null.</param>
    /// <param name="framing">Message framing; LF-terminated lines when null. SCPI has no prompt, so none may be set.</param>
    /// <param name="timeProvider">The clock that measures timeouts; the system clock when null.</param>
    /// <exception cref="ArgumentException">An empty name, invalid options, or a framing with a prompt.</exception>
    public ScpiSession(string instrument, ITransport transport, ScpiSessionOptions? options = null, FramingOptions? framing = null, TimeProvider? timeProvider = null)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(instrument);
        ArgumentNullException.ThrowIfNull(transport);
        _options = options ?? new ScpiSessionOptions();
        _options.Validate();
        if (framing?.Prompt is not null)
        {
            throw new ArgumentException("A SCPI session reads replies up to the line terminator; the framing must not have a prompt.", nameof(framing));
        }

        _time = timeProvider ?? TimeProvider.System;
        _connection = new FramedConnection(transport, framing, _time);
        Instrument = instrument;
    }

    /// <summary>The instrument's bench name.</summary>
    public string Instrument { get; }

    /// <summary>Where the session stands.</summary>
    public SessionState State => _state;

    /// <summary>The options in force.</summary>
    public ScpiSessionOptions Options => _options;

    /// <summary>Opens the transport; the session becomes <see cref="SessionState.Ready"/>.</summary>
    /// <exception cref="InvalidOperationException">The session is not closed.</exception>
    /// <exception cref="InstrumentException">The connection cannot be made.</exception>
    public async Task OpenAsync(CancellationToken cancellationToken)
    {
        await _gate.WaitAsync(cancellationToken).ConfigureAwait(false);
        try
        {
            if (_state != SessionState.Closed)
            {
                throw new InvalidOperationException($"{Instrument}: the SCPI session is already open.");
            }

            try
            {
                await _connection.Transport.OpenAsync(cancellationToken).ConfigureAwait(false);
            }
            catch (InstrumentException ex)
            {
                throw InstrumentFailures.WithContext(ex, Instrument, ex.Command);
            }

            _connection.DiscardBuffered();
            _state = SessionState.Ready;
        }
        finally
        {
            _gate.Release();
        }
    }

    /// <summary>Closes the transport; the session becomes <see cref="SessionState.Closed"/>. Closing a closed session does nothing.</summary>
    public async Task CloseAsync()
    {
        await _gate.WaitAsync().ConfigureAwait(false);
        try
        {
            if (_state != SessionState.Closed)
            {
                _state = SessionState.Closed;
                await _connection.Transport.CloseAsync().ConfigureAwait(false);
            }
        }
        finally
        {
            _gate.Release();
        }
    }

    /// <inheritdoc/>
    public async ValueTask DisposeAsync()
    {
        await CloseAsync().ConfigureAwait(false);
        _gate.Dispose();
    }

    /// <summary>Sends a command that has no reply, then drains the error queue (when enabled).</summary>
    /// <exception cref="InvalidOperationException">The session is closed.</exception>
    /// <exception cref="InstrumentReportedException">The instrument reported one or more errors.</exception>
    /// <exception cref="InstrumentException">The session is broken, or the link failed (the session is then broken).</exception>
    public Task WriteAsync(string command, CancellationToken cancellationToken) =>
        RunAsync(command, async token =>
        {
            await _connection.SendAsync(command, token).ConfigureAwait(false);
            return true;
        }, _options.DrainErrors, cancellationToken);

    /// <summary>
    /// Sends a query and returns its reply line (without the terminator), read within
    /// <see cref="ScpiSessionOptions.CommandTimeout"/>; then drains the error queue (when enabled).
    /// </summary>
    /// <exception cref="InvalidOperationException">The session is closed.</exception>
    /// <exception cref="InstrumentTimeoutException">No reply in time; the session is then broken.</exception>
    /// <exception cref="InstrumentReportedException">The instrument reported one or more errors.</exception>
    /// <exception cref="InstrumentException">The session is broken, or the link failed.</exception>
    public Task<string> QueryAsync(string command, CancellationToken cancellationToken) =>
        RunAsync(command, async token =>
        {
            await _connection.SendAsync(command, token).ConfigureAwait(false);
            return await _connection.ReadLineAsync(_options.CommandTimeout, token).ConfigureAwait(false);
        }, _options.DrainErrors, cancellationToken);

    /// <summary>
    /// Sends a query whose reply is an IEEE 488.2 block and returns the block's payload, read within
    /// <see cref="ScpiSessionOptions.CommandTimeout"/>; then drains the error queue (when enabled).
    /// </summary>
    /// <exception cref="FramingException">The reply is not a well-formed block; the session is then broken.</exception>
    /// <inheritdoc cref="QueryAsync" path="/exception"/>
    public Task<byte[]> QueryBlockAsync(string command, CancellationToken cancellationToken) =>
        RunAsync(command, async token =>
        {
            await _connection.SendAsync(command, token).ConfigureAwait(false);
            return await _connection.ReadBlockAsync(_options.CommandTimeout, token).ConfigureAwait(false);
        }, _options.DrainErrors, cancellationToken);

    /// <summary>
    /// Waits for every pending operation (a sweep) to finish: sends <c>*OPC?</c> (IEEE 488.2 §10.19)
    /// and waits up to <see cref="ScpiSessionOptions.CompletionTimeout"/> for its "1"; then drains the
    /// error queue (when enabled).
    /// </summary>
    /// <exception cref="InstrumentTimeoutException">Not finished in time; the session is then broken.</exception>
    /// <exception cref="FramingException">A reply other than 1 came, so replies are out of step; the session is then broken.</exception>
    /// <exception cref="InstrumentReportedException">The instrument reported one or more errors.</exception>
    public Task WaitForCompletionAsync(CancellationToken cancellationToken) =>
        RunAsync("*OPC?", async token =>
        {
            await _connection.SendAsync("*OPC?", token).ConfigureAwait(false);
            var reply = await _connection.ReadLineAsync(_options.CompletionTimeout, token).ConfigureAwait(false);
            if (!IsOne(reply))
            {
                throw new FramingException("the answer to *OPC? is not 1, so replies are out of step") { Reply = reply };
            }

            return true;
        }, _options.DrainErrors, cancellationToken);

    /// <summary>Asks <c>*IDN?</c> (IEEE 488.2 §10.14) and parses the reply.</summary>
    /// <exception cref="InstrumentException">The reply is not an identification (not transient), or the query failed.</exception>
    public async Task<InstrumentIdentity> IdentifyAsync(CancellationToken cancellationToken)
    {
        var reply = await QueryAsync("*IDN?", cancellationToken).ConfigureAwait(false);
        var identity = InstrumentIdentity.ParseIdn(reply);
        return identity.Success
            ? identity.Value
            : throw new InstrumentException("the identification reply has the wrong form: " + identity.Error, isTransient: false)
            {
                Instrument = Instrument,
                Command = "*IDN?",
                Reply = reply,
            };
    }

    /// <summary>
    /// Sends <c>*RST</c> (IEEE 488.2 §10.32), which returns the instrument to its reset settings
    /// (this may switch an RF output on or off), and waits for it with <c>*OPC?</c>.
    /// </summary>
    /// <inheritdoc cref="WaitForCompletionAsync" path="/exception"/>
    public async Task ResetInstrumentAsync(CancellationToken cancellationToken)
    {
        await RunAsync("*RST", async token =>
        {
            await _connection.SendAsync("*RST", token).ConfigureAwait(false);
            return true;
        }, drain: false, cancellationToken).ConfigureAwait(false);
        await WaitForCompletionAsync(cancellationToken).ConfigureAwait(false);
    }

    /// <summary>Sends <c>*CLS</c> (IEEE 488.2 §10.3): clears the status registers and the error queue.</summary>
    /// <exception cref="InstrumentException">The session is broken, or the link failed.</exception>
    public Task ClearStatusAsync(CancellationToken cancellationToken) =>
        RunAsync("*CLS", async token =>
        {
            await _connection.SendAsync("*CLS", token).ConfigureAwait(false);
            return true;
        }, drain: false, cancellationToken);

    /// <summary>
    /// Reads (and so clears) the Standard Event Status Register with <c>*ESR?</c> (IEEE 488.2 §10.12):
    /// 0 to 255; bit values OPC 1, QYE 4, DDE 8, EXE 16, CME 32.
    /// </summary>
    /// <exception cref="InstrumentException">The reply is not a number from 0 to 255, or the query failed.</exception>
    public async Task<int> ReadEventStatusAsync(CancellationToken cancellationToken)
    {
        var reply = await QueryAsync("*ESR?", cancellationToken).ConfigureAwait(false);
        var value = ScpiNumber.ParseInteger(reply);
        return value is { Success: true, Value: >= 0 and <= 255 }
            ? (int)value.Value
            : throw new InstrumentException("the answer to *ESR? is not a register value from 0 to 255", isTransient: false)
            {
                Instrument = Instrument,
                Command = "*ESR?",
                Reply = reply,
            };
    }

    /// <summary>
    /// Empties the error queue and returns its entries, oldest first (none when it was empty),
    /// without raising them.
    /// </summary>
    /// <exception cref="InstrumentException">
    /// The queue was not empty after <see cref="ScpiSessionOptions.MaxErrorReads"/> reads, an entry
    /// could not be read (the session is then broken), or the session is broken.
    /// </exception>
    public Task<IReadOnlyList<ScpiError>> ReadErrorsAsync(CancellationToken cancellationToken) =>
        RunAsync(_options.ErrorQuery, async token =>
        {
            var (entries, _) = await ReadErrorQueueAsync(_options.ErrorQuery, token).ConfigureAwait(false);
            return (IReadOnlyList<ScpiError>)entries;
        }, drain: false, cancellationToken);

    /// <summary>
    /// Brings an open session (broken or not) back in step: drops what has been received, sends
    /// <c>*CLS</c> and <c>*OPC?</c>, and skips replies until the "1" of that <c>*OPC?</c>; then asks
    /// <c>*IDN?</c>, whose reply cannot be mistaken for a late "1", to be sure. The whole takes at most
    /// <see cref="ScpiSessionOptions.CompletionTimeout"/>, as the instrument may first finish a sweep.
    /// On success the session is <see cref="SessionState.Ready"/>; on failure it stays broken.
    /// </summary>
    /// <exception cref="InvalidOperationException">The session is closed.</exception>
    /// <exception cref="InstrumentException">The instrument did not come back in step.</exception>
    public async Task ResetAsync(CancellationToken cancellationToken)
    {
        await _gate.WaitAsync(cancellationToken).ConfigureAwait(false);
        try
        {
            EnsureOpen("*CLS");
            _state = SessionState.Broken;
            _connection.DiscardBuffered();
            long started = _time.GetTimestamp();
            TimeSpan Remaining()
            {
                var left = _options.CompletionTimeout - _time.GetElapsedTime(started);
                return left > TimeSpan.Zero ? left : TimeSpan.FromTicks(1);
            }

            await GuardAsync("*CLS", async token =>
            {
                await _connection.SendAsync("*CLS", token).ConfigureAwait(false);
                await _connection.SendAsync("*OPC?", token).ConfigureAwait(false);
                return true;
            }, cancellationToken).ConfigureAwait(false);

            await SkipUntilAsync("*OPC?", IsOne, skippable: _ => true, Remaining, cancellationToken).ConfigureAwait(false);
            await GuardAsync("*IDN?", async token =>
            {
                await _connection.SendAsync("*IDN?", token).ConfigureAwait(false);
                return true;
            }, cancellationToken).ConfigureAwait(false);

            // A late "1" may have been taken for ours; then ours still comes before the identification.
            var identity = await SkipUntilAsync("*IDN?", reply => !IsOne(reply), skippable: IsOne, Remaining, cancellationToken).ConfigureAwait(false);
            if (!InstrumentIdentity.ParseIdn(identity).Success)
            {
                throw new FramingException("could not re-synchronise: the answer to *IDN? is not an identification")
                {
                    Instrument = Instrument,
                    Command = "*IDN?",
                    Reply = identity,
                };
            }

            _state = SessionState.Ready;
        }
        finally
        {
            _gate.Release();
        }
    }

    private async Task<string> SkipUntilAsync(
        string command, Func<string, bool> wanted, Func<string, bool> skippable, Func<TimeSpan> remaining, CancellationToken cancellationToken)
    {
        for (int skipped = 0; ; skipped++)
        {
            var reply = await GuardAsync(command, token => _connection.ReadLineAsync(remaining(), token), cancellationToken).ConfigureAwait(false);
            if (wanted(reply))
            {
                return reply;
            }

            if (skipped >= MaxResyncReplies || !skippable(reply))
            {
                throw new FramingException($"could not re-synchronise: {skipped + 1} replies came that were not the answer to {command}")
                {
                    Instrument = Instrument,
                    Command = command,
                    Reply = reply,
                };
            }
        }
    }

    private async Task<T> RunAsync<T>(string command, Func<CancellationToken, Task<T>> operation, bool drain, CancellationToken cancellationToken)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(command);
        await _gate.WaitAsync(cancellationToken).ConfigureAwait(false);
        try
        {
            EnsureOpen(command);
            if (_state == SessionState.Broken)
            {
                throw new InstrumentException("the session is out of step after an earlier failure and refuses work until it is reset", isTransient: true)
                {
                    Instrument = Instrument,
                    Command = command,
                };
            }

            var result = await GuardAsync(command, operation, cancellationToken).ConfigureAwait(false);
            if (drain)
            {
                var (entries, replies) = await ReadErrorQueueAsync(command, cancellationToken).ConfigureAwait(false);
                if (entries.Count > 0)
                {
                    throw ScpiFailures.Reported(entries, replies, Instrument, command);
                }
            }

            return result;
        }
        finally
        {
            _gate.Release();
        }
    }

    private async Task<(List<ScpiError> Entries, List<string> Replies)> ReadErrorQueueAsync(string command, CancellationToken cancellationToken)
    {
        var query = _options.ErrorQuery;
        var entries = new List<ScpiError>();
        var replies = new List<string>();
        for (int read = 0; read < _options.MaxErrorReads; read++)
        {
            var reply = await GuardAsync(query, async token =>
            {
                await _connection.SendAsync(query, token).ConfigureAwait(false);
                return await _connection.ReadLineAsync(_options.CommandTimeout, token).ConfigureAwait(false);
            }, cancellationToken).ConfigureAwait(false);

            var entry = ScpiError.Parse(reply);
            if (!entry.Success)
            {
                _state = SessionState.Broken;
                throw new FramingException($"reading the error queue after \"{InstrumentException.Printable(command)}\": {entry.Error}")
                {
                    Instrument = Instrument,
                    Command = query,
                    Reply = reply,
                };
            }

            if (entry.Value.IsNoError)
            {
                return (entries, replies);
            }

            entries.Add(entry.Value);
            replies.Add(reply);
        }

        throw new InstrumentException(
            $"the error queue was still not empty after {_options.MaxErrorReads} reads of {query}, so the instrument may be repeating an entry; read: {ScpiFailures.Describe(entries, 4)}",
            isTransient: false)
        {
            Instrument = Instrument,
            Command = command,
            Reply = replies[^1],
        };
    }

    private async Task<T> GuardAsync<T>(string command, Func<CancellationToken, Task<T>> operation, CancellationToken cancellationToken)
    {
        try
        {
            return await operation(cancellationToken).ConfigureAwait(false);
        }
        catch (InstrumentException ex) when (ex is InstrumentTimeoutException or FramingException)
        {
            _state = SessionState.Broken;
            throw InstrumentFailures.WithContext(ex, Instrument, command);
        }
        catch (OperationCanceledException)
        {
            // Cancelled half-way: a reply may still arrive and would be taken for the next command's.
            _state = SessionState.Broken;
            throw;
        }
        catch (IOException ex)
        {
            _state = SessionState.Broken;
            throw new InstrumentException($"the connection failed: {ex.Message}", isTransient: true, ex)
            {
                Instrument = Instrument,
                Command = command,
            };
        }
    }

    private void EnsureOpen(string command)
    {
        if (_state == SessionState.Closed)
        {
            throw new InvalidOperationException($"{Instrument}: the SCPI session is not open; open it before sending \"{InstrumentException.Printable(command)}\".");
        }
    }

    private static bool IsOne(string reply) => ScpiNumber.ParseInteger(reply) is { Success: true, Value: 1 };
}
