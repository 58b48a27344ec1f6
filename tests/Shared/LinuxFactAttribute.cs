namespace BenchRunner.Tests.Shared;

/// <summary>A fact that needs Linux (pseudo-terminals, flock); skipped elsewhere.</summary>
internal sealed class LinuxFactAttribute : FactAttribute
{
    public LinuxFactAttribute()
    {
        if (!OperatingSystem.IsLinux())
        {
            Skip = "needs Linux pseudo-terminals";
        }
    }
}
