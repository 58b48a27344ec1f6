namespace BenchRunner.Instruments.Scpi;

/// <summary>
/// A typed hole in a <see cref="ScpiCommandTemplate"/>, written <c>{name}</c> in the template text.
/// Each kind takes one type of value and formats it one way (invariant culture, no unit suffix).
/// </summary>
public enum ScpiPlaceholder
{
    /// <summary><c>{hz}</c>: a frequency in hertz, e.g. <c>137500000</c>.</summary>
    Hz,

    /// <summary><c>{db}</c>: a ratio in decibels, e.g. <c>10</c>.</summary>
    Db,

    /// <summary><c>{dbm}</c>: a level in dBm, e.g. <c>-20.5</c>.</summary>
    Dbm,

    /// <summary><c>{points}</c>: a number of sweep points, e.g. <c>201</c>.</summary>
    Points,

    /// <summary><c>{count}</c>: a count, e.g. of sweeps to average.</summary>
    Count,

    /// <summary><c>{state}</c>: a switch, sent as <c>ON</c> or <c>OFF</c>.</summary>
    State,

    /// <summary><c>{format}</c>: a data format, sent as <c>ASCii</c>, <c>REAL,32</c> or <c>REAL,64</c>.</summary>
    Format,

    /// <summary><c>{order}</c>: a byte order, sent as <c>NORMal</c> or <c>SWAPped</c>.</summary>
    Order,
}
