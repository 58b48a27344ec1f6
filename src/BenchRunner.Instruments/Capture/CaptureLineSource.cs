using System.Text;

namespace BenchRunner.Instruments.Capture;

/// <summary>
/// Splits a capture's text into lines at LF or CR LF, telling whether each line had its line end,
/// so that a last line cut off by an interrupted recording can be told apart. A CR not followed
/// by LF stays in the line (where the reader rejects it with its column).
/// </summary>
internal sealed class CaptureLineSource(TextReader reader)
{
    private readonly char[] _buffer = new char[8192];
    private int _position;
    private int _length;

    public int LineNumber { get; private set; }

    /// <summary>The next line without its line end, or null at the end of the text.</summary>
    public string? Next(out bool terminated)
    {
        var line = new StringBuilder();
        terminated = false;
        while (true)
        {
            if (_position == _length && !Fill())
            {
                if (line.Length == 0)
                {
                    return null;
                }

                LineNumber++;
                return line.ToString();
            }

            int start = _position;
            int newline = Array.IndexOf(_buffer, '\n', _position, _length - _position);
            if (newline < 0)
            {
                line.Append(_buffer, start, _length - start);
                _position = _length;
                continue;
            }

            line.Append(_buffer, start, newline - start);
            _position = newline + 1;
            if (line.Length > 0 && line[^1] == '\r')
            {
                line.Length--;
            }

            terminated = true;
            LineNumber++;
            return line.ToString();
        }
    }

    private bool Fill()
    {
        _length = reader.Read(_buffer, 0, _buffer.Length);
        _position = 0;
        return _length > 0;
    }
}
