namespace BenchRunner.Core.TraceFiles;

/// <summary>Splits a line of a text trace file into whitespace-separated tokens, keeping columns.</summary>
internal static class LineTokenizer
{
    /// <summary>
    /// The tokens of <paramref name="line"/> from <paramref name="start"/> (0-based) up to the end
    /// or up to <paramref name="commentStart"/>, separated by spaces and tabs. A tab counts as one column.
    /// </summary>
    public static List<TextToken> Split(string line, int start = 0, char? commentStart = null)
    {
        var tokens = new List<TextToken>();
        int i = start;
        while (i < line.Length)
        {
            char c = line[i];
            if (c == commentStart)
            {
                break;
            }

            if (c == ' ' || c == '\t')
            {
                i++;
                continue;
            }

            int begin = i;
            while (i < line.Length && line[i] != ' ' && line[i] != '\t' && line[i] != commentStart)
            {
                i++;
            }

            tokens.Add(new TextToken(line[begin..i], begin + 1));
        }

        return tokens;
    }
}
