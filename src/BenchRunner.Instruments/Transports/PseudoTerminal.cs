using System.Text;
using BenchRunner.Instruments.Transports.Unix;

namespace BenchRunner.Instruments.Transports;

/// <summary>
/// A Linux pseudo-terminal pair: a serial-like device at <see cref="SlavePath"/> (e.g.
/// <c>/dev/pts/7</c>) that a <see cref="System.IO.Ports.SerialPort"/> or
/// <see cref="SerialTransport"/> can open, and the other end, <see cref="DeviceEnd"/>, as an
/// <see cref="ITransport"/> on which a simulated instrument answers. Bytes pass unchanged in
/// both directions (the line is put in raw mode before the path is handed out).
/// The pair keeps its own descriptor on the slave open, so the device end keeps working while
/// host programs open and close the port. <see cref="HangUp"/> (or disposing) closes everything,
/// which to the host looks like an unplugged adapter.
/// </summary>
public sealed class PseudoTerminal : IDisposable, IAsyncDisposable
{
    private readonly SafeFd _master;
    private readonly SafeFd _slaveKeepAlive;
    private readonly PseudoTerminalDeviceEnd _deviceEnd;
    private int _hungUp;

    private PseudoTerminal(SafeFd master, SafeFd slaveKeepAlive, string slavePath, string name)
    {
        _master = master;
        _slaveKeepAlive = slaveKeepAlive;
        SlavePath = slavePath;
        _deviceEnd = new PseudoTerminalDeviceEnd(master, $"{name} {slavePath} (device end)", HangUp);
    }

    /// <summary>The path of the serial-like end, for the host side to open.</summary>
    public string SlavePath { get; }

    /// <summary>
    /// The device side as a transport. Reads return 0 once the pair has been hung up; closing it
    /// hangs the pair up.
    /// </summary>
    public ITransport DeviceEnd => _deviceEnd;

    /// <summary>True once <see cref="HangUp"/> or <see cref="Dispose"/> has run.</summary>
    public bool IsHungUp => Volatile.Read(ref _hungUp) != 0;

    /// <summary>Creates a pair in raw mode.</summary>
    /// <param name="name">A label for <see cref="ITransport.Description"/>; default <c>pty</c>.</param>
    /// <exception cref="PlatformNotSupportedException">Not running on Linux.</exception>
    /// <exception cref="IOException">The system refused to create or configure the pair.</exception>
    public static PseudoTerminal Open(string name = "pty")
    {
        if (!OperatingSystem.IsLinux())
        {
            throw new PlatformNotSupportedException("Pseudo-terminals are only supported on Linux; use a TCP or in-memory connection instead.");
        }

        var master = new SafeFd(Check(Libc.posix_openpt(Libc.O_RDWR | Libc.O_NOCTTY), "posix_openpt"));
        SafeFd? slave = null;
        try
        {
            Check(Libc.grantpt(master), "grantpt");
            Check(Libc.unlockpt(master), "unlockpt");

            var nameBuffer = new byte[128];
            int error = Libc.ptsname_r(master, nameBuffer, (nuint)nameBuffer.Length);
            if (error != 0)
            {
                throw new IOException($"ptsname_r failed: {Libc.Describe(error)}");
            }

            var slavePath = Encoding.UTF8.GetString(nameBuffer, 0, Array.IndexOf(nameBuffer, (byte)0));

            // Raw before anyone sees the path; in cooked mode early writes would be echoed back.
            var termios = new byte[Libc.TermiosBufferSize];
            Check(Libc.tcgetattr(master, termios), "tcgetattr");
            Libc.cfmakeraw(termios);
            Check(Libc.tcsetattr(master, Libc.TCSANOW, termios), "tcsetattr");

            int flags = Check(Libc.fcntl(master, Libc.F_GETFL, 0), "fcntl");
            Check(Libc.fcntl(master, Libc.F_SETFL, flags | Libc.O_NONBLOCK), "fcntl");

            // Without an open slave the master's reads fail with EIO whenever the host closes the port.
            slave = new SafeFd(Check(Libc.open(slavePath, Libc.O_RDWR | Libc.O_NOCTTY | Libc.O_NONBLOCK | Libc.O_CLOEXEC), $"open {slavePath}"));
            return new PseudoTerminal(master, slave, slavePath, name);
        }
        catch
        {
            slave?.Dispose();
            master.Dispose();
            throw;
        }
    }

    /// <summary>Closes both ends, as if the adapter were unplugged. Safe to call more than once.</summary>
    public void HangUp()
    {
        if (Interlocked.Exchange(ref _hungUp, 1) != 0)
        {
            return;
        }

        _deviceEnd.Stop();
        _slaveKeepAlive.Dispose();
        _master.Dispose();
    }

    /// <inheritdoc/>
    public void Dispose() => HangUp();

    /// <inheritdoc/>
    public ValueTask DisposeAsync()
    {
        HangUp();
        return ValueTask.CompletedTask;
    }

    private static int Check(int result, string call)
    {
        if (result < 0)
        {
            int errno = System.Runtime.InteropServices.Marshal.GetLastPInvokeError();
            throw new IOException($"{call} failed: {Libc.Describe(errno)}");
        }

        return result;
    }
}
