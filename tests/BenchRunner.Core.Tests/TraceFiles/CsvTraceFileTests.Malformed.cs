namespace BenchRunner.Core.Tests.TraceFiles;

public partial class CsvTraceFileTests
{
    private const string Signature = "# benchrunner-trace 1";

    public static TheoryData<string, string> MalformedCases => new()
    {
        {
            Lines("frequency_hz,s21_re,s21_im", "1,0.5,0"),
            "psf.csv:1:1: expected the first line \"# benchrunner-trace 1\" (only a two-column \"frequency_hz,power_dbm\" file may leave it out)"
        },
        {
            Lines("# exported trace", "frequency_hz,power_dbm"),
            "psf.csv:1:1: expected the first line \"# benchrunner-trace 1\""
        },
        {
            Lines("# benchrunner-trace 2", "frequency_hz,power_dbm"),
            "psf.csv:1:21: layout version \"2\" is not supported; this reader knows version 1"
        },
        {
            Lines(Signature, "frequency_hz,s21_mag,s21_deg"),
            "psf.csv:2:14: unknown column \"s21_mag\"; expected s11_re, s11_im, s21_re, s21_im, s12_re, s12_im, s22_re, s22_im or power_dbm"
        },
        {
            Lines(Signature, "frequency_hz,s21_re,power_dbm"),
            "psf.csv:2:21: expected \"s21_im\" after \"s21_re\", found \"power_dbm\""
        },
        {
            Lines(Signature, "frequency_hz,s21_re"),
            "psf.csv:2:20: expected \"s21_im\" after \"s21_re\", found the end of the line"
        },
        {
            Lines(Signature, "frequency_hz,s21_im,s21_re"),
            "psf.csv:2:14: expected \"s21_re\" before \"s21_im\""
        },
        {
            Lines(Signature, "frequency_hz,power_dbm,power_dbm"),
            "psf.csv:2:24: column \"power_dbm\" repeats Power (first at column 14)"
        },
        {
            Lines(Signature, "power_dbm,frequency_hz"),
            "psf.csv:2:1: expected \"frequency_hz\" as the first column, found \"power_dbm\""
        },
        {
            Lines(Signature, "frequency_hz"),
            "psf.csv:2:13: expected at least one trace column after \"frequency_hz\""
        },
        {
            Lines(Signature, "frequency_hz,s21_re,s21_im", "137500000,0.5"),
            "psf.csv:3: expected 3 fields as in the header on line 2, found 2"
        },
        {
            Lines(Signature, "frequency_hz,s21_re,s21_im", "137500000,0.5,0,7"),
            "psf.csv:3:17: expected 3 fields as in the header on line 2, found 4"
        },
        {
            Lines(Signature, "frequency_hz,s21_re,s21_im", "137500000,0.5,0.9x"),
            "psf.csv:3:15: expected a number, found \"0.9x\""
        },
        {
            Lines(Signature, "frequency_hz,s21_re,s21_im", "137500000,,0"),
            "psf.csv:3:11: expected a number, found an empty field"
        },
        {
            Lines(Signature, "frequency_hz,power_dbm", "137500000,-20", "137200000,-21"),
            "psf.csv:4:1: frequencies must be strictly increasing: 137.2 MHz follows 137.5 MHz"
        },
        {
            Lines(Signature, "frequency_hz,power_dbm", "-1,-20"),
            "psf.csv:3:1: expected a frequency of 0 Hz or more, found \"-1\""
        },
        {
            Lines(Signature, "# reference_ohms = 50", "frequency_hz,power_dbm"),
            "psf.csv:3: the file has no data rows after the header"
        },
        {
            Lines(Signature, "# reference_ohms = 50"),
            "psf.csv:2: expected a header row such as \"frequency_hz,s21_re,s21_im\""
        },
        {
            "",
            "psf.csv:1: expected a header row such as \"frequency_hz,s21_re,s21_im\""
        },
        {
            Lines(Signature, "# reference_ohms = fifty"),
            "psf.csv:2:20: expected a positive reference impedance in ohms, found \"fifty\""
        },
        {
            Lines(Signature, "# reference_ohms = 50", "# reference_ohms = 75"),
            "psf.csv:3:3: \"reference_ohms\" is given twice (first on line 2)"
        },
        {
            Lines(Signature, "frequency_hz,power_dbm", "1,-20", "# reference_ohms = 75"),
            "psf.csv:4: metadata must come before the header row on line 2"
        },
    };

    [Theory]
    [MemberData(nameof(MalformedCases))]
    public void Parse_Malformed_ThrowsWithLocation(string text, string expected)
    {
        var ex = Assert.Throws<Core.Diagnostics.InputFormatException>(() => Parse(text));

        Assert.Equal(expected, ex.Message);
    }
}
