using System.Globalization;
using CsCheck;
using PartForge.Formats.Cutting;
using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;

namespace PartForge.Formats.Tests.Cutting;

public class KerfCompensationTests
{
    [Fact]
    public void OrderIsMarksThenHolesThenOutlines()
    {
        var plan = KerfCompensation.Apply(SamplePlate.Sheet());
        Assert.Equal(new[] { CutPathKind.Mark, CutPathKind.Mark, CutPathKind.Hole, CutPathKind.Hole, CutPathKind.Outline },
            plan.Paths.Select(p => p.Kind));
    }

    [Fact]
    public void OutlinesGrowHolesShrinkMarksStay()
    {
        // Kerf compensation: the cutter's centre line runs kerf/2 outside the outline and kerf/2 inside
        // each hole, so the part measures what was designed (common practice of laser and plasma cutting).
        var sheet = SamplePlate.Sheet();
        var plan = KerfCompensation.Apply(sheet);
        double h = SamplePlate.Kerf / 2;
        var hole = plan.Paths.Single(p => p.Kind == CutPathKind.Hole && p.Contour.Circle is not null).Contour.Circle!.Value;
        Assert.Equal(SamplePlate.HoleRadius - h, hole.Radius, 12);
        var slot = plan.Paths.Single(p => p.Kind == CutPathKind.Hole && p.Contour.Circle is null).Contour;
        Assert.All(slot.Segments.OfType<ArcSegment>(), a => Assert.Equal(SamplePlate.SlotRadius - h, a.Radius, 12));
        // Area of the shrunk slot: stadium of radius r - h (exact).
        double rs = SamplePlate.SlotRadius - h;
        Assert.Equal(2 * rs * SamplePlate.SlotStraight + Math.PI * rs * rs, Math.Abs(ContourOffset.SignedArea(slot)), 9);
        // Outline: Steiner's formula for the outer parallel body of a convex set, A + P h + pi h^2.
        var outline = plan.Paths.Single(p => p.Kind == CutPathKind.Outline).Contour;
        double w = SamplePlate.Width, ht = SamplePlate.Height;
        Assert.Equal(w * ht + 2 * (w + ht) * h + Math.PI * h * h, ContourOffset.SignedArea(outline), 9);
        Assert.Same(sheet.Marks[0], plan.Paths[0].Contour);
        Assert.Same(sheet.Marks[1], plan.Paths[1].Contour);
    }

    [Fact]
    public void OutlinesAreCounterClockwiseHolesClockwise()
    {
        var plan = KerfCompensation.Apply(SamplePlate.Sheet() with
        {
            Cuts = new Profile(new[] { ContourOffset.Reversed(SamplePlate.Profile().Outers[0]) },
                new[] { ContourOffset.Reversed(SamplePlate.Profile().Holes[1]) }),
        });
        Assert.True(ContourOffset.SignedArea(plan.Paths.Single(p => p.Kind == CutPathKind.Outline).Contour) > 0);
        Assert.True(ContourOffset.SignedArea(plan.Paths.Single(p => p.Kind == CutPathKind.Hole).Contour) < 0);
    }

    [Fact]
    public void BoundsAreExact()
    {
        var plan = KerfCompensation.Apply(SamplePlate.Sheet());
        Assert.Equal(-0.1, plan.MinMm.X, 12);
        Assert.Equal(-0.1, plan.MinMm.Y, 12);
        Assert.Equal(60.1, plan.MaxMm.X, 12);
        Assert.Equal(40.1, plan.MaxMm.Y, 12);
    }

    [Fact]
    public void ArcBoundsUseTheExtremePoints()
    {
        // A disc of radius 10 made of two half arcs: its bounds are the circle's, not the chord's.
        var c = Contour.FromSegments(new Segment[] { new ArcSegment(new Vec2(0, 0), 10, 45, 180), new ArcSegment(new Vec2(0, 0), 10, 225, 180) });
        var plan = KerfCompensation.Apply(CutSheet.Of("disc", Profile.Of(c), 0));
        Assert.Equal(new Vec2(-10, -10), plan.MinMm);
        Assert.Equal(new Vec2(10, 10), plan.MaxMm);
    }

    [Fact]
    public void ZeroKerfKeepsTheDesign()
    {
        var sheet = SamplePlate.Sheet() with { KerfMm = 0 };
        var plan = KerfCompensation.Apply(sheet);
        Assert.Equal(SamplePlate.HoleRadius, plan.Paths[2].Contour.Circle!.Value.Radius);
        Assert.Equal(new Vec2(0, 0), plan.MinMm);
        Assert.Equal(new Vec2(60, 40), plan.MaxMm);
    }

    [Theory]
    [InlineData(-0.1)]
    [InlineData(double.NaN)]
    [InlineData(25)]
    public void BadKerfIsReported(double kerf)
    {
        var ex = Assert.Throws<KerfCompensationException>(() => KerfCompensation.Apply(SamplePlate.Sheet() with { KerfMm = kerf }));
        Assert.Contains("test-plate", ex.Message);
    }

    [Fact]
    public void HoleSmallerThanTheKerfIsAClearError()
    {
        var sheet = CutSheet.Of("tiny-hole", Profile.Of(Contour.Rectangle(new Vec2(0, 0), 10, 10, 0), Contour.FullCircle(new Vec2(0, 0), 0.08)), 0.2);
        var ex = Assert.Throws<KerfCompensationException>(() => KerfCompensation.Apply(sheet));
        Assert.Contains("tiny-hole", ex.Message);
        Assert.Contains("hole 0", ex.Message);
    }

    [Fact]
    public void NoOuterIsReported()
    {
        Assert.Throws<KerfCompensationException>(() => KerfCompensation.Apply(CutSheet.Of("empty", new Profile(Array.Empty<Contour>(), Array.Empty<Contour>()), 0.1)));
    }

    [Theory]
    [InlineData(0.00001, "0.00001")]
    [InlineData(-1.5e-7, "-0.00000015")]
    [InlineData(1.5e20, "150000000000000000000")]
    [InlineData(-0.0, "0")]
    [InlineData(0.1, "0.1")]
    [InlineData(12.075, "12.075")]
    [InlineData(1e15, "1000000000000000")]
    public void NumbersHaveNoExponent(double v, string text) => Assert.Equal(text, InvariantNumber.Format(v));

    [Fact]
    public void GridFastPathGivesTheSameTextAsTheGeneralPath()
    {
        Span<char> a = stackalloc char[InvariantNumber.MaxChars], b = stackalloc char[InvariantNumber.MaxChars];
        foreach (double v in new[] { 0.0001, -0.0001, 0.1, 12.3456, -999.9999, 100, 1e10, 38.9711, 0.5 })
        {
            Assert.True(InvariantNumber.TryFormatGrid(v, a, out int n));
            Assert.Equal(new string(b[..InvariantNumber.FormatRoundTrip(v, b)]), new string(a[..n]));
        }
        Gen.Long[-100_000_000_000L, 100_000_000_000L].Select(Gen.Double[-2000, 2000]).Sample((k, x) =>
        {
            Span<char> p = stackalloc char[InvariantNumber.MaxChars], q = stackalloc char[InvariantNumber.MaxChars];
            foreach (double v in new[] { k / 10000.0, x, Math.Round(x * 1e4) / 1e4 })
            {
                if (v == 0) continue;
                string general = new(q[..InvariantNumber.FormatRoundTrip(v, q)]);
                if (InvariantNumber.TryFormatGrid(v, p, out int n)) Assert.Equal(general, new string(p[..n]));
                Span<byte> u = stackalloc byte[64];
                if (InvariantNumber.TryFormatGridUtf8(v, u, out int nu)) Assert.Equal(general, System.Text.Encoding.ASCII.GetString(u[..nu]));
                Assert.Equal(InvariantNumber.TryFormatGrid(v, p, out _), InvariantNumber.TryFormatGridUtf8(v, u, out _));
                Assert.Equal(general, InvariantNumber.Format(v));
            }
        }, iter: 20000);
    }

    [Fact]
    public void NumbersRoundTrip()
    {
        Gen.Double.Where(double.IsFinite).Sample(v =>
        {
            string s = InvariantNumber.Format(v);
            Assert.DoesNotContain('E', s);
            Assert.Equal(v == 0 ? 0 : v, double.Parse(s, CultureInfo.InvariantCulture));
        }, iter: 5000);
    }
}
