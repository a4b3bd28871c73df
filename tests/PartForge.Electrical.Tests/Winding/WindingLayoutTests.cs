using PartForge.Electrical.Winding;

namespace PartForge.Electrical.Tests.Winding;

public class WindingLayoutTests
{
    // Source: docs/physics.md §5 [computed, matches Cros and Viarouge 2002 / Bianchi and Dai Pre 2006 tables]:
    // kw1 for concentrated double-layer windings.
    [Theory]
    [InlineData(9, 12, 0.8660)]
    [InlineData(12, 16, 0.8660)]
    [InlineData(12, 10, 0.9330)]
    [InlineData(12, 14, 0.9330)]
    [InlineData(9, 8, 0.9452)]
    [InlineData(9, 10, 0.9452)]
    public void FundamentalWindingFactor(int coils, int poles, double kw)
    {
        var w = WindingLayout.For(coils, poles, 3);
        Assert.True(w.IsValid, w.Reason);
        Assert.Equal(kw, w.WindingFactor, 4);
        Assert.Equal(Math.Abs(Math.Sin(Math.PI * poles / 2 / coils)), w.PitchFactor, 12);
        // Each phase gets a third of the coils; B lags A and C lags B by 120 electrical degrees with equal magnitude.
        foreach (char ph in "ABC") Assert.Equal(coils / 3, w.Table.Count(r => r.Phase == ph));
        var a = w.PhaseSum('A', 1); var b = w.PhaseSum('B', 1); var c = w.PhaseSum('C', 1);
        Assert.Equal(a.Magnitude, b.Magnitude, 9);
        Assert.Equal(a.Magnitude, c.Magnitude, 9);
        double lag = (a.Phase - b.Phase) * 180 / Math.PI;
        Assert.Equal(0, Math.IEEERemainder(lag - 120, 360), 6);
    }

    // Source: the published 12-coil / 10-pole layout A a' ... : coils 0 and 1 are the same phase in opposite directions,
    // as are 6 and 7 (Bianchi and Dai Pre 2006, star of slots, from memory).
    [Fact]
    public void TwelveTenTable()
    {
        var w = WindingLayout.For(12, 10, 3);
        var t = w.Table;
        Assert.Equal('A', t[0].Phase); Assert.Equal(1, t[0].Direction);
        Assert.Equal('A', t[1].Phase); Assert.Equal(-1, t[1].Direction);
        Assert.Equal('A', t[6].Phase); Assert.Equal(-1, t[6].Direction);
        Assert.Equal('A', t[7].Phase); Assert.Equal(1, t[7].Direction);
    }

    // Rules of the trade: 3 phases need a multiple of 3 coils, and Q / (3 gcd(Q, p)) whole; 1 phase needs aligned coils.
    [Theory]
    [InlineData(10, 12, 3, "multiple of 3")]
    [InlineData(6, 6, 3, "balanced")]
    [InlineData(12, 12, 3, "balanced")]
    [InlineData(9, 12, 1, "not all in phase")]
    [InlineData(9, 7, 3, "even")]
    [InlineData(9, 12, 2, "not supported")]
    public void InvalidCombinationsCarryAReason(int coils, int poles, int phases, string words)
    {
        var w = WindingLayout.For(coils, poles, phases);
        Assert.False(w.IsValid);
        Assert.Contains(words, w.Reason);
        Assert.Empty(w.Table);
        Assert.Equal(0, w.WindingFactor);
    }

    // 1-phase: one coil per magnet alternates direction; one coil per pole pair keeps it.
    [Fact]
    public void OnePhaseDirections()
    {
        var alt = WindingLayout.For(8, 8, 1);
        Assert.True(alt.IsValid);
        Assert.Equal(new[] { 1, -1, 1, -1, 1, -1, 1, -1 }, alt.Table.Select(r => r.Direction));
        Assert.Equal(8, alt.PhaseSum('A', 1).Magnitude, 9);
        var same = WindingLayout.For(4, 8, 1);
        Assert.True(same.IsValid);
        Assert.All(same.Table, r => Assert.Equal(1, r.Direction));
        Assert.Equal(1, same.WindingFactor);
    }
}
