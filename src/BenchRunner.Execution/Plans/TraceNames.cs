namespace BenchRunner.Execution.Plans;

/// <summary>The rule for trace names in a plan: the same as for role names.</summary>
internal static class TraceNames
{
    public static bool IsValid(string name) => RoleNames.IsValid(name);
}
