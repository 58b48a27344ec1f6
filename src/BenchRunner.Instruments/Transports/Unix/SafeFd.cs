using Microsoft.Win32.SafeHandles;

namespace BenchRunner.Instruments.Transports.Unix;

/// <summary>
/// A file descriptor that is closed exactly once, and not while a call is using it (the
/// marshaller holds a reference for the duration of each call that takes it).
/// </summary>
internal sealed class SafeFd : SafeHandleMinusOneIsInvalid
{
    public SafeFd()
        : base(ownsHandle: true)
    {
    }

    public SafeFd(int fd)
        : base(ownsHandle: true)
    {
        SetHandle(fd);
    }

    /// <summary>The descriptor number; only valid while the caller holds a reference.</summary>
    public int Number => (int)DangerousGetHandle();

    protected override bool ReleaseHandle() => Libc.close((int)handle) == 0;
}
