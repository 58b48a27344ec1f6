using System.Buffers.Binary;
using System.Text;
using BenchRunner.Simulator.Protocols.Scpi;
using BenchRunner.Simulator.Tests.Support;

namespace BenchRunner.Simulator.Tests.Protocols.Scpi;

// The analysers' trees spoken to directly: trace blocks, data formats, coupled frequencies, stale data.
public class AnalyserScpiTreeTests
{
    private readonly FakeNetworkAnalyser _vna = new();
    private readonly FakeSpectrumAnalyser _sa = new();
    private readonly ScpiServer _na;
    private readonly ScpiServer _spectrum;

    public AnalyserScpiTreeTests()
    {
        _na = NetworkAnalyserScpiTree.CreateServer(_vna);
        _spectrum = SpectrumAnalyserScpiTree.CreateServer(_sa);
        _na.Send("*CLS");
        _spectrum.Send("*CLS");
    }

    [Fact]
    public void TraceData_Real32_201ComplexPoints_IsABlockOf1608Bytes()
    {
        _na.Send("SENS:FREQ:STAR 136MHZ;STOP 139MHZ;:SENS:SWE:POIN 201;:FORM REAL,32;:INIT");

        var reply = _na.Handle("TRAC? S21");

        // REFERENCES: IEEE 488.2 §8.7.9, 201 complex float32 -> header #41608.
        Assert.Equal("#41608", Encoding.ASCII.GetString(reply, 0, 6));
        Assert.Equal(6 + 1608 + 1, reply.Length);
        Assert.Equal((byte)'\n', reply[^1]);
        Assert.Empty(_na.DrainCodes());
    }

    [Fact]
    public void TraceData_Power_201Float32Points_IsABlockOf804Bytes_BigEndianWhenNormal()
    {
        _spectrum.Send("FREQ:STAR 136MHZ;STOP 139MHZ;:SWE:POIN 201;:FORM:DATA REAL;BORD NORM;:INIT:IMM");

        var reply = _spectrum.Handle("TRACe:DATA? POWer");

        // REFERENCES: IEEE 488.2 §8.7.9, 201 float32 -> header #3804; FORMat:BORDer NORMal is big-endian (from memory).
        Assert.Equal("#3804", Encoding.ASCII.GetString(reply, 0, 5));
        Assert.Equal(-90f, BinaryPrimitives.ReadSingleBigEndian(reply.AsSpan(5, 4)));
        Assert.Equal(-30f, BinaryPrimitives.ReadSingleBigEndian(reply.AsSpan(5 + 100 * 4, 4)));
    }

    [Fact]
    public void TraceData_Swapped_IsLittleEndian_AndReal64UsesEightBytes()
    {
        _spectrum.Send("FREQ:STAR 136MHZ;STOP 139MHZ;:SWE:POIN 201;:FORM:DATA REAL,64;BORD SWAP;:INIT");

        var reply = _spectrum.Handle("TRAC? POW");

        // 201 float64 = 1608 bytes -> #41608 (IEEE 488.2 §8.7.9).
        Assert.Equal("#41608", Encoding.ASCII.GetString(reply, 0, 6));
        Assert.Equal(-30.0, BinaryPrimitives.ReadDoubleLittleEndian(reply.AsSpan(6 + 100 * 8, 8)));
    }

    [Fact]
    public void TraceData_Ascii_IsCommaSeparatedNumbers()
    {
        _spectrum.Send("FREQ:STAR 137.4MHZ;STOP 137.6MHZ;:SWE:POIN 11;:BAND 80KHZ;:INIT");

        var values = _spectrum.Ask("TRAC? POW").Split(',').Select(v => double.Parse(v, System.Globalization.CultureInfo.InvariantCulture)).ToList();

        Assert.Equal(11, values.Count);
        Assert.Equal(-30, values[5]);
        // Two 20 kHz steps are half the 80 kHz RBW, where the fake's skirt is 10·log10(2) dB down (its own definition).
        Assert.Equal(-30 - 10 * Math.Log10(2), values[5 + 2], 12);
    }

    [Fact]
    public void TraceData_BeforeASweepOrAfterASettingChanged_IsStale_WithNoResponse()
    {
        Assert.Equal("", _na.Ask("TRAC? S21"));
        _na.Send("INIT");
        Assert.NotEqual("", _na.Ask("TRAC? S21"));
        _na.Send("SENS:SWE:POIN 11");
        Assert.Equal("", _na.Ask("TRAC? S21"));

        // -230 "Data corrupt or stale", SCPI-1999 Vol 2 §21.8 (from memory); an execution error, EXE 16.
        Assert.Equal([-230, -230], _na.DrainCodes());
        Assert.Equal("16", _na.Ask("*ESR?"));
    }

    [Fact]
    public void TraceData_UnknownTraceName_IsIllegalParameterValue()
    {
        _na.Send("INIT");

        Assert.Equal("", _na.Ask("TRAC? S33"));
        Assert.Equal("", _na.Ask("TRAC?"));
        Assert.Equal([-224, -109], _na.DrainCodes());
    }

    [Fact]
    public void Format_Queries_AnswerTheShortForms_AndResetRestoresAsciiNormal()
    {
        // SCPI-1999 (from memory): FORMat:DATA ASCii and FORMat:BORDer NORMal after *RST.
        Assert.Equal("ASC", _na.Ask("FORM?"));
        _na.Send("FORMAT:DATA REAL,64;BORDER SWAPPED");
        Assert.Equal("REAL,64;SWAP", _na.Ask("FORM:DATA?;BORD?"));
        _na.Send("*RST");
        Assert.Equal("ASC;NORM", _na.Ask("FORM:DATA?;BORD?"));
        // FORM? alone leaves the path at the root (one keyword written), so BORD? is then undefined.
        Assert.Equal("ASC", _na.Ask("FORM?;BORD?"));
        _na.Send("FORM REAL,16");
        _na.Send("FORM ASC,8");
        Assert.Equal([-113, -224, -108], _na.DrainCodes());
    }

    [Fact]
    public void Frequency_StartAboveTheStop_CarriesTheStopAlong_KeepingTheSpan()
    {
        _na.Send("FREQ:STAR 127.5MHZ;STOP 130.5MHZ");
        _na.Send("FREQ:STAR 136MHZ");

        Assert.Equal((136e6, 139e6), (_vna.Start.Hertz, _vna.Stop.Hertz));
        _na.Send("FREQ:STOP 100.5KHZ");
        Assert.Equal((100e3, 100.5e3), (_vna.Start.Hertz, _vna.Stop.Hertz));
        Assert.Empty(_na.DrainCodes());
    }

    [Fact]
    public void Frequency_CentreAndSpan_AreDerivedAndSetTogether()
    {
        // Centre keeps the span, so the span is narrowed first (around the full span's centre).
        _spectrum.Send("FREQ:SPAN 3MHZ;CENT 137.5MHZ");

        Assert.Equal((136e6, 139e6), (_sa.Start.Hertz, _sa.Stop.Hertz));
        Assert.Equal("137500000;3000000", _spectrum.Ask("FREQ:CENT?;SPAN?"));
        _spectrum.Send("FREQ:SPAN 3GHZ");
        _spectrum.Send("FREQ:CENT 1.4999GHZ");
        Assert.Equal([-222, -222], _spectrum.DrainCodes());
        Assert.Equal((136e6, 139e6), (_sa.Start.Hertz, _sa.Stop.Hertz));
    }

    [Fact]
    public void Points_AndAveraging_FollowCountAndState()
    {
        _na.Send("SENS:SWE:POIN 1601;:SENS:AVER:COUN 8");
        Assert.Equal(1, _vna.Averages);
        _na.Send("AVER ON");
        Assert.Equal(8, _vna.Averages);
        _na.Send("AVER:COUN 16");
        Assert.Equal(16, _vna.Averages);
        Assert.Equal("16;1", _na.Ask("AVER:COUN?;STAT?"));
        _na.Send("AVER:STAT OFF");
        Assert.Equal(1, _vna.Averages);
        _na.Send("SWE:POIN 1602");
        Assert.Equal([-222], _na.DrainCodes());
        Assert.Equal("1601", _na.Ask("SWE:POIN?"));
    }

    [Fact]
    public void ReferenceLevel_LongPathWithSuffixes_AndAttenuation_AreSet()
    {
        _spectrum.Send("DISPlay:WINDow1:TRACe1:Y:SCALe:RLEVel -20DBM;:INP:ATT 30DB");
        Assert.Equal((-20.0, 30.0), (_sa.ReferenceLevel.Dbm, _sa.InputAttenuation.Decibels));
        _spectrum.Send("INP:ATT 12.4");
        Assert.Equal(12, _sa.InputAttenuation.Decibels);
        _spectrum.Send("DISP:WIND2:TRAC:Y:RLEV 0");
        Assert.Equal([-114], _spectrum.DrainCodes());
        Assert.Equal("-20", _spectrum.Ask("DISP:TRAC:Y:RLEV?"));
    }

    [Fact]
    public void Identity_AndReset_OfTheAnalysers()
    {
        Assert.Equal("benchrunner,sim-vna,SIM-VNA-0001,1.0", _na.Ask("*IDN?"));
        Assert.Equal("benchrunner,sim-sa,SIM-SA-0001,1.0", _spectrum.Ask("*IDN?"));
        _spectrum.Send("SWE:POIN 11;:INIT");
        _spectrum.Send("*RST");
        Assert.Equal("401", _spectrum.Ask("SWE:POIN?"));
        Assert.Equal("", _spectrum.Ask("TRAC? POW"));
        Assert.Equal([-230], _spectrum.DrainCodes());
    }
}
