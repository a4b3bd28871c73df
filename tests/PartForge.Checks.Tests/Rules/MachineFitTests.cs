using PartForge.Checks.Inputs;

namespace PartForge.Checks.Tests.Rules;

/// <summary>
/// print-bed-fit and cut-sheet-fit with the real parts: a bed or sheet just too small fails exactly that check
/// for that part, one just large enough passes. Expected spares come from the design's own numbers (the stator
/// is a disc of stator.outer_diameter, so it needs a square of that side; the gap gauge's exact extent is taken
/// from its outline sampled every 0.01 degree on its arcs, independent of the checker's bounds).
/// </summary>
public class MachineFitTests
{
    private static readonly TestMachine Base = new();

    private static CheckResult One(CheckReport r, string id, string part) => r.Checks.Single(c => c.Id == id && c.PartName == part);

    [Fact]
    public void Every_part_of_the_test_machine_fits_the_default_machines()
    {
        var r = Base.CheckWithParts();
        var parts = Base.Parts();
        foreach (var p in parts.Parts)
        {
            string id = p.Process == PartForge.Design.Machines.PartProcess.Print ? CheckIds.PrintBedFit : CheckIds.CutSheetFit;
            Assert.Equal(CheckStatus.Pass, One(r, id, p.Name).Status);
        }
    }

    [Fact]
    public void A_bed_narrower_than_the_stator_fails_only_the_stator_and_a_near_miss_passes()
    {
        // The stator is a ring of outer diameter 130 mm: it needs 130 mm along x and y.
        var tight = Base.With(m => { m.BedX = 129.5; m.BedY = 400; }).CheckWithParts();
        var fit = One(tight, CheckIds.PrintBedFit, "stator");
        Assert.Equal(CheckStatus.Fail, fit.Status);
        Assert.Equal(129.5 - 130, fit.Value, 6);
        Assert.Contains("printer.bed_x", fit.Message);
        Assert.Equal(CheckStatus.Pass, One(tight, CheckIds.PrintBedFit, "rotor").Status); // 110 mm
        Assert.All(tight.Checks.Where(c => c.Status == CheckStatus.Fail), c => Assert.Equal(CheckIds.PrintBedFit, c.Id));

        var near = One(Base.With(m => { m.BedX = 130.5; m.BedY = 130.5; }).CheckWithParts(), CheckIds.PrintBedFit, "stator");
        Assert.Equal(CheckStatus.Pass, near.Status);
        Assert.Equal(0.5, near.Value, 6);
    }

    [Fact]
    public void A_printer_too_low_fails_on_height()
    {
        // The stator is stator.thickness (6.6 mm) tall whichever face is down.
        var r = One(Base.With(m => m.BedZ = 6).CheckWithParts(), CheckIds.PrintBedFit, "stator");
        Assert.Equal(CheckStatus.Fail, r.Status);
        Assert.Equal(6 - 6.6, r.Value, 6);
        Assert.Contains("printer.bed_z", r.Message);
    }

    [Fact]
    public void A_sheet_too_small_for_the_gap_gauge_fails_and_one_just_large_enough_passes()
    {
        var parts = Base.Parts();
        var gauge = parts.Parts.Single(p => p.Process == PartForge.Design.Machines.PartProcess.Cut);
        var (w, h) = SampledExtent(gauge.CutProfile!.Outers);
        double need = Math.Max(w, h) + 2 * Base.CutSpacing;
        var small = One(Base.With(m => m.Sheets = $"{Math.Floor(need) - 1}x{Math.Floor(need) - 1}").CheckWithParts(), CheckIds.CutSheetFit, gauge.Name);
        Assert.Equal(CheckStatus.Fail, small.Status);
        Assert.Equal(Math.Floor(need) - 1 - need, small.Value, 2);
        var big = One(Base.With(m => m.Sheets = $"50x50:1, {Math.Ceiling(need) + 1}x{Math.Ceiling(need) + 1}").CheckWithParts(), CheckIds.CutSheetFit, gauge.Name);
        Assert.Equal(CheckStatus.Pass, big.Status);
        Assert.Equal(Math.Ceiling(need) + 1 - need, big.Value, 2);
    }

    private static (double W, double H) SampledExtent(IEnumerable<PartForge.Geometry.Profiles.Contour> outers)
    {
        double x0 = double.MaxValue, y0 = double.MaxValue, x1 = double.MinValue, y1 = double.MinValue;
        foreach (var c in outers)
        {
            var pts = new List<PartForge.Geometry.Primitives.Vec2>();
            if (c.Circle is { } circle)
                for (int i = 0; i < 36000; i++) pts.Add(circle.Center + PartForge.Geometry.Primitives.Vec2.FromAngleDeg(i * 0.01) * circle.Radius);
            else
                foreach (var s in c.Segments)
                {
                    if (s is PartForge.Geometry.Profiles.ArcSegment a)
                    {
                        int n = Math.Max(2, (int)Math.Ceiling(Math.Abs(a.SweepDeg) / 0.01));
                        for (int i = 0; i <= n; i++) pts.Add(a.Center + PartForge.Geometry.Primitives.Vec2.FromAngleDeg(a.StartDeg + a.SweepDeg * i / n) * a.Radius);
                    }
                    else { pts.Add(s.Start); pts.Add(s.End); }
                }
            foreach (var p in pts) { x0 = Math.Min(x0, p.X); y0 = Math.Min(y0, p.Y); x1 = Math.Max(x1, p.X); y1 = Math.Max(y1, p.Y); }
        }
        return (x1 - x0, y1 - y0);
    }
}
