namespace BenchRunner.Tests.Shared;

/// <summary>A theory that needs Linux (pseudo-terminals, flock); skipped elsewhere.</summary>
internal sealed class LinuxTheoryAttribute : TheoryAttribute
{
    public LinuxTheoryAttribute()
    {
        if (!OperatingSystem.IsLinux())
        {
            Skip = "needs Linux pseudo-terminals";
        }
    }
}
