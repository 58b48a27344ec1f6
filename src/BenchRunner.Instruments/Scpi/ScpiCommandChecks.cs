namespace BenchRunner.Instruments.Scpi;

/// <summary>The checks shared by the parts of a <see cref="ScpiCommandSet"/>, a registered kind's section included.</summary>
public static class ScpiCommandChecks
{
    /// <summary>
    /// Checks one template: present when <paramref name="required"/>, parsable with exactly the
    /// placeholder <paramref name="expected"/>, and a query (holding <c>?</c>) exactly when
    /// <paramref name="query"/>: a setting that draws a reply, or a query that draws none, would
    /// put every later reply out of step.
    /// </summary>
    /// <param name="problems">Where a problem is added, as <c>name: what</c>.</param>
    /// <param name="name">Where the command sits in the set, e.g. <c>network.start</c>.</param>
    /// <param name="template">The command, or null when left out.</param>
    /// <param name="expected">The one placeholder it must hold, or null for none.</param>
    /// <param name="required">Whether leaving it out is a problem.</param>
    /// <param name="query">Whether it must be a query (holding <c>?</c>) rather than a setting.</param>
    public static void Check(ICollection<string> problems, string name, string? template, ScpiPlaceholder? expected, bool required, bool query = false)
    {
        ArgumentNullException.ThrowIfNull(problems);
        if (template is null)
        {
            if (required)
            {
                problems.Add($"{name}: a command is required");
            }

            return;
        }

        var parsed = ScpiCommandTemplate.Parse(template, expected);
        if (!parsed.Success)
        {
            problems.Add($"{name}: {parsed.Error}");
        }
        else if (query && !template.Contains('?', StringComparison.Ordinal))
        {
            problems.Add($"{name}: \"{template}\" must be a query (with '?'), as a reply is read after it");
        }
        else if (!query && template.Contains('?', StringComparison.Ordinal))
        {
            problems.Add($"{name}: \"{template}\" must not be a query (no '?'), as no reply is read after it");
        }
    }

    /// <summary>Parses a template that <see cref="ScpiCommandSet.Validate"/> has already accepted.</summary>
    internal static ScpiCommandTemplate Template(string template, ScpiPlaceholder? expected) =>
        ScpiCommandTemplate.Parse(template, expected).Value;
}
