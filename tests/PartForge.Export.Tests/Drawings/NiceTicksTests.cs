using PartForge.Export.Drawings;

namespace PartForge.Export.Tests.Drawings;

public class NiceTicksTests
{
    [Theory]
    [InlineData(-7.3, 7.3, 6, -10, 10, 5)]
    [InlineData(-7.3, 7.3, 8, -8, 8, 2)]
    [InlineData(0, 360, 8, 0, 400, 50)]
    [InlineData(0.013, 0.087, 5, 0, 0.1, 0.02)]
    public void Covers_the_range_with_a_1_2_5_step(double lo, double hi, int n, double a, double b, double step)
    {
        var t = NiceTicks.For(lo, hi, n);
        Assert.Equal(a, t.Min, 9);
        Assert.Equal(b, t.Max, 9);
        Assert.Equal(step, t.Step, 9);
    }

    [Fact]
    public void A_flat_series_still_gets_a_range()
    {
        var t = NiceTicks.For(0, 0);
        Assert.True(t.Max > t.Min && t.Step > 0);
    }
}
