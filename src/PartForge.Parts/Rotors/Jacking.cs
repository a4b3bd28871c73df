using PartForge.Design.Hardware;
using PartForge.Design.Machines;
using PartForge.Design.Parts;
using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;
using PartForge.Parts.Shapes;

namespace PartForge.Parts.Rotors;

/// <summary>
/// Jacking screws for the last rotor of a dual-rotor machine (<c>rotor-front</c>, lowered onto the stack last):
/// one between each pair of bolt-circle holes, on the bolt circle, so its tip bears on the hub spacer's face. Each
/// screw passes a clearance hole (the bolt circle's hole) through the back iron and the rotor and runs in a hex
/// nut held in a nut trap on the rotor's stator-side face; the rotor's pull presses the trap's floor onto the nut,
/// and backing the screws off lowers the rotor under control. The screw's thread is the one the bolt circle's
/// hole takes (ISO 273 fine-series rule). The trap is the nut's hex (ISO 4032 s, from memory) grown by
/// <c>tolerances.print_xy</c> + <see cref="TrapClearanceMm"/> across flats, <see cref="TrapExtraDepthMm"/> deeper
/// than the nut. Left out, with a note, when the rotor is cut (a trap is not one flat sheet), when the traps would
/// come nearer than a minimum wall to the bore, the bolt holes or the pockets' inner radius, or when less than a
/// minimum wall would remain above them.
/// </summary>
public sealed record JackingPlan(PartId Rotor, MetricThread Thread, double CircleRadiusMm, IReadOnlyList<double> AnglesDeg,
    double HoleMm, double TrapAcrossFlatsMm, double TrapDepthMm)
{
    /// <summary>Circumradius of the trap's hex, mm.</summary>
    public double TrapCircumradiusMm => TrapAcrossFlatsMm / Math.Sqrt(3);

    /// <summary>The clearance hole at jack j (part-local, unflipped).</summary>
    public Contour Hole(int j) => Contour.FullCircle(Vec2.FromAngleDeg(AnglesDeg[j]) * CircleRadiusMm, HoleMm / 2);

    /// <summary>The nut trap at jack j: a hex with a flat facing the axis.</summary>
    public Contour Trap(int j)
    {
        var c = Vec2.FromAngleDeg(AnglesDeg[j]) * CircleRadiusMm;
        double rc = TrapCircumradiusMm;
        return Contour.Polygon(Enumerable.Range(0, 6).Select(k => c + Vec2.FromAngleDeg(AnglesDeg[j] + 60 * k) * rc).ToArray());
    }
}

internal static class Jacking
{
    public const double TrapClearanceMm = 0.1;
    public const double TrapExtraDepthMm = 0.2;

    /// <summary>The plan, or null (with a note in <paramref name="diags"/> when a dual-rotor machine cannot have one).</summary>
    public static JackingPlan? For(MachineModel d, List<PartDiagnostic>? diags)
    {
        if (!d.Layout.StatorBetweenRotors || d.Rotor.BoltCircle is not { } bc) return null;
        var id = d.Layout.Rotors[0];
        void Note(string why) => diags?.Add(new PartDiagnostic(DiagnosticSeverity.Note, id, "no-jacking-screws", $"{id.Name}: no jacking screws ({why}); lower it onto the stack by other means, against the full pull"));
        var (process, _) = ProcessChoice.Resolve(id, d.Parts.For(PartRole.Rotor), d.ThroughPockets, "", new List<PartDiagnostic>());
        if (process == PartProcess.Cut) { Note("the rotor is cut from sheet, and a nut trap is not one flat sheet"); return null; }
        if (MetricThreads.ForHole(bc.HoleMm) is not { } pick) { Note("the bolt circle's hole takes no metric thread"); return null; }
        var t = pick.Thread;
        double r = bc.CircleDiameterMm / 2, wall = DesignGeometry.MinWallMm(d);
        double s = t.NutAcrossFlatsMm + d.Tolerances.PrintXyMm + TrapClearanceMm;
        double depth = t.NutHeightMm + TrapExtraDepthMm;
        double rc = s / Math.Sqrt(3);
        var (pIn, _) = PartForge.Geometry.Exact.Exact2D.RadialExtent(DesignGeometry.PocketOutline(d));
        double halfStep = Math.PI / bc.Count;
        double toBolt = 2 * r * Math.Sin(halfStep / 2);
        if (d.Rotor.ThicknessMm - depth < wall) { Note($"a {t.Size} nut trap {Fmt(depth)} mm deep leaves less than a {Fmt(wall)} mm wall in the {Fmt(d.Rotor.ThicknessMm)} mm rotor"); return null; }
        if (r + rc > pIn - wall) { Note($"a {t.Size} nut trap on the bolt circle reaches radius {Fmt(r + rc)} mm, within a {Fmt(wall)} mm wall of the pockets at {Fmt(pIn)} mm"); return null; }
        if (r - rc < d.Rotor.BoreMm / 2 + wall) { Note($"a {t.Size} nut trap on the bolt circle comes within a {Fmt(wall)} mm wall of the bore"); return null; }
        if (toBolt - rc - bc.HoleMm / 2 < wall) { Note($"a {t.Size} nut trap between the bolt holes leaves less than a {Fmt(wall)} mm wall to them"); return null; }
        var angles = Enumerable.Range(0, bc.Count).Select(j => (j + 0.5) * 360.0 / bc.Count).ToArray();
        return new JackingPlan(id, t, r, angles, bc.HoleMm, s, depth);
    }

    private static string Fmt(double v) => v.ToString("0.###", System.Globalization.CultureInfo.InvariantCulture);
}
