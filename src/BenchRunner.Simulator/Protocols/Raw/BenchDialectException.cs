namespace BenchRunner.Simulator.Protocols.Raw;

/// <summary>Refuses one bench-dialect command; the server answers with the error line instead.</summary>
internal sealed class BenchDialectException(BenchDialectError error) : Exception(BenchDialect.Text(error))
{
    public BenchDialectError Error { get; } = error;
}
