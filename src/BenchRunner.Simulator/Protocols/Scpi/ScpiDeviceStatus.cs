using BenchRunner.Instruments.Scpi;

namespace BenchRunner.Simulator.Protocols.Scpi;

/// <summary>
/// The status of a simulated SCPI instrument: its error queue (SCPI-1999 Vol 2 §21.8: first in,
/// first out; when full, the newest entry is replaced by −350 "Queue overflow") and the Standard
/// Event Status Register (IEEE 488.2 §11.5.1), whose error bits follow the class of each error
/// reported. Not thread-safe: the server uses it one line at a time.
/// </summary>
public sealed class ScpiDeviceStatus
{
    /// <summary>The default number of entries the error queue holds: 10.</summary>
    public const int DefaultQueueCapacity = 10;

    private readonly List<ScpiError> _queue = [];

    /// <summary>Creates the status at power-on: an empty queue and the PON bit set.</summary>
    /// <param name="queueCapacity">Entries the error queue holds (2 to 1000; default 10).</param>
    /// <exception cref="ArgumentOutOfRangeException">A capacity outside 2 to 1000.</exception>
    public ScpiDeviceStatus(int queueCapacity = DefaultQueueCapacity)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(queueCapacity, 2);
        ArgumentOutOfRangeException.ThrowIfGreaterThan(queueCapacity, 1000);
        QueueCapacity = queueCapacity;
        EventStatus = StandardEventStatus.PowerOn;
    }

    /// <summary>The number of entries the error queue holds.</summary>
    public int QueueCapacity { get; }

    /// <summary>How many entries wait in the error queue.</summary>
    public int QueueCount => _queue.Count;

    /// <summary>The Standard Event Status Register as it stands.</summary>
    public StandardEventStatus EventStatus { get; private set; }

    /// <summary>
    /// Reports an error: it joins the queue (or, when the queue is full, the newest entry becomes
    /// −350 "Queue overflow"), and the register bit of its class is set.
    /// </summary>
    /// <param name="error">The standard entry, e.g. <see cref="ScpiStandardErrors.UndefinedHeader"/>.</param>
    /// <param name="detail">Device-dependent information appended to the text after a semicolon (SCPI-1999 Vol 2 §21.8), or null.</param>
    public void Report(ScpiError error, string? detail = null)
    {
        EventStatus |= BitFor(error.Code);
        var entry = string.IsNullOrEmpty(detail) ? error : error with { Text = error.Text + ";" + detail };
        if (_queue.Count < QueueCapacity)
        {
            _queue.Add(entry);
        }
        else
        {
            _queue[^1] = ScpiStandardErrors.QueueOverflow;
        }
    }

    /// <summary>Takes the oldest entry off the queue; <c>0,"No error"</c> when it is empty.</summary>
    public ScpiError NextError()
    {
        if (_queue.Count == 0)
        {
            return new ScpiError(0, "No error");
        }

        var oldest = _queue[0];
        _queue.RemoveAt(0);
        return oldest;
    }

    /// <summary>Returns the event register and clears it (<c>*ESR?</c>, IEEE 488.2 §10.12).</summary>
    public StandardEventStatus ReadAndClearEventStatus()
    {
        var value = EventStatus;
        EventStatus = StandardEventStatus.None;
        return value;
    }

    /// <summary>Sets the OPC bit (<c>*OPC</c>, IEEE 488.2 §10.18): every operation of the simulator is complete when its command returns.</summary>
    public void SetOperationComplete() => EventStatus |= StandardEventStatus.OperationComplete;

    /// <summary>Empties the error queue and clears the event register (<c>*CLS</c>, IEEE 488.2 §10.3).</summary>
    public void Clear()
    {
        _queue.Clear();
        EventStatus = StandardEventStatus.None;
    }

    /// <summary>The register bit for an error number: CME, EXE, DDE or QYE by its hundred (none for other numbers).</summary>
    public static StandardEventStatus BitFor(int code) => code switch
    {
        <= -100 and > -200 => StandardEventStatus.CommandError,
        <= -200 and > -300 => StandardEventStatus.ExecutionError,
        <= -300 and > -400 => StandardEventStatus.DeviceDependentError,
        <= -400 and > -500 => StandardEventStatus.QueryError,
        _ => StandardEventStatus.None,
    };
}
