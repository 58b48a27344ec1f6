using BenchRunner.Core.Runs;
namespace BenchRunner.Storage;

/// <summary>
/// What is known of a run when it starts; given to <see cref="IResultWriter.StartRunAsync"/>. Optional
/// text is null when absent (blank text is refused).
/// </summary>
/// <param name="Mode">Single run, tuning session or batch board.</param>
/// <param name="PlanName">The plan's name.</param>
/// <param name="PlanText">The plan's full text, stored as given; the store adds its SHA-256 (<see cref="PlanHash"/>).</param>
/// <param name="SoftwareVersion">The version of the software that ran it.</param>
/// <param name="Host">The machine it ran on.</param>
public sealed record RunRecord(RunMode Mode, string PlanName, string PlanText, string SoftwareVersion, string Host)
{
    /// <summary>The bench configuration's name, if one was used.</summary>
    public string? BenchName { get; init; }

    /// <summary>The bench configuration's full text, if one was used.</summary>
    public string? BenchText { get; init; }

    /// <summary>Who ran it.</summary>
    public string? Operator { get; init; }

    /// <summary>The serial number of the device under test, e.g. <c>PSF-24-0001</c>.</summary>
    public string? DutSerial { get; init; }

    /// <summary>The production lot the device belongs to.</summary>
    public string? Lot { get; init; }

    /// <summary>True when the device was tested before and this run tests it again.</summary>
    public bool IsRetest { get; init; }

    /// <summary>Free text from the operator.</summary>
    public string? Notes { get; init; }

    /// <summary>Anything else, as a JSON document; refused when it is not valid JSON.</summary>
    public string? ExtraJson { get; init; }
}
