using System.Globalization;
using System.Numerics;
using BenchRunner.Core.Traces;
using BenchRunner.Instruments.Capabilities;

namespace BenchRunner.Instruments.Scpi;

/// <summary>The network-analyser capability of a <see cref="ScpiInstrument"/>.</summary>
internal sealed class ScpiNetworkAnalyser(ScpiInstrument instrument, ScpiNetworkCommands commands) : INetworkAnalyser
{
    private NetworkSweep? _sweep;

    public async Task ConfigureSweepAsync(NetworkSweep sweep, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(sweep);
        instrument.CheckFrequency(sweep.Start, "sweep start");
        instrument.CheckFrequency(sweep.Stop, "sweep stop");
        if (sweep.IfBandwidth is not null && commands.IfBandwidth is null)
        {
            throw instrument.Unsupported("the IF bandwidth");
        }

        if (sweep.Averages is > 1 && commands.AverageCount is null)
        {
            throw instrument.Unsupported("averaging");
        }

        // A sweep set only in part must not be taken for the one asked.
        _sweep = null;
        var session = instrument.Session;
        await session.WriteAsync(ScpiInstrument.Template(commands.Start!, ScpiPlaceholder.Hz).Render(sweep.Start), cancellationToken).ConfigureAwait(false);
        await session.WriteAsync(ScpiInstrument.Template(commands.Stop!, ScpiPlaceholder.Hz).Render(sweep.Stop), cancellationToken).ConfigureAwait(false);
        await session.WriteAsync(ScpiInstrument.Template(commands.Points!, ScpiPlaceholder.Points).Render(sweep.Points), cancellationToken).ConfigureAwait(false);
        if (sweep.IfBandwidth is { } bandwidth)
        {
            await session.WriteAsync(ScpiInstrument.Template(commands.IfBandwidth!, ScpiPlaceholder.Hz).Render(bandwidth), cancellationToken).ConfigureAwait(false);
        }

        if (sweep.Averages is { } averages)
        {
            if (averages > 1)
            {
                await session.WriteAsync(ScpiInstrument.Template(commands.AverageCount!, ScpiPlaceholder.Count).Render(averages), cancellationToken).ConfigureAwait(false);
            }

            if (commands.AverageState is { } state)
            {
                await session.WriteAsync(ScpiInstrument.Template(state, ScpiPlaceholder.State).Render(averages > 1), cancellationToken).ConfigureAwait(false);
            }
        }

        _sweep = sweep;
    }

    public async Task<IReadOnlyList<ComplexTrace>> AcquireAsync(IReadOnlyList<TraceQuantity> parameters, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(parameters);
        if (parameters.Count == 0)
        {
            throw new ArgumentException("Ask for at least one S-parameter.", nameof(parameters));
        }

        var sweep = _sweep ?? throw new InvalidOperationException($"{instrument.Name}: configure the sweep before acquiring.");
        var queries = parameters.Select(p => commands.TraceQueries.TryGetValue(p, out var query) ? query : throw instrument.Unsupported($"fetching {p}")).ToList();

        await instrument.SweepAsync(cancellationToken).ConfigureAwait(false);
        FrequencyAxis axis;
        if (commands.FrequencyListQuery is { } listQuery)
        {
            axis = await instrument.FetchAxisAsync(listQuery, cancellationToken).ConfigureAwait(false);
            instrument.CheckCount("the frequency list", listQuery, sweep.Points, axis.Count, 1, $"{axis.Count} frequencies", PointsHint(sweep));
        }
        else
        {
            axis = FrequencyAxis.Linear(sweep.Start, sweep.Stop, sweep.Points);
        }

        var traces = new List<ComplexTrace>(parameters.Count);
        for (int i = 0; i < parameters.Count; i++)
        {
            var (values, reply) = await instrument.FetchNumbersAsync(queries[i], cancellationToken).ConfigureAwait(false);
            var what = parameters[i].ToString();
            instrument.CheckCount(what, queries[i], axis.Count, values.Length, 2, reply, PointsHint(sweep));
            instrument.CheckMeasured(what, queries[i], values, axis, 2, reply);
            var samples = new Complex[axis.Count];
            for (int p = 0; p < samples.Length; p++)
            {
                samples[p] = new Complex(values[2 * p], values[2 * p + 1]);
            }

            traces.Add(new ComplexTrace(axis, parameters[i], samples));
        }

        return traces;
    }

    private string PointsHint(NetworkSweep sweep) =>
        $"did the instrument accept \"{ScpiInstrument.Template(commands.Points!, ScpiPlaceholder.Points).Render(sweep.Points)}\"? ({sweep.Points.ToString(CultureInfo.InvariantCulture)} points configured)";
}
