using BenchRunner.Storage.Columns;

namespace BenchRunner.Storage.Tests.Columns;

public sealed class UtcTextTests
{
    [Fact]
    public void From_TimeWithAnOffset_IsWrittenInUtcWithZ()
    {
        var local = new DateTimeOffset(2025, 3, 14, 10, 30, 0, 250, TimeSpan.FromHours(1));

        // ISO 8601 / RFC 3339 §5.6: 10:30 at +01:00 is 09:30 UTC, written with "Z".
        Assert.Equal("2025-03-14T09:30:00.250Z", UtcText.From(local));
    }

    [Fact]
    public void Parse_StoredText_GivesTheSameInstantInUtc()
    {
        var time = UtcText.Parse("2024-12-31T23:59:59.999Z");

        Assert.Equal(new DateTimeOffset(2024, 12, 31, 23, 59, 59, 999, TimeSpan.Zero), time);
        Assert.Equal(TimeSpan.Zero, time.Offset);
        Assert.Throws<FormatException>(() => UtcText.Parse("2024-12-31 23:59:59"));
    }
}
