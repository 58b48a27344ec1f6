namespace BenchRunner.Simulator.Protocols.Scpi;

/// <summary>
/// The four coupled frequency settings of a sweep under one prefix: <c>STARt</c>, <c>STOP</c>,
/// <c>CENTer</c> and <c>SPAN</c>, each with its query. Start and stop are what the instrument keeps;
/// centre and span are derived. Moving the start to or past the stop carries the stop along (the
/// span kept, up to the highest stop), and likewise the other way (common practice, no source);
/// centre keeps the span and span keeps the centre. A result outside the ranges is refused with −222.
/// </summary>
internal sealed class ScpiFrequencySpan(
    Func<SettingRange> startRange,
    Func<SettingRange> stopRange,
    Func<(double Start, double Stop)> read,
    Action<double, double> write)
{
    public void Declare(ScpiCommandTree tree, string prefix)
    {
        tree.NumberSetting(prefix + ":STARt", ScpiUnit.Hertz, startRange, () => read().Start, SetStart)
            .NumberSetting(prefix + ":STOP", ScpiUnit.Hertz, stopRange, () => read().Stop, SetStop)
            .NumberSetting(prefix + ":CENTer", ScpiUnit.Hertz, CentreRange, () => (read().Start + read().Stop) / 2, SetCentre)
            .NumberSetting(prefix + ":SPAN", ScpiUnit.Hertz, SpanRange, () => read().Stop - read().Start, SetSpan);
    }

    private SettingRange CentreRange()
    {
        var (start, stop) = (startRange(), stopRange());
        return SettingRange.Of(start.Minimum, stop.Maximum, (start.Default + stop.Default) / 2, start.Step);
    }

    private SettingRange SpanRange()
    {
        var (start, stop) = (startRange(), stopRange());
        double smallest = Math.Max(stop.Step, 1);
        return SettingRange.Of(smallest, Math.Max(smallest, stop.Maximum - start.Minimum), Math.Max(smallest, stop.Default - start.Default), stop.Step);
    }

    private void SetStart(double start)
    {
        var (oldStart, oldStop) = read();
        var stop = start < oldStop ? oldStop : Math.Min(start + (oldStop - oldStart), stopRange().Maximum);
        Apply(start, stop);
    }

    private void SetStop(double stop)
    {
        var (oldStart, oldStop) = read();
        var start = stop > oldStart ? oldStart : Math.Max(stop - (oldStop - oldStart), startRange().Minimum);
        Apply(start, stop);
    }

    private void SetCentre(double centre)
    {
        var (start, stop) = read();
        var half = (stop - start) / 2;
        Apply(startRange().RoundToStep(centre - half), stopRange().RoundToStep(centre + half));
    }

    private void SetSpan(double span)
    {
        var (start, stop) = read();
        var centre = (start + stop) / 2;
        Apply(startRange().RoundToStep(centre - span / 2), stopRange().RoundToStep(centre + span / 2));
    }

    private void Apply(double start, double stop)
    {
        if (!startRange().Contains(start) || !stopRange().Contains(stop) || stop <= start)
        {
            throw new ScpiCommandException(ScpiStandardErrors.DataOutOfRange);
        }

        write(start, stop);
    }
}
