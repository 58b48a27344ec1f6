using System.Buffers.Binary;
using System.Text;
using BenchRunner.Instruments.Errors;
using BenchRunner.Instruments.Framing;
using BenchRunner.Instruments.Tests.Support;

namespace BenchRunner.Instruments.Tests.Framing;

public partial class FramedConnectionTests
{
    [Fact]
    public async Task ReadBlockAsync_TwoByteDefiniteBlock_ReturnsPayload()
    {
        var (host, device) = await Connected.PairAsync();
        await device.SendAsync("#12AB");

        var payload = await host.ReadBlockAsync(Guard.Reply, default).WaitAsync(Guard.Await);

        // IEEE 488.2-1992 §8.7.9: "#12AB" carries the two bytes "AB" (REFERENCES: IEEE 488.2).
        Assert.Equal("AB", Encoding.ASCII.GetString(payload));
    }

    [Theory]
    [InlineData(804L, "#3804")] // 201 float32 values
    [InlineData(1608L, "#41608")] // 201 complex float32 values
    [InlineData(1000L, "#41000")]
    [InlineData(10L, "#210")]
    [InlineData(2L, "#12")]
    public void DefiniteHeader_ByteCount_MatchesStandardForm(long byteCount, string expected)
    {
        // IEEE 488.2-1992 §8.7.9 definite-length header; values from REFERENCES: IEEE 488.2 [std/calc].
        Assert.Equal(expected, Ieee488Block.DefiniteHeader(byteCount));
    }

    [Fact]
    public async Task ReadBlockAsync_Header3804_Returns201BigEndianFloats()
    {
        var (host, device) = await Connected.PairAsync();
        var values = Enumerable.Range(0, 201).Select(i => -3f - 0.25f * i).ToArray();
        var body = new byte[804];
        for (int i = 0; i < values.Length; i++)
        {
            BinaryPrimitives.WriteSingleBigEndian(body.AsSpan(4 * i), values[i]);
        }

        // IEEE 488.2 §8.7.9: 201 float32 = 804 bytes, header "#3804" (REFERENCES: IEEE 488.2).
        await device.SendAsync("#3804");
        await device.WriteAsync(body, default);
        await device.SendAsync("\n");

        var payload = await host.ReadBlockAsync(Guard.Reply, default).WaitAsync(Guard.Await);

        Assert.Equal(804, payload.Length);
        var decoded = Enumerable.Range(0, 201).Select(i => BinaryPrimitives.ReadSingleBigEndian(payload.AsSpan(4 * i))).ToArray();
        Assert.Equal(values, decoded);
        Assert.Equal(0, host.BufferedCount); // the LF after the block is consumed
    }

    [Fact]
    public async Task ReadBlockAsync_Header41608_Returns201ComplexFloatPairs()
    {
        var (host, device) = await Connected.PairAsync();
        var body = new byte[1608];
        for (int i = 0; i < 201; i++)
        {
            BinaryPrimitives.WriteSingleLittleEndian(body.AsSpan(8 * i), 0.5f + i);
            BinaryPrimitives.WriteSingleLittleEndian(body.AsSpan(8 * i + 4), -0.5f - i);
        }

        // IEEE 488.2 §8.7.9: 201 complex float32 = 1608 bytes, header "#41608" (REFERENCES: IEEE 488.2).
        await device.SendAsync("#41608");
        await device.WriteAsync(body, default);

        var payload = await host.ReadBlockAsync(Guard.Reply, default).WaitAsync(Guard.Await);

        Assert.Equal(body, payload);
        Assert.Equal(-200.5f, BinaryPrimitives.ReadSingleLittleEndian(payload.AsSpan(8 * 200 + 4)));
    }

    [Theory]
    [InlineData("#41000", 1000)]
    [InlineData("#210", 10)]
    public async Task ReadBlockAsync_ReferenceHeaders_ReturnAnnouncedByteCount(string header, int count)
    {
        var (host, device) = await Connected.PairAsync();
        var body = Enumerable.Range(0, count).Select(i => (byte)(i * 7)).ToArray();

        // IEEE 488.2 §8.7.9 (REFERENCES: IEEE 488.2 "1000 bytes -> #41000; 10 bytes -> #210").
        await device.SendAsync(header);
        await device.WriteAsync(body, default);
        await device.SendAsync("\n+0\n");

        var payload = await host.ReadBlockAsync(Guard.Reply, default).WaitAsync(Guard.Await);
        var next = await host.ReadLineAsync(Guard.Reply, default).WaitAsync(Guard.Await);

        Assert.Equal(body, payload);
        Assert.Equal("+0", next);
    }

    [Fact]
    public async Task ReadBlockAsync_IndefiniteBlock_EndsAtNewline()
    {
        var (host, device) = await Connected.PairAsync();

        // IEEE 488.2 §8.7.10: "#0", the bytes, then NL (NL alone ends it on a serial line or socket; from memory).
        await device.SendAsync("#0-41.5,-3.2,-0.9\n");

        var payload = await host.ReadBlockAsync(Guard.Reply, default).WaitAsync(Guard.Await);

        Assert.Equal("-41.5,-3.2,-0.9", Encoding.ASCII.GetString(payload));
    }

    [Fact]
    public async Task ReadBlockAsync_BlockSplitAcrossManySmallReads_IsReassembled()
    {
        var (host, device) = await Connected.PairAsync();
        var body = Enumerable.Range(0, 1000).Select(i => (byte)(i % 256)).ToArray();
        var whole = Ieee488Block.Encode(body);

        // Chunks of 1 to 7 bytes, so the header itself is split too.
        for (int offset = 0, size = 1; offset < whole.Length; offset += size, size = size % 7 + 1)
        {
            await device.WriteAsync(whole.AsMemory(offset, Math.Min(size, whole.Length - offset)), default);
        }

        var payload = await host.ReadBlockAsync(Guard.Reply, default).WaitAsync(Guard.Await);

        Assert.Equal(body, payload);
    }

    [Theory]
    [InlineData("X12AB", "starting with '#'")]
    [InlineData("#A12AB", "digit after '#'")]
    [InlineData("#3x04", "does not give a byte count")]
    public async Task ReadBlockAsync_MalformedHeader_ThrowsFramingException(string text, string expected)
    {
        var (host, device) = await Connected.PairAsync();
        await device.SendAsync(text);

        var error = await Assert.ThrowsAsync<FramingException>(() => host.ReadBlockAsync(Guard.Reply, default).WaitAsync(Guard.Await));

        Assert.Contains(expected, error.Message);
        Assert.True(error.IsTransient);
    }

    [Fact]
    public async Task ReadBlockAsync_AnnouncedLargerThanLimit_ThrowsBeforeThePayloadArrives()
    {
        var (host, device) = await Connected.PairAsync(new FramingOptions { MaxMessageBytes = 1024 });
        await device.SendAsync("#42000");

        var error = await Assert.ThrowsAsync<FramingException>(() => host.ReadBlockAsync(Guard.Reply, default).WaitAsync(Guard.Await));

        Assert.Contains("2000 bytes", error.Message);
        Assert.Contains("1024", error.Message);
    }

    [Fact]
    public async Task ReadBlockAsync_IndefiniteBlockPastLimit_ThrowsFramingException()
    {
        var (host, device) = await Connected.PairAsync(new FramingOptions { MaxMessageBytes = 1024 });
        await device.SendAsync("#0" + new string('7', 1500));

        var error = await Assert.ThrowsAsync<FramingException>(() => host.ReadBlockAsync(Guard.Reply, default).WaitAsync(Guard.Await));

        Assert.Contains("limit of 1024 bytes", error.Message);
    }
}
