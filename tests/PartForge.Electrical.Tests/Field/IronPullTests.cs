using PartForge.Design.Machines.Magnets;
using PartForge.Electrical.Field;

namespace PartForge.Electrical.Tests.Field;

/// <summary>
/// The rotor-to-rotor pull with back iron against an independent computation written here: the mid-plane Maxwell
/// stress F = 1/(2 mu0) Int (Bz^2 - Bt^2) dA of the field of the magnets and their image lattice between two ideal
/// iron planes (the lattice enumerated here as translations by twice the iron spacing of each ring and of its
/// mirror in the upper iron, not as chains of reflections), integrated over one pole pitch of the plane (B^2
/// repeats every pole pitch) with composite Gauss radially and the periodic midpoint rule in angle.
/// Source: Maxwell stress tensor (e.g. Jackson, Classical Electrodynamics, 3rd ed., section 6.7); image method for
/// ideal iron (Furlani, Permanent Magnet and Electromechanical Devices, 2001, from memory).
/// </summary>
public class IronPullTests
{
    private const double Mu0 = 4e-7 * Math.PI;

    private static (double Bx, double By, double Bz) FieldOf(MagnetShape g, double centreDeg, double zMin, double br, double x, double y, double z)
    {
        double t = g.ThicknessMm, c = Math.Cos(centreDeg * Math.PI / 180), s = Math.Sin(centreDeg * Math.PI / 180);
        double u = x * c + y * s, v = -x * s + y * c;
        switch (g)
        {
            case BlockMagnet b:
            {
                var (bu, bv, bz) = CuboidField.B(br, b.PitchRadiusMm - b.LengthMm / 2, b.PitchRadiusMm + b.LengthMm / 2, -b.WidthMm / 2, b.WidthMm / 2, zMin, zMin + t, u, v, z);
                return (bu * c - bv * s, bu * s + bv * c, bz);
            }
            case DiscMagnet d:
            {
                double du = u - d.PitchRadiusMm, rho = Math.Sqrt(du * du + v * v);
                var (brho, bz) = CylinderField.B(br, d.DiameterMm / 2, t / 2, rho, z - (zMin + t / 2));
                double eu = rho > 1e-12 ? du / rho : 0, ev = rho > 1e-12 ? v / rho : 0;
                double bu = brho * eu, bv = brho * ev;
                return (bu * c - bv * s, bu * s + bv * c, bz);
            }
            default: throw new ArgumentException("disc or block");
        }
    }

    /// <summary>Attraction on the upper rotor by mid-plane Maxwell stress, N.</summary>
    private static double MaxwellStressPullN(MagnetShape g, int poles, double br, double upperMin, double lowerMax, double? upperIron, double? lowerIron)
    {
        double t = g.ThicknessMm;
        var rings = new List<double> { upperMin, lowerMax - t };
        if (upperIron is { } pa && lowerIron is { } pb)
        {
            double period = 2 * (pa - pb);
            var cell = new[] { upperMin, lowerMax - t, 2 * pa - upperMin - t, 2 * pa - (lowerMax - t) - t };
            rings.Clear();
            for (int k = -12; k <= 12; k++)
                foreach (double z0 in cell)
                {
                    double z = z0 + k * period;
                    if (Math.Abs(z - (upperMin + lowerMax) / 2) < 260) rings.Add(z);
                }
        }
        double zMid = (upperMin + lowerMax) / 2;
        double size = g.PlanSizeMm;
        double r0 = g.PitchRadiusMm;
        var breaks = new List<double> { 0, Math.Max(0.5, r0 - size - 12) };
        for (double r = r0 - size - 4; r <= r0 + size + 4; r += 0.5) if (r > breaks[^1] + 1e-9) breaks.Add(r);
        breaks.AddRange(new[] { r0 + size + 12, r0 + size + 40, r0 + size + 120 });
        double[] gx = { -0.8611363115940526, -0.3399810435848563, 0.3399810435848563, 0.8611363115940526 };
        double[] gw = { 0.3478548451374538, 0.6521451548625461, 0.6521451548625461, 0.3478548451374538 };
        int na = 64;
        double pitch = 2 * Math.PI / poles;
        double sum = 0;
        for (int p = 0; p + 1 < breaks.Count; p++)
        {
            double a = breaks[p], b = breaks[p + 1];
            for (int q = 0; q < 4; q++)
            {
                double r = (a + b) / 2 + (b - a) / 2 * gx[q], wr = (b - a) / 2 * gw[q] * r;
                for (int j = 0; j < na; j++)
                {
                    double th = pitch * (j + 0.5) / na, x = r * Math.Cos(th), y = r * Math.Sin(th);
                    double bx = 0, by = 0, bz = 0;
                    foreach (double z0 in rings)
                        for (int k = 0; k < poles; k++)
                        {
                            var f = FieldOf(g, k * 360.0 / poles, z0, (k % 2 == 0 ? 1 : -1) * br, x, y, zMid);
                            bx += f.Bx; by += f.By; bz += f.Bz;
                        }
                    sum += wr * pitch / na * (bz * bz - bx * bx - by * by);
                }
            }
        }
        return poles * sum * 1e-6 / (2 * Mu0);
    }

    public static IEnumerable<object[]> Cases()
    {
        foreach (double s in new[] { 3.0, 6.0, 12.0 })
        {
            yield return new object[] { "disc", s };
            yield return new object[] { "block", s };
        }
    }

    private static (MagnetShape G, int Poles) Geometry(string kind) => kind == "disc"
        ? (new DiscMagnet(12, 4, 30), 8)
        : (new BlockMagnet(16, 10, 5, 40), 12);

    // Acceptance: within 5 % of the independent integration, disc and block magnets, three separations.
    [Theory]
    [MemberData(nameof(Cases))]
    public void PullWithIronMatchesMidPlaneMaxwellStress(string kind, double separation)
    {
        var (g, poles) = Geometry(kind);
        double br = 1.3, t = g.ThicknessMm, back = 1.5; // iron face 1.5 mm behind each magnet (a pocket floor)
        double lowerMax = 0, upperMin = separation;
        double upperIron = upperMin + t + back, lowerIron = lowerMax - t - back;
        var series = new IronPullSeries(g, poles, br, RotorField.DefaultFarFactor);
        double f = series.PullN(upperMin, lowerMax, upperIron, lowerIron);
        double reference = MaxwellStressPullN(g, poles, br, upperMin, lowerMax, upperIron, lowerIron);
        Assert.True(reference > 0);
        Assert.InRange(f, 0.95 * reference, 1.05 * reference);
        // The iron adds to the pull: more than the magnets alone.
        Assert.True(f > series.RingForceN(separation));
    }

    // Without iron the series is the plain pair force, and it matches the same Maxwell-stress integration.
    [Theory]
    [InlineData("disc", 3.0)]
    [InlineData("block", 6.0)]
    public void WithoutIronIsThePairForce(string kind, double separation)
    {
        var (g, poles) = Geometry(kind);
        var series = new IronPullSeries(g, poles, 1.3, RotorField.DefaultFarFactor);
        double f = series.PullN(separation, 0, null, null);
        Assert.Equal(series.RingForceN(separation), f, 12);
        var target = new MagnetSource(g, 0, separation, separation + g.ThicknessMm, 1.3, RotorField.DefaultFarFactor);
        var ring = Enumerable.Range(0, poles).Select(k => new MagnetSource(g, k * 360.0 / poles, -g.ThicknessMm, 0, (k % 2 == 0 ? 1 : -1) * 1.3, RotorField.DefaultFarFactor)).ToList();
        Assert.Equal(-poles * MagneticPull.AxialForceN(target, ring, separation), f, 1e-9 * f);
        double reference = MaxwellStressPullN(g, poles, 1.3, separation, 0, null, null);
        Assert.InRange(f, 0.97 * reference, 1.03 * reference);
    }
}

public class AssemblyPullCurveTests
{
    // The assembly curve starts at the running pull, falls as the rotors part, and its coarser quadrature agrees with
    // the running-gap series within 1 % (the same model at full order; the model itself is checked above).
    [Fact]
    public void CurveFallsAndAgreesWithTheFineSeries()
    {
        var machine = PartForge.Design.Machines.MachineModel.From(TestDesigns.Large());
        var p = MagneticPull.Compute(machine);
        Assert.True(p.AssemblyCurve.Count >= 5);
        Assert.Equal(p.FaceToFaceMm, p.AssemblyCurve[0].FaceToFaceMm, 12);
        Assert.Equal(p.RotorToRotorN, p.AssemblyCurve[0].PullN, 12);
        for (int i = 1; i < p.AssemblyCurve.Count; i++)
        {
            Assert.True(p.AssemblyCurve[i].FaceToFaceMm > p.AssemblyCurve[i - 1].FaceToFaceMm);
            Assert.True(p.AssemblyCurve[i].PullN < p.AssemblyCurve[i - 1].PullN);
        }
        var stack = machine.Stack;
        var mags = stack.OfKind(PartForge.Design.Stack.SlabKind.Magnet).OrderByDescending(s => s.ZMax).ToList();
        var irons = stack.OfKind(PartForge.Design.Stack.SlabKind.BackIron).OrderByDescending(s => s.ZMax).ToList();
        var fine = new IronPullSeries(machine.Magnets.Shape, machine.Poles, machine.Magnets.BrTesla, RotorField.DefaultFarFactor);
        foreach (var pt in p.AssemblyCurve.Skip(1).Take(4))
        {
            double d = pt.FaceToFaceMm - p.FaceToFaceMm;
            double f = fine.PullN(mags[0].ZMin + d, mags[1].ZMax, irons[0].ZMin + d, irons[^1].ZMax);
            Assert.Equal(f, pt.PullN, 0.01 * f);
        }
        // Iron pulls harder than the magnets alone at every separation.
        var alone = new IronPullSeries(machine.Magnets.Shape, machine.Poles, machine.Magnets.BrTesla, RotorField.DefaultFarFactor);
        Assert.True(p.RotorToRotorN > alone.RingForceN(p.FaceToFaceMm) * 1.05);
    }
}
