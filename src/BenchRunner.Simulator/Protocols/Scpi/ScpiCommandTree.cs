using BenchRunner.Instruments.Capabilities;
namespace BenchRunner.Simulator.Protocols.Scpi;

/// <summary>
/// The commands a simulated SCPI instrument understands, declared the way SCPI documents write them:
/// <c>[SENSe#]:FREQuency:STARt</c> for a setting and <c>[SENSe#]:FREQuency:STARt?</c> for its query.
/// Each keyword shows its short form in upper case; <c>[ ]</c> marks a node that may be left out;
/// <c>#</c> after a keyword lets it take a numeric suffix (1 when omitted), which the handler finds in
/// <see cref="ScpiCommandContext.Suffixes"/>. Common commands start with <c>*</c> (<c>*IDN?</c>).
/// <para>
/// Received headers are matched by <see cref="ScpiServer"/>: the short or the whole long form of each
/// keyword, in any letter case (SCPI-1999 Vol 1 §6.2.1; from memory).
/// </para>
/// </summary>
public sealed class ScpiCommandTree
{
    private readonly Dictionary<(string Name, bool Query), Delegate> _common = [];
    private readonly List<string> _headers = [];

    /// <summary>The root of the tree, where a message starts and a leading colon returns to.</summary>
    internal ScpiNode Root { get; } = new(null, optional: false, takesSuffix: false);

    /// <summary>Every header declared, as written, in the order declared.</summary>
    public IReadOnlyList<string> Headers => _headers;

    /// <summary>Declares a command (no reply) and what it does.</summary>
    /// <param name="header">E.g. <c>[SENSe#]:SWEep:POINts</c> or <c>*RST</c>; no <c>?</c>.</param>
    /// <param name="handler">Runs the command; refuses it by throwing <see cref="ScpiCommandException"/>.</param>
    /// <returns>This tree, for chaining.</returns>
    /// <exception cref="ArgumentException">A malformed header, one declared already, or one whose nodes conflict with earlier ones.</exception>
    public ScpiCommandTree Command(string header, Action<ScpiCommandContext> handler)
    {
        ArgumentNullException.ThrowIfNull(handler);
        Declare(header, query: false, handler);
        return this;
    }

    /// <summary>Declares a query and how it is answered.</summary>
    /// <param name="header">E.g. <c>[SENSe#]:SWEep:POINts?</c> or <c>*IDN?</c>; ends with <c>?</c>.</param>
    /// <param name="handler">Returns the response; refuses the query by throwing <see cref="ScpiCommandException"/>.</param>
    /// <returns>This tree, for chaining.</returns>
    /// <exception cref="ArgumentException">A malformed header, one declared already, or one whose nodes conflict with earlier ones.</exception>
    public ScpiCommandTree Query(string header, Func<ScpiCommandContext, ScpiResponse> handler)
    {
        ArgumentNullException.ThrowIfNull(handler);
        Declare(header, query: true, handler);
        return this;
    }

    /// <summary>Declares <c>*IDN?</c>, answered with the four identity fields (IEEE 488.2 §10.14).</summary>
    /// <returns>This tree, for chaining.</returns>
    public ScpiCommandTree Identification(InstrumentIdentity identity)
    {
        ArgumentNullException.ThrowIfNull(identity);
        return Query("*IDN?", c =>
        {
            c.ExpectParameters(0, 0);
            return ScpiResponse.Text(identity.ToString());
        });
    }

    /// <summary>The handler of a common command, or null.</summary>
    internal Delegate? Common(string name, bool query) => _common.GetValueOrDefault((name, query));

    /// <summary>
    /// Follows the keywords of a header from <paramref name="start"/> to a node with a handler of the
    /// wanted kind, passing over optional nodes that were left out. Null when there is none.
    /// </summary>
    internal ScpiResolution? Resolve(ScpiNode start, IReadOnlyList<ScpiMnemonic> mnemonics, bool query)
    {
        var matched = new ScpiNode[mnemonics.Count];
        var suffixes = new List<int>();
        if (!Walk(start, 0, mnemonics, query, matched, suffixes, out var leaf))
        {
            return null;
        }

        // SCPI-1999 Vol 1 §6.2.4 (from memory): a following header without a leading colon is taken
        // relative to the node of this header's next-to-last keyword.
        var pathAfter = mnemonics.Count >= 2 ? matched[^2] : start;
        return new ScpiResolution(leaf, pathAfter, suffixes);
    }

    private static bool Walk(ScpiNode node, int index, IReadOnlyList<ScpiMnemonic> mnemonics, bool query,
        ScpiNode[] matched, List<int> suffixes, out ScpiNode leaf)
    {
        if (index == mnemonics.Count && node.Handles(query))
        {
            leaf = node;
            return true;
        }

        if (index < mnemonics.Count)
        {
            foreach (var child in node.Children)
            {
                if (!child.Matches(mnemonics[index]))
                {
                    continue;
                }

                matched[index] = child;
                if (Enter(child, mnemonics[index].Suffix ?? 1, index + 1, mnemonics, query, matched, suffixes, out leaf))
                {
                    return true;
                }
            }
        }

        foreach (var child in node.Children)
        {
            if (child.Optional && Enter(child, 1, index, mnemonics, query, matched, suffixes, out leaf))
            {
                return true;
            }
        }

        leaf = null!;
        return false;
    }

    private static bool Enter(ScpiNode child, int suffix, int index, IReadOnlyList<ScpiMnemonic> mnemonics, bool query,
        ScpiNode[] matched, List<int> suffixes, out ScpiNode leaf)
    {
        if (child.TakesSuffix)
        {
            suffixes.Add(suffix);
        }

        if (Walk(child, index, mnemonics, query, matched, suffixes, out leaf))
        {
            return true;
        }

        if (child.TakesSuffix)
        {
            suffixes.RemoveAt(suffixes.Count - 1);
        }

        return false;
    }

    private void Declare(string header, bool query, Delegate handler)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(header);
        if (header.EndsWith('?') != query)
        {
            throw new ArgumentException(query
                ? $"The query header \"{header}\" must end with '?'."
                : $"The command header \"{header}\" must not end with '?'; declare queries with Query.", nameof(header));
        }

        var body = query ? header[..^1] : header;
        if (body.StartsWith('*'))
        {
            var name = body[1..];
            if (name.Length == 0 || !name.All(char.IsAsciiLetterUpper))
            {
                throw new ArgumentException($"The common command \"{header}\" must be '*' and upper-case letters.", nameof(header));
            }

            if (!_common.TryAdd((name, query), handler))
            {
                throw new ArgumentException($"\"{header}\" is declared already.", nameof(header));
            }

            _headers.Add(header);
            return;
        }

        var node = Root;
        foreach (var (keyword, optional, takesSuffix) in ParsePattern(body))
        {
            var child = node.Children.FirstOrDefault(c => c.Keyword!.Long == keyword.Long);
            if (child is null)
            {
                child = new ScpiNode(keyword, optional, takesSuffix);
                node.Children.Add(child);
            }
            else if (child.Optional != optional || child.TakesSuffix != takesSuffix || child.Keyword!.Short != keyword.Short)
            {
                throw new ArgumentException($"In \"{header}\", {keyword} is declared differently from an earlier header.", nameof(header));
            }

            node = child;
        }

        if (node.Handles(query))
        {
            throw new ArgumentException($"\"{header}\" is declared already.", nameof(header));
        }

        if (query)
        {
            node.Query = (Func<ScpiCommandContext, ScpiResponse>)handler;
        }
        else
        {
            node.Command = (Action<ScpiCommandContext>)handler;
        }

        _headers.Add(header);
    }

    private static List<(ScpiKeyword Keyword, bool Optional, bool TakesSuffix)> ParsePattern(string body)
    {
        var nodes = new List<(ScpiKeyword, bool, bool)>();
        int i = body.StartsWith(':') ? 1 : 0;
        while (i < body.Length)
        {
            string text;
            bool optional = body[i] == '[';
            if (optional)
            {
                int close = body.IndexOf(']', i);
                if (close < 0)
                {
                    throw new ArgumentException($"The header \"{body}\" has a '[' without its ']'.", nameof(body));
                }

                text = body[(i + 1)..close].TrimStart(':');
                i = close + 1;
            }
            else
            {
                int end = body.IndexOfAny([':', '['], i);
                end = end < 0 ? body.Length : end;
                text = body[i..end];
                i = end;
            }

            if (i < body.Length && body[i] == ':')
            {
                i++;
            }

            bool takesSuffix = text.EndsWith('#');
            var word = takesSuffix ? text[..^1] : text;
            if (word.Length == 0 || !word.All(char.IsAsciiLetter))
            {
                throw new ArgumentException($"The header \"{body}\" has the keyword \"{text}\"; keywords are letters, optionally followed by '#'.", nameof(body));
            }

            nodes.Add((ScpiKeyword.Parse(word), optional, takesSuffix));
        }

        if (nodes.Count == 0)
        {
            throw new ArgumentException("A header needs at least one keyword.", nameof(body));
        }

        return nodes;
    }
}
