using BenchRunner.Instruments.Capabilities;
using BenchRunner.Instruments.Errors;
using BenchRunner.Instruments.Framing;
using BenchRunner.Instruments.Transports;

namespace BenchRunner.Instruments.Profiles;

/// <summary>
/// The conversation with one profile-driven device: one operation at a time, each command's
/// reply read to the prompt (or line by line without one), error replies recognised, and every
/// failure naming instrument, command and reply. Shared by the capability objects.
/// </summary>
internal sealed class ProfileSession
{
    private readonly SemaphoreSlim _gate = new(1, 1);
    private readonly ITransport _transport;
    private readonly TimeProvider _time;
    private FramedConnection? _connection;
    private bool _lostSync;

    public ProfileSession(string name, DriverProfile profile, ITransport transport, TimeProvider time)
    {
        Name = name;
        Profile = profile;
        _transport = transport;
        _time = time;
    }

    public string Name { get; }

    public DriverProfile Profile { get; }

    public ProfileSessionState State { get; private set; }

    public InstrumentIdentity Identity { get; private set; } = InstrumentIdentity.Unknown;

    private bool HasPrompt => Profile.Framing.Prompt is not null;

    /// <summary>Opens the transport, identifies the device and sends the on-connect commands.</summary>
    public async Task ConnectAsync(CancellationToken cancellationToken)
    {
        await _gate.WaitAsync(cancellationToken).ConfigureAwait(false);
        try
        {
            _lostSync = false;
            State = ProfileSessionState.Broken;
            if (!_transport.IsOpen)
            {
                await Io(null, async () => { await _transport.OpenAsync(cancellationToken).ConfigureAwait(false); return true; }).ConfigureAwait(false);
            }

            _connection ??= new FramedConnection(_transport, Profile.Framing, _time);
            _connection.DiscardBuffered();
            Identity = await IdentifyAsync(cancellationToken).ConfigureAwait(false);
            foreach (var command in Profile.OnConnect)
            {
                await SettingAsync(command.Render(new TemplateArguments()), Profile.Timing.CommandTimeout, cancellationToken).ConfigureAwait(false);
            }

            State = ProfileSessionState.Ready;
        }
        finally
        {
            _gate.Release();
        }
    }

    /// <summary>Runs one operation alone, on a connection in step; a failure that loses step marks the session broken.</summary>
    public async Task<T> RunAsync<T>(Func<CancellationToken, Task<T>> operation, CancellationToken cancellationToken)
    {
        await _gate.WaitAsync(cancellationToken).ConfigureAwait(false);
        try
        {
            switch (State)
            {
                case ProfileSessionState.Disconnected:
                    throw new InvalidOperationException($"{Name}: not connected; call ConnectAsync first.");
                case ProfileSessionState.Broken:
                    throw new InstrumentException("the conversation lost step after an earlier failure; connect again", isTransient: true)
                    {
                        Instrument = Name,
                    };
            }

            _lostSync = false;
            try
            {
                return await operation(cancellationToken).ConfigureAwait(false);
            }
            finally
            {
                if (_lostSync)
                {
                    State = ProfileSessionState.Broken;
                }
            }
        }
        finally
        {
            _gate.Release();
        }
    }

    public Task RunAsync(Func<CancellationToken, Task> operation, CancellationToken cancellationToken) =>
        RunAsync(async token => { await operation(token).ConfigureAwait(false); return true; }, cancellationToken);

    /// <summary>Sends a setting and checks its reply: the acknowledgement, or nothing.</summary>
    public async Task SettingAsync(string command, TimeSpan timeout, CancellationToken cancellationToken)
    {
        var connection = Connection;
        await Io(command, async () => { await connection.SendAsync(command, cancellationToken).ConfigureAwait(false); return true; }).ConfigureAwait(false);
        var ack = Profile.Acknowledgement;
        if (HasPrompt)
        {
            var lines = await ReadToPromptAsync(command, timeout, cancellationToken).ConfigureAwait(false);
            CheckErrors(command, lines);
            var said = lines.Where(l => l.Trim().Length > 0).ToList();
            bool acknowledged = ack is null ? said.Count == 0 : said.Count == 1 && said[0].Trim() == ack;
            if (!acknowledged)
            {
                throw ContentError(ack is null ? "unexpected reply to a setting; expected none" : $"unexpected reply to a setting; expected \"{ack}\"",
                    command, string.Join("\n", lines));
            }

            return;
        }

        if (ack is null)
        {
            return;
        }

        var deadline = _time.GetTimestamp();
        var line = await NextLineAsync(command, deadline, timeout, cancellationToken).ConfigureAwait(false);
        CheckErrors(command, [line]);
        if (line.Trim() != ack)
        {
            throw ContentError($"unexpected reply to a setting; expected \"{ack}\"", command, line);
        }
    }

    /// <summary>Sends a query and returns its reply: the lines up to the prompt (blank ones dropped), or the next line without one.</summary>
    public async Task<IReadOnlyList<string>> QueryAsync(string command, TimeSpan timeout, CancellationToken cancellationToken)
    {
        var connection = Connection;
        await Io(command, async () => { await connection.SendAsync(command, cancellationToken).ConfigureAwait(false); return true; }).ConfigureAwait(false);
        IReadOnlyList<string> lines = HasPrompt
            ? (await ReadToPromptAsync(command, timeout, cancellationToken).ConfigureAwait(false)).Where(l => l.Trim().Length > 0).ToList()
            : [await NextLineAsync(command, _time.GetTimestamp(), timeout, cancellationToken).ConfigureAwait(false)];
        CheckErrors(command, lines);
        return lines;
    }

    /// <summary>Reads the data of one sweep or trace.</summary>
    public async Task<SweepReply> ReadSweepAsync(string command, ReplyGrammar grammar, int? expectedPoints, TimeSpan timeout, CancellationToken cancellationToken)
    {
        var connection = Connection;
        await Io(command, async () => { await connection.SendAsync(command, cancellationToken).ConfigureAwait(false); return true; }).ConfigureAwait(false);
        var parser = grammar.Begin(expectedPoints);
        var received = new List<string>();
        if (HasPrompt)
        {
            var lines = await ReadToPromptAsync(command, timeout, cancellationToken).ConfigureAwait(false);
            CheckErrors(command, lines);
            received.AddRange(lines);
            foreach (var line in lines)
            {
                var fed = parser.Feed(line);
                if (!fed.Success)
                {
                    throw ContentError($"unreadable data: {fed.Error}", command, string.Join("\n", received));
                }
            }
        }
        else
        {
            var deadline = _time.GetTimestamp();
            while (!parser.IsComplete)
            {
                var line = await NextLineAsync(command, deadline, timeout, cancellationToken).ConfigureAwait(false);
                CheckErrors(command, [line]);
                received.Add(line);
                var fed = parser.Feed(line);
                if (!fed.Success)
                {
                    throw ContentError($"unreadable data: {fed.Error}", command, line);
                }
            }
        }

        var reply = parser.Finish();
        return reply.Success ? reply.Value : throw ContentError($"unreadable data: {reply.Error}", command, Tail(received));
    }

    /// <summary>Waits <paramref name="delay"/> on the injected clock.</summary>
    public Task SettleAsync(TimeSpan delay, CancellationToken cancellationToken) =>
        delay > TimeSpan.Zero ? Task.Delay(delay, _time, cancellationToken) : Task.CompletedTask;

    /// <summary>An error about a reply whose content does not fit the profile.</summary>
    public InstrumentException ContentError(string message, string command, string reply)
    {
        // Up to the prompt, the whole reply was read: the next command starts in step.
        if (!HasPrompt)
        {
            _lostSync = true;
        }

        return new InstrumentException(message, isTransient: true) { Instrument = Name, Command = command, Reply = reply };
    }

    public async Task CloseAsync()
    {
        State = ProfileSessionState.Disconnected;
        await _transport.CloseAsync().ConfigureAwait(false);
    }

    private FramedConnection Connection => _connection ?? throw new InvalidOperationException($"{Name}: not connected; call ConnectAsync first.");

    private async Task<InstrumentIdentity> IdentifyAsync(CancellationToken cancellationToken)
    {
        var rule = Profile.Identity ?? throw new InvalidOperationException($"{Name}: the profile has no identity rule; it is not a raw profile.");
        if (rule.Query is null)
        {
            return rule.Fixed;
        }

        var command = rule.Query.Render(new TemplateArguments());
        var connection = Connection;
        var timeout = Profile.Timing.CommandTimeout;
        await Io(command, async () => { await connection.SendAsync(command, cancellationToken).ConfigureAwait(false); return true; }).ConfigureAwait(false);
        IReadOnlyList<string> lines = HasPrompt
            ? await ReadToPromptAsync(command, timeout, cancellationToken).ConfigureAwait(false)
            : [await NextLineAsync(command, _time.GetTimestamp(), timeout, cancellationToken).ConfigureAwait(false)];
        CheckErrors(command, lines);
        var identity = rule.FromReply(lines);
        if (!identity.Success)
        {
            _lostSync = true;
            throw new InstrumentException(identity.Error, isTransient: true) { Instrument = Name, Command = command, Reply = string.Join("\n", lines) };
        }

        return identity.Value;
    }

    private async Task<List<string>> ReadToPromptAsync(string command, TimeSpan timeout, CancellationToken cancellationToken)
    {
        var connection = Connection;
        var text = await Io(command, () => connection.ReadUntilPromptAsync(timeout, cancellationToken)).ConfigureAwait(false);
        if (text.Length == 0)
        {
            return [];
        }

        return text.Split(Profile.Framing.ReadTerminator).Select(l => l.EndsWith('\r') ? l[..^1] : l).ToList();
    }

    // The next non-blank line before the deadline: the timeout covers the whole reply, not each line.
    private async Task<string> NextLineAsync(string command, long startedAt, TimeSpan timeout, CancellationToken cancellationToken)
    {
        var connection = Connection;
        while (true)
        {
            var left = timeout - _time.GetElapsedTime(startedAt);
            if (left <= TimeSpan.Zero)
            {
                _lostSync = true;
                throw new InstrumentTimeoutException($"no complete reply within {timeout.TotalMilliseconds:0} ms")
                {
                    Instrument = Name,
                    Command = command,
                    Reply = "",
                };
            }

            var line = await Io(command, () => connection.ReadLineAsync(left, cancellationToken)).ConfigureAwait(false);
            if (line.Trim().Length > 0)
            {
                return line;
            }
        }
    }

    private void CheckErrors(string command, IReadOnlyList<string> lines)
    {
        if (Profile.ErrorReply is not { } rule)
        {
            return;
        }

        foreach (var line in lines)
        {
            if (rule.TryMatch(line, out var code, out var text))
            {
                var message = code == 0
                    ? $"the instrument refused the command: \"{InstrumentException.Printable(text)}\""
                    : $"the instrument refused the command with error {code}: \"{InstrumentException.Printable(text)}\"";
                throw new InstrumentReportedException(code, text, message) { Instrument = Name, Command = command, Reply = line };
            }
        }
    }

    private async Task<T> Io<T>(string? command, Func<Task<T>> io)
    {
        try
        {
            return await io().ConfigureAwait(false);
        }
        catch (InstrumentException ex) when (ex.Instrument is null)
        {
            _lostSync = true;
            throw InstrumentFailures.WithContext(ex, Name, command);
        }
        catch (IOException ex)
        {
            _lostSync = true;
            throw new InstrumentException($"the connection ({_transport.Description}) failed: {ex.Message}", isTransient: true, ex)
            {
                Instrument = Name,
                Command = command,
            };
        }
        catch (OperationCanceledException)
        {
            _lostSync = true;
            throw;
        }
    }

    private static string Tail(List<string> lines) => string.Join("\n", lines.Count > 4 ? lines[^4..] : lines);
}
