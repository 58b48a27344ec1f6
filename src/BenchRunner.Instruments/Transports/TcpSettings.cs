namespace BenchRunner.Instruments.Transports;

/// <summary>Where and how to reach an instrument over TCP. Default connect timeout 5 s.</summary>
public sealed record TcpSettings
{
    /// <summary>The default time allowed for the connection to be made, 5 s.</summary>
    public static readonly TimeSpan DefaultConnectTimeout = TimeSpan.FromSeconds(5);

    /// <summary>The longest connect timeout accepted, 10 minutes.</summary>
    public static readonly TimeSpan MaxConnectTimeout = TimeSpan.FromMinutes(10);

    /// <summary>A host name or an IPv4 or IPv6 address (without brackets), e.g. <c>127.0.0.1</c>.</summary>
    public required string Host { get; init; }

    /// <summary>The TCP port, 1 to 65535.</summary>
    public required int Port { get; init; }

    /// <summary>How long to wait for the connection to be made; default 5 s; more than 0, at most 10 minutes.</summary>
    public TimeSpan ConnectTimeout { get; init; } = DefaultConnectTimeout;

    /// <summary><see cref="Host"/>:<see cref="Port"/>, with an IPv6 address in brackets.</summary>
    public string Endpoint => Host.Contains(':') ? $"[{Host}]:{Port}" : $"{Host}:{Port}";

    /// <summary>Every problem with these settings, empty when they are valid.</summary>
    public IReadOnlyList<string> Problems()
    {
        var problems = new List<string>();
        if (string.IsNullOrWhiteSpace(Host)) problems.Add("the host must not be empty");
        if (Port is < 1 or > 65535) problems.Add($"the port must be 1 to 65535, not {Port}");
        if (ConnectTimeout <= TimeSpan.Zero || ConnectTimeout > MaxConnectTimeout) problems.Add("the connect timeout must be more than 0 and at most 10 minutes");
        return problems;
    }

    /// <summary>Throws <see cref="ArgumentException"/> naming every invalid setting.</summary>
    public void Validate()
    {
        var problems = Problems();
        if (problems.Count > 0)
        {
            throw new ArgumentException("Invalid TCP settings: " + string.Join("; ", problems) + ".");
        }
    }

    /// <inheritdoc/>
    public override string ToString() => Endpoint;
}
