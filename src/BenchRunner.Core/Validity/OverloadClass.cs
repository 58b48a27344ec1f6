namespace BenchRunner.Core.Validity;

/// <summary>How a line behaved when the input attenuation was raised.</summary>
public enum OverloadClass
{
    /// <summary>Its corrected level stayed within the tolerance: it is at the analyser's input.</summary>
    Real,

    /// <summary>It fell by about the step: a second-order product made in the analyser.</summary>
    AnalyserSecondOrder,

    /// <summary>It fell by about twice the step: a third-order product made in the analyser.</summary>
    AnalyserThirdOrder,

    /// <summary>It changed by an amount that fits none of the above; see the change.</summary>
    ChangedOtherwise,

    /// <summary>
    /// It was found at the lower attenuation only, although it stood clear of the higher sweep's
    /// noise floor: a real line would still have been seen, so the analyser made it.
    /// </summary>
    VanishedAnalyserMade,

    /// <summary>
    /// It stood less than its least prominence plus the tolerance above the higher sweep's noise floor
    /// (raised by the step), which would have hidden it even if it were real; whatever was found near it
    /// in the higher sweep may be noise: undecided.
    /// </summary>
    HiddenByNoise,
}
