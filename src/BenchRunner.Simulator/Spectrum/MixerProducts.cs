namespace BenchRunner.Simulator.Spectrum;

/// <summary>
/// The distortion products the analyser's own mixer makes from the signals at its input, from
/// the intercept points referred to the mixer. With mixer levels Pm = Pin − attenuation (dBm):
/// <list type="bullet">
/// <item>2nd harmonic at 2f: 2·Pm − IIP2;</item>
/// <item>3rd harmonic at 3f: 3·Pm − 2·IIP3;</item>
/// <item>second-order products at f1 + f2 and |f1 − f2|: Pm1 + Pm2 − IIP2;</item>
/// <item>third-order products at |2f1 ± f2| (and |2f2 ± f1|): 2·Pm1 + Pm2 − 2·IIP3.</item>
/// </list>
/// Each product is referred back to the input like a real signal (+ attenuation) for display, so
/// 10 dB more attenuation lowers a second-order product by 10 dB and a third-order one by 20 dB
/// ("Spectrum Analysis Basics", Application Note 150, ch. "Dynamic Range"; from memory).
/// Products of products and products of three different signals are left out.
/// </summary>
internal static class MixerProducts
{
    /// <summary>
    /// Adds every product at or above <paramref name="floorDbm"/> (displayed level) to
    /// <paramref name="renderer"/>; weaker ones cannot move the display.
    /// </summary>
    public static void AddTo(
        SweepRenderer renderer, IReadOnlyList<Emission> inputs, double attenuationDb, double iip2Dbm, double iip3Dbm, double floorDbm)
    {
        int n = inputs.Count;
        Span<double> mixer = n <= 64 ? stackalloc double[n] : new double[n];
        for (int i = 0; i < n; i++)
        {
            mixer[i] = inputs[i].Level.Dbm - attenuationDb;
        }

        for (int i = 0; i < n; i++)
        {
            var a = inputs[i];
            Add(renderer, a, 2, null, 0, SecondHarmonicDbm(mixer[i], iip2Dbm) + attenuationDb, floorDbm);
            Add(renderer, a, 3, null, 0, ThirdHarmonicDbm(mixer[i], iip3Dbm) + attenuationDb, floorDbm);
            for (int k = 0; k < n; k++)
            {
                if (k == i)
                {
                    continue;
                }

                var b = inputs[k];
                double third = ThirdOrderDbm(mixer[i], mixer[k], iip3Dbm) + attenuationDb;
                Add(renderer, a, 2, b, -1, third, floorDbm);
                Add(renderer, a, 2, b, +1, third, floorDbm);
                if (k > i)
                {
                    double second = SecondOrderDbm(mixer[i], mixer[k], iip2Dbm) + attenuationDb;
                    Add(renderer, a, 1, b, +1, second, floorDbm);
                    Add(renderer, a, 1, b, -1, second, floorDbm);
                }
            }
        }
    }

    /// <summary>The 2nd harmonic at the mixer: 2·Pm − IIP2, dBm.</summary>
    public static double SecondHarmonicDbm(double mixerDbm, double iip2Dbm) => 2 * mixerDbm - iip2Dbm;

    /// <summary>The 3rd harmonic at the mixer: 3·Pm − 2·IIP3, dBm.</summary>
    public static double ThirdHarmonicDbm(double mixerDbm, double iip3Dbm) => 3 * mixerDbm - 2 * iip3Dbm;

    /// <summary>A second-order product of two signals at the mixer: P1 + P2 − IIP2, dBm.</summary>
    public static double SecondOrderDbm(double mixer1Dbm, double mixer2Dbm, double iip2Dbm) => mixer1Dbm + mixer2Dbm - iip2Dbm;

    /// <summary>The third-order product at 2f1 ± f2 at the mixer: 2·P1 + P2 − 2·IIP3, dBm.</summary>
    public static double ThirdOrderDbm(double mixer1Dbm, double mixer2Dbm, double iip3Dbm) => 2 * mixer1Dbm + mixer2Dbm - 2 * iip3Dbm;

    private static void Add(SweepRenderer renderer, Emission a, int orderA, Emission? b, int orderB, double levelDbm, double floorDbm)
    {
        if (levelDbm < floorDbm)
        {
            return;
        }

        if (Emission.Product(a, orderA, b, orderB, levelDbm) is { } product)
        {
            renderer.Add(product, levelDbm);
        }
    }
}
