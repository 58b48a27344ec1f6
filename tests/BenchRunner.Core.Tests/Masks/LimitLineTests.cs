using BenchRunner.Core.Masks;
using BenchRunner.Core.Quantities;
using static BenchRunner.Core.Tests.Masks.MaskTestData;

namespace BenchRunner.Core.Tests.Masks;

public class LimitLineTests
{
    [Fact]
    public void Constructor_SingleCorner_IsRefused()
    {
        Assert.Throws<ArgumentException>(() => Line((131, -25)));
    }

    [Fact]
    public void Constructor_SectionOfOneFrequencyOnly_IsRefused()
    {
        Assert.Throws<ArgumentException>(() => Line((131, -25), (131, -20)));
    }

    [Fact]
    public void Constructor_DecreasingFrequency_IsRefused()
    {
        var e = Assert.Throws<ArgumentException>(() => Line((138.5, -4), (131, -4)));

        Assert.Contains("131 MHz after 138.5 MHz", e.Message);
    }

    [Fact]
    public void FromSections_DecreasingAcrossAGap_IsRefused()
    {
        Assert.Throws<ArgumentException>(() => Sections([(130, -25), (140, -25)], [(135, -25), (150, -25)]));
    }

    [Fact]
    public void Constructor_ThreeCornersAtOneFrequency_IsRefused()
    {
        Assert.Throws<ArgumentException>(() => Line((100, -30), (150, -30), (150, -20), (150, -10), (200, -10)));
    }

    [Fact]
    public void FromSections_NoSection_IsRefused()
    {
        Assert.Throws<ArgumentException>(() => LimitLine.FromSections([]));
    }

    [Fact]
    public void LimitAt_InAGapOrOutside_IsNull()
    {
        var line = Sections([(127.5, -25), (131, -25)], [(144, -25), (147.5, -25)]);

        Assert.Null(line.LimitAt(Frequency.FromMegahertz(137.5), MaskInterpolation.Linear, LimitSide.Upper));
        Assert.Null(line.LimitAt(Frequency.FromMegahertz(127), MaskInterpolation.Linear, LimitSide.Upper));
        Assert.Null(line.LimitAt(Frequency.FromMegahertz(148), MaskInterpolation.Linear, LimitSide.Upper));
        Assert.Equal(-25, line.LimitAt(Frequency.FromMegahertz(131), MaskInterpolation.Linear, LimitSide.Upper));
        Assert.True(line.HasGaps);
        Assert.Equal(4, line.Corners.Length);
        Assert.Equal(Frequency.FromMegahertz(127.5), line.Start);
        Assert.Equal(Frequency.FromMegahertz(147.5), line.Stop);
    }

    [Fact]
    public void LimitAt_WhereTwoSectionsTouch_TakesTheStricterValueForTheSide()
    {
        var line = Sections([(100, -20), (150, -20)], [(150, -30), (200, -30)]);
        var at = Frequency.FromMegahertz(150);

        Assert.Equal(-30, line.LimitAt(at, MaskInterpolation.Linear, LimitSide.Upper));
        Assert.Equal(-20, line.LimitAt(at, MaskInterpolation.Linear, LimitSide.Lower));
    }
}
