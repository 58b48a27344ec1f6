namespace BenchRunner.Instruments.Tests.Support;

/// <summary>A fact that needs Linux (pseudo-terminals, flock); skipped elsewhere.</summary>
public sealed class LinuxFactAttribute : FactAttribute
{
    public LinuxFactAttribute()
    {
        if (!OperatingSystem.IsLinux())
        {
            Skip = "needs Linux pseudo-terminals";
        }
    }
}
