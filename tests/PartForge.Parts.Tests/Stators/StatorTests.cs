using PartForge.Design.Stack;
using PartForge.Geometry.Meshes;
using PartForge.Geometry.Primitives;

namespace PartForge.Parts.Tests.Stators;

public class StatorTests
{
    private static PartSet Build(PartForge.Design.Model.Design d, params double[] sensors)
    {
        double build = d.Machine.Layout == "single-rotor" ? 5 : 6;
        return PartsBuilder.Build(PartForge.Design.Machines.MachineModel.From(d), TestDesigns.RoundCoil(d, build, sensors), TestDesigns.Prec(d));
    }

    [Fact]
    public void SeatsOnThePitchCircleDoNotOverlap()
    {
        var d = TestDesigns.SingleRotor();
        var stator = Build(d, 20, 60, 100).Get(PartForge.Design.Parts.PartId.Stator);
        var seats = stator.FeaturesOf(FeatureKind.CoilSeat).ToList();
        Assert.Equal(9, seats.Count);
        double rs = 10 + 0.2; // flange radius + seat clearance
        // Closest approach of two round seats on the pitch circle: chord 2 r sin(pi/N) less both radii (the flats only widen it).
        double expected = 2 * 40 * Math.Sin(Math.PI / 9) - 2 * rs;
        Assert.True(expected > 0);
        for (int k = 0; k < 9; k++)
        {
            var next = seats[(k + 1) % 9].Contour;
            double min = Geo.Sample(seats[k].Contour, 256).Min(p => Geo.Distance(next, p));
            Assert.True(min >= expected - 1e-6, $"seat {k}: {min} < {expected}");
            // seat-k sits at coil k's machine angle (the ring is turned over in single-rotor).
            Assert.True(Geo.AngleDiff(k * 40.0, Geo.AngleOf(stator.Instances[0].ToMachine(seats[k].Position))) < 1e-9);
        }
    }

    [Fact]
    public void SensorPocketsAtTheGivenAnglesInTheMachine()
    {
        foreach (var (d, angles) in new[]
        {
            (TestDesigns.SingleRotor(), new[] { 20.0, 60, 100 }),
            (TestDesigns.DualRotor(), new[] { 15.0, 45, 75 }),
            (TestDesigns.DualStator(), new[] { 45.0 }),
        })
        {
            var set = Build(d, angles);
            var stator = set.Parts.First(p => p.Name is "stator" or "stator-front");
            var inst = stator.Instances.Single();
            var pockets = stator.FeaturesOf(FeatureKind.SensorPocket).ToList();
            Assert.Equal(angles.Length, pockets.Count);
            for (int i = 0; i < angles.Length; i++)
            {
                var centre = inst.ToMachine(Geo.VertexCentroid(pockets[i].Contour));
                Assert.True(Geo.AngleDiff(angles[i], Geo.AngleOf(centre)) < 0.1, $"{d.Name} sensor {i}: {Geo.AngleOf(centre)}");
                Assert.Equal(d.Coils.PitchRadius!.Value, centre.Length, 9);
                Assert.Equal(d.Sensor.Body.Height, pockets[i].Z1Mm - pockets[i].Z0Mm, 12);
                // The pocket opens on the face toward the rotor: machine z of its open end is nearer the rotor.
                double open = pockets[i].Z0Mm == 0 ? inst.ToMachineZ(0) : inst.ToMachineZ(stator.HeightMm);
                double other = pockets[i].Z0Mm == 0 ? inst.ToMachineZ(stator.HeightMm) : inst.ToMachineZ(0);
                var rotorSlab = set.Stack.Slabs.Where(s => s.Kind == SlabKind.Rotor).OrderByDescending(s => s.Owner == PartForge.Design.Parts.PartId.RotorFront).First(); // dual-rotor: toward rotor-front
                double rotorMid = (rotorSlab.ZMin + rotorSlab.ZMax) / 2;
                Assert.True(Math.Abs(open - rotorMid) < Math.Abs(other - rotorMid), $"{d.Name}: sensor pocket faces away from the rotor");
            }
            if (set.Find(PartForge.Design.Parts.PartId.StatorBack) is { } back) Assert.Empty(back.FeaturesOf(FeatureKind.SensorPocket));
        }
    }

    [Fact]
    public void VolumeWithoutSensorsMatchesClosedForm()
    {
        var d = TestDesigns.SingleRotor("none");
        var stator = Build(d).Get(PartForge.Design.Parts.PartId.Stator);
        double Ro = 65, Ri = 15, s = 6, p = 40, rf = 10, k = 0.6, c = 0.2, dw = 0.357;
        // Seat = footprint grown by c; for a convex footprint its area is A + P c + pi c^2 (Steiner's formula).
        var (arc, chord) = Geo.SegmentArcChord(rf, k);
        double aFp = Geo.Circle(rf) - Geo.SegmentArea(rf, k), pFp = 2 * Math.PI * rf - arc + chord;
        double aSeat = aFp + pFp * c + Math.PI * c * c, rs = rf + c;
        // Grooves as documented: depth min(max(2 layer, 2 wire), s/3), channel width max(1, 3 wire),
        // collector in the widest free band between the seats (+wall) and the mount holes (-wall), as wide as 18 leads at packing 0.5.
        double dg = Math.Min(Math.Max(0.4, 2 * dw), s / 3), w = Math.Max(1.0, 3 * dw), wall = 0.8;
        double lo = p + rs + wall, hi = 61 - 2.25 - wall;
        double wc = Math.Min(18 * dw * dw / (0.5 * dg), hi - lo), rc = (lo + hi) / 2, r1 = rc - wc / 2, r2 = rc + wc / 2;
        double channel = Geo.ChordStrip(r1, w / 2) - w * p - Geo.ChordStrip(rs, w / 2);   // outside the seat and the collector
        double exit = Geo.ChordStrip(Ro, wc / 2) - Geo.ChordStrip(r2, wc / 2);           // collector to rim
        double grooves = Geo.Circle(r2) - Geo.Circle(r1) + 9 * channel + exit;
        double plan = Geo.Circle(Ro) - Geo.Circle(Ri) - 9 * aSeat - 4 * Geo.Circle(2.25);
        double v = plan * s - grooves * dg;
        double e = TestDesigns.Tol;
        double bound = e * 2 * Math.PI * (Ro + Ri + 9 * rs + 4 * 2.25 + r1 + r2) * s;
        Assert.InRange(stator.VolumeMm3, v - bound, v + bound);
    }

    [Fact]
    public void MeshesValidWithGenusEqualToThroughHoles()
    {
        Check(Build(TestDesigns.SingleRotor(), 20, 60, 100).Get(PartForge.Design.Parts.PartId.Stator), 1 + 9 + 4 + 3);   // bore, seats, mounts, sensor lead holes
        Check(Build(TestDesigns.DualRotor(), 15, 45, 75).Get(PartForge.Design.Parts.PartId.Stator), 1 + 12 + 6);        // sensors on the grooved face: no lead holes
        var ds = Build(TestDesigns.DualStator(), 45);
        Check(ds.Get(PartForge.Design.Parts.PartId.StatorFront), 1 + 4 + 4 + 1);
        Check(ds.Get(PartForge.Design.Parts.PartId.StatorBack), 1 + 4 + 4);
    }

    private static void Check(PartModel p, int genus)
    {
        var r = MeshValidator.Validate(p.Mesh);
        Assert.True(r.IsValid, $"{p.Name}: {r}");
        Assert.Equal(genus, r.Genus);
    }

    [Fact]
    public void DualStatorRingsMirrorEachOtherAcrossTheRotor()
    {
        var set = Build(TestDesigns.DualStator(), 45);
        var front = set.Get(PartForge.Design.Parts.PartId.StatorFront);
        var back = set.Get(PartForge.Design.Parts.PartId.StatorBack);
        var fi = front.Instances.Single();
        var bi = back.Instances.Single();
        Assert.False(fi.Flipped);
        Assert.True(bi.Flipped);
        // Mirror images through z = 0: same height, faces at opposite z.
        Assert.Equal(fi.BottomZMm, -bi.TopZMm, 9);
        // Grooved (top) faces turned away from the rotor: front's top at its highest z, back's top at its lowest.
        Assert.Equal(fi.TopZMm, fi.ToMachineZ(front.HeightMm), 12);
        Assert.Equal(bi.BottomZMm, bi.ToMachineZ(back.HeightMm), 12);
        foreach (var kind in new[] { FeatureKind.CoilSeat, FeatureKind.MountHole })
        {
            var fc = front.FeaturesOf(kind).Select(f => fi.ToMachine(f.Position)).ToList();
            var bc = back.FeaturesOf(kind).Select(f => bi.ToMachine(f.Position)).ToList();
            Assert.Equal(fc.Count, bc.Count);
            Assert.All(fc, p => Assert.Contains(bc, q => (p - q).Length < 1e-9));
        }
    }
}
