using BenchRunner.Core.Diagnostics;
using BenchRunner.Execution.Batch;

namespace BenchRunner.Cli.Batch;

/// <summary>
/// Where a batch's serials come from: a file (one per line, blank lines and <c>#</c> comments
/// ignored, every line checked before the first board is tested), or a reader such as standard
/// input, read one line at a time as the operator types or scans (a barcode scanner that acts
/// as a keyboard sends the serial and Enter). From a reader, an empty line or the end of input
/// ends the lot, and a line that is not a serial is refused and asked again.
/// </summary>
public sealed class SerialSource
{
    /// <summary>The question asked before each board when serials are typed or scanned.</summary>
    public const string Prompt = "Scan or type the next board's serial (empty line: end of lot): ";

    private readonly Queue<string>? _listed;
    private readonly TextReader? _reader;
    private readonly TextWriter? _prompt;
    private readonly TextWriter? _messages;
    private readonly bool _echo;

    private SerialSource(Queue<string>? listed, TextReader? reader, TextWriter? prompt, TextWriter? messages, bool echo = false)
    {
        _echo = echo;
        _listed = listed;
        _reader = reader;
        _prompt = prompt;
        _messages = messages;
    }

    /// <summary>The serials listed in <paramref name="path"/>.</summary>
    /// <exception cref="InputFormatException">A line that is not a serial (file:line:column), or a file without serials.</exception>
    /// <exception cref="IOException">The file cannot be read.</exception>
    public static SerialSource FromFile(string path)
    {
        ArgumentException.ThrowIfNullOrEmpty(path);
        if (!File.Exists(path))
        {
            throw new InputFormatException(SourceLocation.OfFile(path), "no such serials file; expected a text file with one board serial per line");
        }

        var serials = new Queue<string>();
        var lines = File.ReadAllLines(path);
        for (int i = 0; i < lines.Length; i++)
        {
            var text = lines[i];
            var trimmed = text.Trim();
            if (trimmed.Length == 0 || trimmed.StartsWith('#'))
            {
                continue;
            }

            if (!BoardSerial.TryRead(text, out var serial, out var problem))
            {
                var column = text.Length - text.TrimStart().Length + 1;
                throw new InputFormatException(new SourceLocation(path, i + 1, column), $"{problem}; expected one board serial per line, e.g. PSF-24-0001");
            }

            serials.Enqueue(serial!);
        }

        if (serials.Count == 0)
        {
            throw new InputFormatException(SourceLocation.OfFile(path), "the file lists no serials; expected one board serial per line, e.g. PSF-24-0001");
        }

        return new SerialSource(serials, null, null, null);
    }

    /// <summary>Serials read one line at a time from <paramref name="reader"/>.</summary>
    /// <param name="reader">Standard input, or any reader.</param>
    /// <param name="prompt">Where to ask for each serial, or null to read without asking (a pipe).</param>
    /// <param name="messages">Where to say why a line was refused.</param>
    /// <param name="echo">Write each line read after the prompt (when the input is not a terminal, which would show it).</param>
    public static SerialSource FromReader(TextReader reader, TextWriter? prompt, TextWriter messages, bool echo = false) =>
        new(null, reader ?? throw new ArgumentNullException(nameof(reader)), prompt, messages ?? throw new ArgumentNullException(nameof(messages)), echo);

    /// <summary>The next serial, or null at the end of the lot.</summary>
    /// <exception cref="OperationCanceledException">Cancelled while waiting for input.</exception>
    public async Task<string?> NextAsync(CancellationToken cancellationToken)
    {
        if (_listed is not null)
        {
            return _listed.TryDequeue(out var next) ? next : null;
        }

        while (true)
        {
            _prompt?.Write(Prompt);
            _prompt?.Flush();
            // Console input reads synchronously and cannot be interrupted: read on the pool and stop
            // waiting on Ctrl+C, so the batch ends at once.
            var reader = _reader!;
            var line = await Task.Run(reader.ReadLine, CancellationToken.None).WaitAsync(cancellationToken).ConfigureAwait(false);
            if (_echo && _prompt is not null)
            {
                _prompt.WriteLine(line ?? "");
            }

            if (line is null || line.Trim().Length == 0)
            {
                return null;
            }

            if (line.TrimStart().StartsWith('#'))
            {
                continue;
            }

            if (BoardSerial.TryRead(line, out var serial, out var problem))
            {
                return serial;
            }

            _messages!.WriteLine($"  not a serial: {problem}; scan or type it again.");
        }
    }
}
