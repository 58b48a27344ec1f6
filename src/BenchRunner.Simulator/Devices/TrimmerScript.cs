using System.Collections.Immutable;

namespace BenchRunner.Simulator.Devices;

/// <summary>
/// A technician's hand on the trimmers, as settings against the time elapsed since the script
/// started (not against sweeps: the hand moves at its own pace however fast the analyser sweeps).
/// Between keyframes each trimmer moves along a smooth S-curve (it slows down at every keyframe,
/// where the hand stops or turns back); before the first keyframe the first settings hold, after
/// the last the last.
/// </summary>
public sealed class TrimmerScript
{
    /// <summary>Creates a script from keyframes.</summary>
    /// <exception cref="ArgumentException">No keyframes, a negative time, or times not strictly increasing.</exception>
    public TrimmerScript(IEnumerable<TrimmerKeyframe> keyframes)
    {
        ArgumentNullException.ThrowIfNull(keyframes);
        Keyframes = [.. keyframes];
        if (Keyframes.Length == 0)
        {
            throw new ArgumentException("A trimmer script needs at least one keyframe.", nameof(keyframes));
        }

        for (int i = 0; i < Keyframes.Length; i++)
        {
            if (Keyframes[i].At < TimeSpan.Zero)
            {
                throw new ArgumentException($"Keyframe {i} is at a negative time ({Keyframes[i].At}).", nameof(keyframes));
            }

            if (i > 0 && Keyframes[i].At <= Keyframes[i - 1].At)
            {
                throw new ArgumentException($"Keyframe {i} ({Keyframes[i].At}) does not come after keyframe {i - 1} ({Keyframes[i - 1].At}).", nameof(keyframes));
            }
        }
    }

    /// <summary>The keyframes, in time order.</summary>
    public ImmutableArray<TrimmerKeyframe> Keyframes { get; }

    /// <summary>The time of the last keyframe, after which nothing moves.</summary>
    public TimeSpan Duration => Keyframes[^1].At;

    /// <summary>
    /// A technician tuning one trimmer: from <paramref name="from"/>, turning the trimmer at
    /// <paramref name="position"/> towards <paramref name="targetPicofarads"/>, going past it by
    /// <paramref name="overshoot"/> of the distance at 40 % of the time, back a little below it at
    /// 65 %, and settling on it at the end of <paramref name="duration"/>.
    /// </summary>
    /// <param name="from">The settings when the technician starts.</param>
    /// <param name="position">The trimmer turned: 0 (input), 1 (middle) or 2 (output).</param>
    /// <param name="targetPicofarads">Where the trimmer ends up, in pF.</param>
    /// <param name="duration">How long the whole adjustment takes, above zero.</param>
    /// <param name="overshoot">The overshoot as a fraction of the distance, in [0, 1); 0.3 by default.</param>
    /// <exception cref="ArgumentOutOfRangeException">A value out of its range.</exception>
    public static TrimmerScript Tuning(TrimmerSettings from, int position, double targetPicofarads, TimeSpan duration, double overshoot = 0.3)
    {
        if (duration <= TimeSpan.Zero)
        {
            throw new ArgumentOutOfRangeException(nameof(duration), duration, "The adjustment must take some time.");
        }

        if (!(overshoot >= 0 && overshoot < 1))
        {
            throw new ArgumentOutOfRangeException(nameof(overshoot), overshoot, "The overshoot is a fraction in [0, 1).");
        }

        double start = from[position];
        double distance = targetPicofarads - start;
        TrimmerKeyframe Key(double fraction, double picofarads) => new(duration * fraction, from.With(position, picofarads));
        return new TrimmerScript(
        [
            Key(0, start),
            Key(0.4, targetPicofarads + overshoot * distance),
            Key(0.65, targetPicofarads - 0.3 * overshoot * distance),
            Key(1, targetPicofarads),
        ]);
    }

    /// <summary>The settings at <paramref name="elapsed"/> after the start.</summary>
    public TrimmerSettings At(TimeSpan elapsed)
    {
        if (elapsed <= Keyframes[0].At)
        {
            return Keyframes[0].Settings;
        }

        for (int i = 1; i < Keyframes.Length; i++)
        {
            if (elapsed < Keyframes[i].At)
            {
                var a = Keyframes[i - 1];
                var b = Keyframes[i];
                double t = (elapsed - a.At) / (b.At - a.At);
                double s = t * t * (3 - 2 * t);
                return TrimmerSettings.FromPicofarads(
                    Lerp(a.Settings.InputPicofarads, b.Settings.InputPicofarads, s),
                    Lerp(a.Settings.MiddlePicofarads, b.Settings.MiddlePicofarads, s),
                    Lerp(a.Settings.OutputPicofarads, b.Settings.OutputPicofarads, s));
            }
        }

        return Keyframes[^1].Settings;
    }

    private static double Lerp(double a, double b, double s) => a + (b - a) * s;
}
