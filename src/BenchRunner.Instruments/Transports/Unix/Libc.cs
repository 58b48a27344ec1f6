using System.Runtime.InteropServices;

namespace BenchRunner.Instruments.Transports.Unix;

/// <summary>
/// The few C library calls the pseudo-terminal and the serial-port lock need. Constants are
/// Linux values (the same on x86-64 and arm64); callers check the platform first.
/// </summary>
internal static class Libc
{
    private const string Library = "libc";

    public const int O_RDONLY = 0x0;
    public const int O_RDWR = 0x2;
    public const int O_NOCTTY = 0x100;
    public const int O_NONBLOCK = 0x800;
    public const int O_CLOEXEC = 0x80000;

    public const int F_GETFL = 3;
    public const int F_SETFL = 4;

    public const int TCSANOW = 0;

    /// <summary>ioctl request: read the modem-control lines (asm-generic value, x86-64 and arm64).</summary>
    public const nuint TIOCMGET = 0x5415;

    public const short POLLIN = 0x1;
    public const short POLLOUT = 0x4;
    public const short POLLERR = 0x8;
    public const short POLLHUP = 0x10;
    public const short POLLNVAL = 0x20;

    public const int LOCK_EX = 2;
    public const int LOCK_NB = 4;
    public const int LOCK_UN = 8;

    public const int EINTR = 4;
    public const int EIO = 5;
    public const int EAGAIN = 11;

    /// <summary>Room for a <c>struct termios</c> (60 bytes with glibc), with spare.</summary>
    public const int TermiosBufferSize = 256;

    [StructLayout(LayoutKind.Sequential)]
    public struct PollFd
    {
        public int Fd;
        public short Events;
        public short Revents;
    }

    [DllImport(Library, SetLastError = true)]
    public static extern int posix_openpt(int flags);

    [DllImport(Library, SetLastError = true)]
    public static extern int grantpt(SafeFd fd);

    [DllImport(Library, SetLastError = true)]
    public static extern int unlockpt(SafeFd fd);

    /// <summary>Returns 0, or an error number (it does not set errno).</summary>
    [DllImport(Library)]
    public static extern int ptsname_r(SafeFd fd, byte[] buffer, nuint length);

    [DllImport(Library, SetLastError = true)]
    public static extern int tcgetattr(SafeFd fd, byte[] termios);

    [DllImport(Library)]
    public static extern void cfmakeraw(byte[] termios);

    [DllImport(Library, SetLastError = true)]
    public static extern int tcsetattr(SafeFd fd, int optionalActions, byte[] termios);

    [DllImport(Library, SetLastError = true, EntryPoint = "open")]
    public static extern int open(string path, int flags);

    [DllImport(Library, SetLastError = true)]
    public static extern int fcntl(SafeFd fd, int command, int argument);

    [DllImport(Library, SetLastError = true)]
    public static extern nint read(SafeFd fd, ref byte buffer, nint count);

    [DllImport(Library, SetLastError = true)]
    public static extern nint write(SafeFd fd, ref byte buffer, nint count);

    [DllImport(Library, SetLastError = true)]
    public static extern int poll([In, Out] PollFd[] fds, nuint count, int timeoutMilliseconds);

    [DllImport(Library, SetLastError = true)]
    public static extern int ioctl(SafeFd fd, nuint request, out int value);

    [DllImport(Library, SetLastError = true)]
    public static extern int flock(SafeFd fd, int operation);

    [DllImport(Library, SetLastError = true)]
    public static extern int close(int fd);

    /// <summary>
    /// Waits up to <paramref name="timeoutMilliseconds"/> for <paramref name="events"/> on one
    /// descriptor. Returns poll's result (negative on error, errno in the last P/Invoke error).
    /// </summary>
    /// <exception cref="ObjectDisposedException">The descriptor has been closed.</exception>
    public static int PollOne(SafeFd fd, short events, int timeoutMilliseconds, out short revents)
    {
        bool added = false;
        try
        {
            fd.DangerousAddRef(ref added);
            var fds = new[] { new PollFd { Fd = fd.Number, Events = events } };
            int result = poll(fds, 1, timeoutMilliseconds);
            revents = fds[0].Revents;
            return result;
        }
        finally
        {
            if (added)
            {
                fd.DangerousRelease();
            }
        }
    }

    /// <summary>The text for an error number, e.g. "Input/output error".</summary>
    public static string Describe(int errno) => Marshal.GetPInvokeErrorMessage(errno);
}
