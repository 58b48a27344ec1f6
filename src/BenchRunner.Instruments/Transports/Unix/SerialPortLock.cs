using System.Runtime.InteropServices;
using BenchRunner.Instruments.Errors;

namespace BenchRunner.Instruments.Transports.Unix;

/// <summary>
/// An exclusive advisory lock (flock) on a serial device node, held for as long as the port is
/// open, so that two BenchRunner processes (or two transports in one process) cannot drive one
/// port at once. The serial-port library takes no lock of its own. Only programs that also
/// take the lock are kept out. On systems other than Linux no lock is taken (Windows already
/// opens serial ports exclusively).
/// </summary>
internal sealed class SerialPortLock : IDisposable
{
    private const int ENOENT = 2;
    private const int ENXIO = 6;
    private const int EACCES = 13;
    private const int EBUSY = 16;
    private const int ENODEV = 19;

    private readonly SafeFd? _fd;

    private SerialPortLock(SafeFd? fd)
    {
        _fd = fd;
        HasModemLines = fd is null || Libc.ioctl(fd, Libc.TIOCMGET, out _) == 0;
    }

    /// <summary>
    /// Whether the device has modem-control lines (DTR, RTS). Pseudo-terminals and some USB
    /// devices have none, and setting the lines on them fails. True where it cannot be checked.
    /// </summary>
    public bool HasModemLines { get; }

    /// <summary>
    /// Opens the device node and takes the lock; the open also tells precisely why a port cannot
    /// be used, which the serial-port library reports only as "access denied".
    /// </summary>
    /// <exception cref="InstrumentException">Missing (transient), not permitted, or in use.</exception>
    public static SerialPortLock Acquire(string path)
    {
        if (!OperatingSystem.IsLinux())
        {
            return new SerialPortLock(null);
        }

        // Non-blocking so that the open does not wait for a carrier on a modem-control line.
        int number = Libc.open(path, Libc.O_RDONLY | Libc.O_NOCTTY | Libc.O_NONBLOCK | Libc.O_CLOEXEC);
        if (number < 0)
        {
            int errno = Marshal.GetLastPInvokeError();
            throw errno switch
            {
                ENOENT or ENXIO or ENODEV => new InstrumentException($"serial port {path} does not exist (is the adapter plugged in?)", isTransient: true),
                EACCES => new InstrumentException($"no permission to open serial port {path} (on Linux, add the user to the group that owns it, usually dialout, then log in again)", isTransient: false),
                EBUSY => new InstrumentException($"serial port {path} is held exclusively by another program", isTransient: false),
                _ => new InstrumentException($"cannot open serial port {path}: {Libc.Describe(errno)}", isTransient: true),
            };
        }

        var fd = new SafeFd(number);
        if (Libc.flock(fd, Libc.LOCK_EX | Libc.LOCK_NB) != 0)
        {
            int errno = Marshal.GetLastPInvokeError();
            fd.Dispose();
            throw errno == Libc.EAGAIN
                ? new InstrumentException($"serial port {path} is already in use by another BenchRunner connection (it holds the port's lock)", isTransient: false)
                : new InstrumentException($"cannot lock serial port {path}: {Libc.Describe(errno)}", isTransient: false);
        }

        return new SerialPortLock(fd);
    }

    /// <summary>Releases the lock (closing the descriptor releases it).</summary>
    public void Dispose() => _fd?.Dispose();
}
