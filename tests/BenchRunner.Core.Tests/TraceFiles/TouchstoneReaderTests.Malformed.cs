using BenchRunner.Core.Diagnostics;
using BenchRunner.Core.TraceFiles;

namespace BenchRunner.Core.Tests.TraceFiles;

public partial class TouchstoneReaderTests
{
    private const string Good2Port = "-30.1 12 -2.5 0.9 -2.5 0.9 -30 12";

    private static readonly string[] Version2Header =
    [
        "[Version] 2.0",
        "# MHz S DB R 50",
        "[Number of Ports] 2",
        "[Two-Port Data Order] 12_21",
        "[Number of Frequencies] 1",
    ];

    public static TheoryData<string, int?, string, string> Version1Cases => new()
    {
        {
            "psf.s2p", 2,
            Lines("! PSF-24-0001", "# MHz S DB R 50", "137.5 -30.1 12 -2.5 0.9x -2.5 0.9 -30 12"),
            "psf.s2p:3:21: expected a number, found \"0.9x\""
        },
        {
            "psf.s2p", 2,
            Lines("# MHz S DB R 50", $"137.5 {Good2Port}", $"137.2 {Good2Port}"),
            "psf.s2p:3:1: frequencies must be strictly increasing: 137.2 MHz follows 137.5 MHz"
        },
        {
            "psf.s2p", 2,
            Lines("# MHz S DB R 50", $"137.5 {Good2Port}", $"137.5 {Good2Port}"),
            "psf.s2p:3:1: frequencies must be strictly increasing: 137.5 MHz follows 137.5 MHz"
        },
        {
            "psf.s2p", 2,
            Lines("# MHz S DB R 50", "137.5 -30.1 12 -2.5 0.9 -2.5 0.9", $"137.6 {Good2Port}"),
            "psf.s2p:2: expected 9 values per point for 2 ports, found 7"
        },
        {
            "psf.s2p", 2,
            Lines("# MHz S DB R 50", $"137.4 {Good2Port}", "137.5 -30.1 12 -2.5 0.9 -2.5 0.9"),
            "psf.s2p:3: expected 9 values per point for 2 ports, found 7"
        },
        {
            "psf.s2p", 2,
            Lines("# MHz S DB R 50", $"137.5 {Good2Port} 1 2"),
            "psf.s2p:2:41: expected 9 values per point for 2 ports, found 11"
        },
        {
            // One-port data in a file named as a two-port.
            "psf.s2p", 2,
            Lines("# MHz S DB R 50", "137.5 -30.1 12", "137.6 -30.2 13", "137.7 -30.3 14"),
            "psf.s2p:2: expected 9 values per point for 2 ports, found 3"
        },
        {
            "psf.s1p", 1,
            Lines("# MHz S DB R 50", "137.5 -30.1"),
            "psf.s1p:2: expected 3 values per point for 1 port, found 2"
        },
        {
            "psf.s2p", 2,
            Lines("# MHz S XX R 50"),
            "psf.s2p:1:9: expected a frequency unit (Hz, kHz, MHz, GHz), a parameter (S, Y, Z), a format (DB, MA, RI) or \"R <ohms>\" in the option line, found \"XX\""
        },
        {
            "psf.s2p", 2,
            Lines("# MHz S DB R"),
            "psf.s2p:1:13: expected a reference resistance in ohms after \"R\", found the end of the line"
        },
        {
            "psf.s2p", 2,
            Lines("# MHz S DB R -50"),
            "psf.s2p:1:14: expected a positive reference resistance in ohms after \"R\", found \"-50\""
        },
        {
            "psf.s2p", 2,
            Lines("# MHz GHz"),
            "psf.s2p:1:7: the option line gives the frequency unit twice (again as \"GHz\")"
        },
        {
            "psf.s2p", 2,
            Lines("# MHz H MA R 50"),
            "psf.s2p:1:7: H parameters are not supported: only S, Y and Z data can be read (as S-parameters)"
        },
        {
            "psf.s2p", 2,
            Lines("# MHz g MA R 50"),
            "psf.s2p:1:7: G parameters are not supported: only S, Y and Z data can be read (as S-parameters)"
        },
        {
            "psf.s1p", 1,
            Lines("! no option line", "137.5 0.5 0"),
            "psf.s1p:2:1: expected the option line (for example \"# MHz S DB R 50\") before the first data line"
        },
        {
            "psf.s2p", 2,
            Lines("! nothing but comments", "# MHz S DB R 50"),
            "psf.s2p: the file has no network data"
        },
        {
            "psf.s1p", 1,
            Lines("# MHz S DB R 50", "-1 0.5 0"),
            "psf.s1p:2:1: expected a frequency of 0 or more, found \"-1\""
        },
        {
            "psf.s1p", 1,
            Lines("# MHz S DB R 50", "1 NaN 0"),
            "psf.s1p:2:3: expected a number, found \"NaN\""
        },
        {
            "psf.s2p", 2,
            Lines("# MHz S DB R 50", "[Number of Ports] 2"),
            "psf.s2p:2:1: [Number of Ports] is a version 2.0 keyword, but the file does not begin with \"[Version] 2.0\""
        },
        {
            "psf.dat", null,
            Lines("# MHz S DB R 50", "137.5 -30.1 12 -2.5 0.9"),
            "psf.dat:2: cannot tell the number of ports: the first data line has 5 values (3 for one port, 9 for two); name the file .s1p or .s2p"
        },
        {
            "psf.s2p", 2,
            Lines("# MHz S DB R 50", "[Version] 2.0"),
            "psf.s2p:2:1: [Version] must be the first line that is not a comment"
        },
    };

    public static TheoryData<string, int?, string, string> Version2Cases => new()
    {
        {
            "psf.ts", null,
            Lines("[Version] 3.0"),
            "psf.ts:1:11: expected version 2.0 after [Version], found \"3.0\""
        },
        {
            "psf.ts", null,
            Lines("[Version] 2.0", "# MHz S DB R 50", "[Number of Frequencies] 1", "[Network Data]"),
            "psf.ts:4:1: expected [Number of Ports] before [Network Data]"
        },
        {
            "psf.ts", null,
            Lines("[Version] 2.0", "# MHz S DB R 50", "[Number of Ports] 2", "[Number of Frequencies] 1", "[Network Data]"),
            "psf.ts:5:1: expected [Two-Port Data Order] 12_21 or 21_12 before [Network Data] of a 2-port file"
        },
        {
            "psf.ts", null,
            Lines("[Version] 2.0", "# MHz S DB R 50", "[Number of Ports] 2", "[Two-Port Data Order] 12-21"),
            "psf.ts:4:23: expected 12_21 or 21_12 after [Two-Port Data Order], found \"12-21\""
        },
        {
            "psf.ts", null,
            Lines("[Version] 2.0", "[Number of Ports] 1", "[Number of Frequencies] 1", "[Network Data]"),
            "psf.ts:4:1: expected the option line (for example \"# MHz S DB R 50\") before [Network Data]"
        },
        {
            "psf.ts", null,
            Lines([.. Version2Header[..4], "[Number of Frequencies] 2", "[Network Data]", $"100 {Good2Port}", "[End]"]),
            "psf.ts:5: [Number of Frequencies] says 2, but the file has 1 point"
        },
        {
            "psf.ts", null,
            Lines([.. Version2Header, "[Network Data]", $"100 {Good2Port}", $"101 {Good2Port}", "[End]"]),
            "psf.ts:8:1: more points than the 1 that [Number of Frequencies] declares on line 5"
        },
        {
            "psf.ts", null,
            Lines([.. Version2Header, "[Network Data]", $"100 {Good2Port}"]),
            "psf.ts:7: expected [End] at the end of a version 2.0 file"
        },
        {
            "psf.ts", null,
            Lines([.. Version2Header, "[Reference] 50", "[Network Data]"]),
            "psf.ts:6: expected 2 reference resistances after [Reference], found 1"
        },
        {
            "psf.ts", null,
            Lines([.. Version2Header, "[Reference] 50 75 100"]),
            "psf.ts:6:19: expected 2 reference resistances after [Reference], found more"
        },
        {
            "psf.ts", null,
            Lines("[Version] 2.0", "# MHz S DB R 50", "[Reference] 50"),
            "psf.ts:3:1: [Reference] must follow [Number of Ports]"
        },
        {
            "psf.ts", null,
            Lines("[Version] 2.0", "# MHz S DB R 50", "[Frobnicate] 3"),
            "psf.ts:3:1: unknown keyword [Frobnicate]"
        },
        {
            "psf.ts", null,
            Lines("[Version] 2.0", "# MHz S DB R 50", "[Number of Ports] 2", "[Number of Ports] 2"),
            "psf.ts:4:1: [Number of Ports] is given twice (first on line 3)"
        },
        {
            "psf.ts", null,
            Lines("[Version] 2.0", "# MHz S DB R 50", "[Number of Ports] 4", "[Mixed-Mode Order] D2,3 D1,4"),
            "psf.ts:4:1: mixed-mode data ([Mixed-Mode Order]) are not supported"
        },
        {
            "psf.ts", null,
            Lines([.. Version2Header, "[Network Data]", "[Reference] 50 50"]),
            "psf.ts:7:1: [Reference] must come before [Network Data]"
        },
        {
            "psf.ts", null,
            Lines([.. Version2Header, $"100 {Good2Port}"]),
            "psf.ts:6:1: expected [Network Data] before the data, found \"100\""
        },
        {
            "psf.s2p", 2,
            Lines("[Version] 2.0", "# MHz S DB R 50", "[Number of Ports] 1"),
            "psf.s2p:3:19: [Number of Ports] says 1, but the file name says 2"
        },
        {
            "psf.ts", null,
            Lines("[Version] 2.0", "[Number of Ports 2"),
            "psf.ts:2:1: expected \"]\" to close the keyword"
        },
        {
            "psf.ts", null,
            Lines("[Version] 2.0", "[Number of Ports] two"),
            "psf.ts:2:19: expected a positive whole number after [Number of Ports], found \"two\""
        },
        {
            "psf.ts", null,
            Lines("[Version] 2.0", "[Number of Ports]"),
            "psf.ts:2:18: expected a positive whole number after [Number of Ports]"
        },
        {
            "psf.ts", null,
            Lines("[Version] 2.0", "# MHz Z RI R 50", "[Number of Ports] 1", "[Number of Frequencies] 1", "[Network Data]", "100 -50 0", "[End]"),
            "psf.ts:6: the Z-parameters at 100 MHz have no S-parameter equivalent (Z + R is singular)"
        },
        {
            "psf.ts", null,
            Lines([.. Version2Header, "[Network Data]", "[End]"]),
            "psf.ts:5: [Number of Frequencies] says 1, but the file has 0 points"
        },
    };

    [Theory]
    [MemberData(nameof(Version1Cases))]
    public void Parse_MalformedVersion1_ThrowsWithLocation(string name, int? ports, string text, string expected)
    {
        var ex = ParseFails(text, name, ports);

        Assert.Equal(expected, ex.Message);
    }

    [Theory]
    [MemberData(nameof(Version2Cases))]
    public void Parse_MalformedVersion2_ThrowsWithLocation(string name, int? ports, string text, string expected)
    {
        var ex = ParseFails(text, name, ports);

        Assert.Equal(expected, ex.Message);
    }

    [Fact]
    public void Parse_BadNumber_ExceptionCarriesLocationParts()
    {
        var ex = ParseFails(Lines("# MHz S DB R 50", "137.5 -30.1 x"), "psf.s1p", 1);

        Assert.Equal(new SourceLocation("psf.s1p", 2, 13), ex.Location);
        Assert.Equal("expected a number, found \"x\"", ex.Detail);
    }

    [Fact]
    public void Read_TsFileWithoutVersion_Throws()
    {
        using var dir = new TempDirectory();
        var path = dir.Write("psf.ts", Lines("# MHz S DB R 50", "137.5 -30.1 12"));

        var ex = Assert.Throws<InputFormatException>(() => TouchstoneReader.Read(path));

        Assert.Equal(new SourceLocation(path, 1, 1), ex.Location);
        Assert.Equal("expected \"[Version] 2.0\" as the first line of a .ts file", ex.Detail);
    }

    [Fact]
    public void Read_MissingFile_ThrowsFileNotFound()
    {
        var ex = Assert.Throws<InputFormatException>(() => TouchstoneReader.Read("no-such-board.s2p"));

        Assert.Equal(SourceLocation.OfFile("no-such-board.s2p"), ex.Location);
        Assert.Equal("no-such-board.s2p: file not found", ex.Message);
    }
}
