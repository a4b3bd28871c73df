using NetTopologySuite.Geometries;
using NtsGeometry = NetTopologySuite.Geometries.Geometry;
using PartForge.Design.Loading;
using PartForge.Design.Machines;
using PartForge.Design.Parts;
using PartForge.Design.Presets;
using PartForge.Electrical;
using PartForge.Geometry.Profiles;
using PartForge.Parts.Shapes;

namespace PartForge.Parts.Tests.Rotors;

/// <summary>
/// Corner reliefs of the magnet pockets: a magnet of the nominal size seats in the pocket as the tool makes it.
/// The made pocket is modelled in the test, independently of the kernel's relief: a round tool of radius rho can
/// clear exactly the morphological opening of the drawn hole by a disc of radius rho (erode by rho, dilate by rho;
/// NetTopologySuite's buffer on the contour flattened here to 0.0005 mm). rho is half the extrusion line for a
/// printed rotor (line width = printer.nozzle, common practice) and half the kerf for a cut one (the beam's radius).
/// On every preset whose pockets have corners, the nominal magnet outline (shape outline at clearance 0, at the
/// pocket's angle) lies inside the made pocket; with rotor.pocket_clearance 0 it still does, and without the
/// reliefs it does not (the control: the corners would stop the magnet).
/// </summary>
public sealed class PocketReliefTests
{
    private static readonly GeometryFactory Gf = new();

    public static TheoryData<string, string> Cases()
    {
        var d = new TheoryData<string, string>();
        foreach (var p in PresetLibrary.All.Where(p => !p.Text.Contains("shape: disc", StringComparison.Ordinal)))
        {
            d.Add(p.Name, "print");
            d.Add(p.Name, "cut");
        }
        return d;
    }

    private static (MachineModel M, PartSet Parts) Build(string preset, string process, double? clearance)
    {
        string text = PresetLibrary.Find(preset)!.Text;
        if (clearance is { } c)
            text = System.Text.RegularExpressions.Regex.Replace(text, @"pocket_clearance: [0-9.]+", "pocket_clearance: " + c.ToString(System.Globalization.CultureInfo.InvariantCulture));
        if (process == "cut")
            text = System.Text.RegularExpressions.Regex.Replace(text, @"pocket_floor: [0-9.]+", "pocket_floor: 0")
                   + (text.Contains("\nparts:", StringComparison.Ordinal) ? "" : "parts:\n") + "  rotor: { process: cut, material: acrylic }\n";
        var loaded = DesignLoader.LoadText(text, preset + ".yaml");
        Assert.True(loaded.Machine is not null, string.Join("\n", loaded.Errors));
        var m = loaded.Machine!;
        var e = ElectricalEngine.Evaluate(m);
        return (m, PartsBuilder.Build(m, e, m.Precision));
    }

    [Theory]
    [MemberData(nameof(Cases))]
    public void The_nominal_magnet_seats_in_every_relieved_pocket(string preset, string process)
    {
        foreach (double? clearance in new double?[] { null, 0 })
        {
            var (m, parts) = Build(preset, process, clearance);
            var rotor = parts.Parts.First(p => p.Role == PartRole.Rotor);
            Assert.Equal(process == "cut" ? PartProcess.Cut : PartProcess.Print, rotor.Process);
            double rho = process == "cut" ? m.Cutter.KerfMm / 2 : m.Printer.NozzleMm / 2;
            var magnet0 = m.Magnets.Shape.Outline(0);
            var plain0 = DesignGeometry.PocketOutline(m);
            foreach (var f in rotor.FeaturesOf(FeatureKind.MagnetPocket))
            {
                var magnet = Polygon(magnet0.RotatedDeg(f.AngleDeg));
                var made = Made(Polygon(f.Contour), rho);
                // Exact clearance, to the flattening: how far the magnet stays inside the made pocket (0 at a side when the clearance is 0).
                double inside = Clearance(magnet, made);
                Assert.True(inside >= -2e-3, $"{preset} {process} clearance {clearance}: {f.Name}: the magnet sticks {-inside} mm out of the made pocket");
                // The relief only removes material: the drawn pocket holds the unrelieved one.
                // (1e-3 mm: more than the flattening's sagitta.)
                double lost = Polygon(plain0.RotatedDeg(f.AngleDeg)).Difference(Polygon(f.Contour).Buffer(1e-3)).Area;
                Assert.True(lost < 1e-9, $"{f.Name}: the relief took {lost} mm2 out of the pocket's inside");
                if (clearance == 0)
                {
                    // Control: without the relief, the tool's round leaves the magnet's corners outside the pocket.
                    double bare = Clearance(magnet, Made(Polygon(plain0.RotatedDeg(f.AngleDeg)), rho));
                    Assert.True(bare < -0.01, $"{f.Name}: the unrelieved pocket already takes the magnet ({bare} mm), so the test proves nothing");
                }
            }
        }
    }

    /// <summary>The hole a round tool of radius rho clears: the opening of the drawn hole by a disc of radius rho.</summary>
    private static NtsGeometry Made(NtsGeometry hole, double rho) => rho <= 0 ? hole : hole.Buffer(-rho, 256).Buffer(rho, 256);

    /// <summary>Least distance from the magnet's boundary to the made pocket's boundary, negative when part of the magnet is outside.</summary>
    private static double Clearance(NtsGeometry magnet, NtsGeometry made)
    {
        var outside = magnet.Difference(made);
        if (outside.Area > 1e-9)
        {
            // How far out: the largest distance of an outside vertex from the made pocket.
            return -outside.Coordinates.Max(c => Gf.CreatePoint(c).Distance(made));
        }
        return made.Boundary.Distance(magnet.Boundary);
    }

    /// <summary>A contour flattened to within 0.0005 mm of its arcs (points on the true curve).</summary>
    private static Polygon Polygon(Contour c)
    {
        var pts = new List<Coordinate>();
        if (c.Circle is { } circle)
        {
            int n = 2048;
            for (int i = 0; i < n; i++) pts.Add(new Coordinate(circle.Center.X + circle.Radius * Math.Cos(2 * Math.PI * i / n), circle.Center.Y + circle.Radius * Math.Sin(2 * Math.PI * i / n)));
        }
        else
            foreach (var s in c.Segments)
            {
                if (s is ArcSegment a)
                {
                    double step = 2 * Math.Acos(Math.Max(-1, 1 - 0.0005 / a.Radius)) * 180 / Math.PI;
                    int n = Math.Max(2, (int)Math.Ceiling(Math.Abs(a.SweepDeg) / step));
                    for (int i = 0; i < n; i++)
                    {
                        double deg = (a.StartDeg + a.SweepDeg * i / n) * Math.PI / 180;
                        pts.Add(new Coordinate(a.Center.X + a.Radius * Math.Cos(deg), a.Center.Y + a.Radius * Math.Sin(deg)));
                    }
                }
                else pts.Add(new Coordinate(s.Start.X, s.Start.Y));
            }
        pts.Add(pts[0]);
        var poly = Gf.CreatePolygon(pts.ToArray());
        return poly.IsValid ? poly : (Polygon)poly.Buffer(0);
    }
}
