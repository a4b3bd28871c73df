using PartForge.Design.Machines.Magnets;
using PartForge.Design.Stack;
using PartForge.Electrical.Coils;
using PartForge.Electrical.Field;
using PartForge.Electrical.Flux;
using PartForge.Electrical.Wire;
using PartForge.Geometry.Primitives;
using M = PartForge.Design.Model;

namespace PartForge.Electrical.Tests.Flux;

public class CoilFluxTests
{
    private static (RotorField Field, CoilWinding Coil) Build(M.Design d)
    {
        var diags = new List<Diagnostic>();
        var m = PartForge.Design.Machines.MachineModel.From(d);
        var field = RotorField.From(m, 0);
        var spec = CoilSpec.From(m, WireSpec.From(m.Coils.Wire, m.Coils.EnamelGrade), diags)!;
        return (field, spec.Wind(d.Coils.Turns!.Value));
    }

    // Convergence (issue: quadrature converged to 0.1 %): the default orders against every order doubled.
    [Theory]
    [InlineData("crank")]
    [InlineData("large")]
    [InlineData("pulse")]
    [InlineData("arc")]
    [InlineData("dual-stator")]
    public void DefaultQuadratureIsConverged(string which)
    {
        var d = Pick(which);
        var a = ElectricalEngine.Evaluate(PartForge.Design.Machines.MachineModel.From(d));
        var f = ElectricalEngine.Evaluate(PartForge.Design.Machines.MachineModel.From(d), FluxQuadrature.Fine);
        Assert.Equal(f.CoilFluxLinkagePeakWb, a.CoilFluxLinkagePeakWb, f.CoilFluxLinkagePeakWb * 1e-3);
        Assert.Equal(f.FluxLinkage!.CoefficientsWb[0], a.FluxLinkage!.CoefficientsWb[0], Math.Abs(f.FluxLinkage.CoefficientsWb[0]) * 1e-3);
        Assert.Equal(f.Phase!.EmfRmsV, a.Phase!.EmfRmsV, f.Phase.EmfRmsV * 1e-3);
    }

    public static M.Design Pick(string which) => which switch
    {
        "crank" => TestDesigns.Crank(),
        "large" => TestDesigns.Large(),
        "pulse" => TestDesigns.Pulse(),
        "arc" => TestDesigns.Arc(),
        _ => TestDesigns.DualStator(),
    };

    // Independent check: the harmonic method against a direct 2D integration of the weighted Bz over a round coil
    // (polar about the coil centre, the field summed from every source), at two rotor angles.
    [Theory]
    [InlineData(0.0)]
    [InlineData(7.0)]
    [InlineData(21.0)]
    public void RoundCoilAgainstDirectIntegration(double thetaDeg)
    {
        var (field, coil) = Build(TestDesigns.Crank());
        var series = CoilFlux.Compute(field, coil.Outline, coil.Turns, FluxQuadrature.Default with { FarFactor = 0 });
        double ri = coil.Outline.InnerDiameterMm!.Value / 2, ro = coil.Outline.OuterDiameterMm!.Value / 2, b = ro - ri;
        var (zs, zw) = GaussLegendre.Composite(new[] { field.CopperZMinMm, field.CopperZMaxMm }, 8, false);
        var (rs, rw) = GaussLegendre.Composite(new[] { 0, ri / 2, ri, ri + b / 2, ro }, 12, false);
        int na = 96;
        double th = thetaDeg * Math.PI / 180, sum = 0;
        for (int l = 0; l < zs.Length; l++)
            for (int i = 0; i < rs.Length; i++)
            {
                double w = rs[i] < ri ? 1 : (ro - rs[i]) / b;
                for (int j = 0; j < na; j++)
                {
                    double a = 2 * Math.PI * j / na;
                    var p = new Vec2(coil.Outline.PitchRadiusMm + rs[i] * Math.Cos(a), rs[i] * Math.Sin(a)).RotatedDeg(-thetaDeg);
                    sum += zw[l] * rw[i] * rs[i] * (2 * Math.PI / na) * w * field.Bz(p.X, p.Y, zs[l]);
                }
            }
        double lambda = sum / (field.CopperZMaxMm - field.CopperZMinMm) * coil.Turns * 1e-6;
        Assert.Equal(lambda, series.At(th), Math.Abs(series.PeakWb()) * 1e-3);
    }

    // Independent check for a keystone coil: a fine midpoint grid over the outline's bounding box with the weight
    // 1 - distance/build (the implementation integrates in machine polar coordinates with harmonics).
    [Fact]
    public void KeystoneCoilAgainstGridIntegration()
    {
        var (field, coil) = Build(TestDesigns.DualStator());
        var series = CoilFlux.Compute(field, coil.Outline, coil.Turns, FluxQuadrature.Default with { FarFactor = 0 });
        var o = coil.Outline;
        double ha = o.WindowHalfAngleDeg * Math.PI / 180;
        double x0 = o.WindowMinRadiusMm * Math.Cos(ha) - o.RadialBuildMm - 0.1, x1 = o.OuterMaxRadiusMm + 0.1;
        double y1 = o.WindowMaxRadiusMm * Math.Sin(ha) + o.RadialBuildMm + 0.1;
        int nx = 260, ny = 260;
        double hx = (x1 - x0) / nx, hy = 2 * y1 / ny;
        var (zs, zw) = GaussLegendre.Composite(new[] { field.CopperZMinMm, field.CopperZMaxMm }, 4, false);
        double sum = 0;
        for (int i = 0; i < nx; i++)
            for (int j = 0; j < ny; j++)
            {
                var p = new Vec2(x0 + (i + 0.5) * hx, -y1 + (j + 0.5) * hy);
                double w = Math.Max(0, 1 - o.DistanceToWindowMm(p) / o.RadialBuildMm);
                if (w == 0) continue;
                for (int l = 0; l < zs.Length; l++) sum += zw[l] * w * hx * hy * field.Bz(p.X, p.Y, zs[l]);
            }
        double lambda = sum / (field.CopperZMaxMm - field.CopperZMinMm) * coil.Turns * 1e-6;
        Assert.Equal(lambda, series.At(0), Math.Abs(lambda) * 3e-3);
    }

    // Independent check (flux of a circle from the on-axis field): a tiny coil coaxial with a disc magnet links
    // Int w [B(z) - rho^2/4 B''(z)] dA (the standard off-axis expansion of an axisymmetric field), with B(z) the
    // on-axis closed form of docs/physics.md §3 — plus the far magnet's small share.
    [Fact]
    public void CoaxialTinyCoilAgainstOnAxisExpansion()
    {
        var d = new M.Design
        {
            Machine = new M.Machine { Layout = "single-rotor", Poles = 2, Coils = 1, Phases = 1, Connection = "series" },
            Magnets = new M.Magnets { Shape = "disc", Diameter = 12, Thickness = 4, Br = 1.3, PitchRadius = 40 },
            Rotor = new M.Rotor { Thickness = 4, PocketFloor = 1 },
            Coils = new M.Coils { Wire = new M.Wire { Awg = 40 }, Turns = 30, FillFactor = 0.45, Height = 1, Core = new M.Core { Diameter = 0.6 } },
            Former = new M.Former { Flange = 0.5 },
            Stator = new M.Stator { Thickness = 2 },
            Gap = new M.Gap { AirGap = 0.8 },
        };
        var (field, coil) = Build(d);
        var series = CoilFlux.Compute(field, coil.Outline, coil.Turns, FluxQuadrature.Default with { FarFactor = 0 });
        var stack = PartForge.Design.Machines.MachineModel.From(d).Stack;
        var magnet = stack.Slabs.Single(s => s.Kind == SlabKind.Magnet);
        double a = 6, len = 4;
        double F(double u) => u / Math.Sqrt(u * u + a * a);
        double F2(double u) => -3 * a * a * u / Math.Pow(u * u + a * a, 2.5);
        double ri = 0.3, ro = ri + coil.Outline.RadialBuildMm, b = ro - ri;
        // Weighted area moments Int w dA and Int w rho^2 dA.
        double m0 = Math.PI * ri * ri, m2 = Math.PI * Math.Pow(ri, 4) / 2;
        int n = 20000;
        for (int i = 0; i < n; i++)
        {
            double r = ri + (i + 0.5) * b / n, w = (ro - r) / b, dA = 2 * Math.PI * r * b / n;
            m0 += w * dA; m2 += w * r * r * dA;
        }
        var (zs, zw) = GaussLegendre.Composite(new[] { field.CopperZMinMm, field.CopperZMaxMm }, 8, false);
        double sum = 0;
        var far = field.Sources.Single(s => s.CentreDeg > 90);
        for (int l = 0; l < zs.Length; l++)
        {
            double dist = magnet.ZMin - zs[l];
            double bz = 1.3 / 2 * (F(dist + len) - F(dist));
            double bz2 = 1.3 / 2 * (F2(dist + len) - F2(dist));
            sum += zw[l] * (m0 * bz - m2 / 4 * bz2 + m0 * far.BzExact(40, 0, zs[l]));
        }
        double lambda = sum / (field.CopperZMaxMm - field.CopperZMinMm) * coil.Turns * 1e-6;
        Assert.Equal(lambda, series.At(0), Math.Abs(lambda) * 1e-3);
    }
}
