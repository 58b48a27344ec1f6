using BenchRunner.Instruments.Errors;
using BenchRunner.Simulator.Protocols.Hosting;

namespace BenchRunner.Simulator.Protocols.Scpi;

/// <summary>
/// The device side of IEEE 488.2 / SCPI-1999 for one simulated instrument: it parses each program
/// message (units separated by <c>;</c>, each header looked up in the <see cref="ScpiCommandTree"/>,
/// a header without a leading colon taken relative to the previous one's path, common commands
/// anywhere), runs the handlers in order, and answers the queries in one response message joined by
/// <c>;</c> and ended by LF. Errors go on the <see cref="Status"/> error queue and set their
/// event-register bit; nothing is sent for them (IEEE 488.2: a query that fails has no response).
/// After a command error (−1xx) the rest of the message is skipped; after an execution error the
/// next unit still runs.
/// <para>
/// The server adds the status commands to the tree: <c>*CLS</c>, <c>*ESR?</c>, <c>*OPC</c>,
/// <c>*OPC?</c>, <c>*WAI</c>, <c>SYSTem:ERRor[:NEXT]?</c>, <c>SYSTem:ERRor:COUNt?</c> and
/// <c>SYSTem:VERSion?</c>. The instrument's tree brings <c>*IDN?</c>, <c>*RST</c> and the rest.
/// Every operation completes before its command returns, so <c>*OPC?</c> answers 1 at once.
/// </para>
/// A handler refuses with <see cref="ScpiCommandException"/>; a model's
/// <see cref="ArgumentOutOfRangeException"/> becomes −222, another <see cref="ArgumentException"/>
/// −221 and an <see cref="InvalidOperationException"/> −200.
/// </summary>
public sealed class ScpiServer : IDeviceProtocol
{
    private const int MaxDetailLength = 100;

    /// <summary>Creates the server and adds the status commands to <paramref name="tree"/>.</summary>
    /// <param name="tree">The instrument's commands; must not declare the status commands itself.</param>
    /// <param name="status">The error queue and event register; a fresh one (10 entries) when null.</param>
    /// <exception cref="ArgumentException">The tree declares a status command already.</exception>
    public ScpiServer(ScpiCommandTree tree, ScpiDeviceStatus? status = null)
    {
        ArgumentNullException.ThrowIfNull(tree);
        Tree = tree;
        Status = status ?? new ScpiDeviceStatus();
        DeclareStatusCommands();
    }

    /// <summary>The command tree, status commands included.</summary>
    public ScpiCommandTree Tree { get; }

    /// <summary>The error queue and Standard Event Status Register.</summary>
    public ScpiDeviceStatus Status { get; }

    /// <inheritdoc/>
    public CommandLineEnd LineEnd => CommandLineEnd.LineFeed;

    /// <summary>Runs one program message and returns the response message (with its LF), or nothing when it held no answered query.</summary>
    public byte[] Handle(string line)
    {
        ArgumentNullException.ThrowIfNull(line);
        var responses = new List<byte[]>();
        var path = Tree.Root;
        var units = ScpiMessageParser.SplitUnits(line);
        for (int i = 0; i < units.Count; i++)
        {
            if (units[i].Trim(' ', '\t').Length == 0)
            {
                // A blank message or a trailing ';' is nothing to do; a blank unit between two is not.
                if (i == units.Count - 1)
                {
                    continue;
                }

                Status.Report(ScpiStandardErrors.SyntaxError, "an empty program message unit");
                break;
            }

            if (!Run(units[i], ref path, responses))
            {
                break;
            }
        }

        return Join(responses);
    }

    /// <summary>Reports −100 "Command error" for a program message longer than the host accepts.</summary>
    public byte[] HandleOverlongLine(int limitBytes)
    {
        Status.Report(ScpiStandardErrors.CommandError, $"program message longer than {limitBytes} bytes");
        return [];
    }

    // Runs one unit; false when the rest of the message must be skipped.
    private bool Run(string text, ref ScpiNode path, List<byte[]> responses)
    {
        var described = text.Trim(' ', '\t');
        try
        {
            var unit = ScpiMessageParser.ParseUnit(text);
            described = unit.Parameters.Count == 0 ? unit.Header : unit.Header + " " + string.Join(",", unit.Parameters.Select(p => p.Text));
            Delegate handler;
            ScpiCommandContext context;
            if (unit.IsCommon)
            {
                handler = Tree.Common(unit.Mnemonics[0].Name, unit.IsQuery)
                    ?? throw new ScpiCommandException(ScpiStandardErrors.UndefinedHeader, unit.Header);
                context = new ScpiCommandContext(unit.Header, unit.IsQuery, unit.Parameters, []);
            }
            else
            {
                var resolution = Tree.Resolve(unit.IsRooted ? Tree.Root : path, unit.Mnemonics, unit.IsQuery)
                    ?? throw new ScpiCommandException(ScpiStandardErrors.UndefinedHeader, unit.Header);
                path = resolution.PathAfter;
                handler = unit.IsQuery ? resolution.Leaf.Query! : resolution.Leaf.Command!;
                context = new ScpiCommandContext(unit.Header, unit.IsQuery, unit.Parameters, resolution.Suffixes);
            }

            if (handler is Func<ScpiCommandContext, ScpiResponse> query)
            {
                responses.Add(query(context).Bytes);
            }
            else
            {
                ((Action<ScpiCommandContext>)handler)(context);
            }

            return true;
        }
        catch (ScpiCommandException ex)
        {
            Status.Report(ex.Error, Detail(ex.Detail ?? described));
            return !ScpiStandardErrors.IsCommandError(ex.Error);
        }
        catch (ArgumentOutOfRangeException)
        {
            Status.Report(ScpiStandardErrors.DataOutOfRange, Detail(described));
        }
        catch (ArgumentException)
        {
            Status.Report(ScpiStandardErrors.SettingsConflict, Detail(described));
        }
        catch (InvalidOperationException)
        {
            Status.Report(ScpiStandardErrors.ExecutionError, Detail(described));
        }

        return true;
    }

    private void DeclareStatusCommands()
    {
        Tree.Command("*CLS", c =>
        {
            c.ExpectParameters(0, 0);
            Status.Clear();
        });
        Tree.Query("*ESR?", c =>
        {
            c.ExpectParameters(0, 0);
            return ScpiResponse.Integer((int)Status.ReadAndClearEventStatus());
        });
        Tree.Command("*OPC", c =>
        {
            c.ExpectParameters(0, 0);
            Status.SetOperationComplete();
        });
        Tree.Query("*OPC?", c =>
        {
            c.ExpectParameters(0, 0);
            return ScpiResponse.Integer(1);
        });
        Tree.Command("*WAI", c => c.ExpectParameters(0, 0));
        Tree.Query("SYSTem:ERRor[:NEXT]?", c =>
        {
            c.ExpectParameters(0, 0);
            return ScpiResponse.Text(Status.NextError().ToString());
        });
        Tree.Query("SYSTem:ERRor:COUNt?", c =>
        {
            c.ExpectParameters(0, 0);
            return ScpiResponse.Integer(Status.QueueCount);
        });
        // SCPI-1999 Vol 1 §4.2.1 (from memory): the version of SCPI the device complies with, YYYY.V.
        Tree.Query("SYSTem:VERSion?", c =>
        {
            c.ExpectParameters(0, 0);
            return ScpiResponse.Text("1999.0");
        });
    }

    private static byte[] Join(List<byte[]> responses)
    {
        if (responses.Count == 0)
        {
            return [];
        }

        var message = new List<byte>(responses.Sum(r => r.Length + 1));
        for (int i = 0; i < responses.Count; i++)
        {
            if (i > 0)
            {
                message.Add((byte)';');
            }

            message.AddRange(responses[i]);
        }

        message.Add((byte)'\n');
        return [.. message];
    }

    // The queue's text is 7-bit ASCII and short, whatever the host sent.
    private static string Detail(string text)
    {
        var printable = InstrumentException.Printable(text, MaxDetailLength);
        return new string(printable.Select(c => c is >= ' ' and <= '~' ? c : '?').ToArray());
    }
}
