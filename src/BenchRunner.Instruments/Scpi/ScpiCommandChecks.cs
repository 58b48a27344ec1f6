namespace BenchRunner.Instruments.Scpi;

/// <summary>The checks shared by the parts of a <see cref="ScpiCommandSet"/>.</summary>
internal static class ScpiCommandChecks
{
    /// <summary>
    /// Checks one template: present when <paramref name="required"/>, parsable with exactly the
    /// placeholder <paramref name="expected"/>, and a query (holding <c>?</c>) exactly when
    /// <paramref name="query"/>: a setting that draws a reply, or a query that draws none, would
    /// put every later reply out of step.
    /// </summary>
    public static void Check(List<string> problems, string name, string? template, ScpiPlaceholder? expected, bool required, bool query = false)
    {
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
    public static ScpiCommandTemplate Template(string template, ScpiPlaceholder? expected) =>
        ScpiCommandTemplate.Parse(template, expected).Value;
}
