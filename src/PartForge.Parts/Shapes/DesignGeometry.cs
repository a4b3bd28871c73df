using PartForge.Design.Machines;
using PartForge.Geometry.Exact;
using PartForge.Geometry.Fabrication;
using PartForge.Geometry.Profiles;

namespace PartForge.Parts.Shapes;

/// <summary>
/// Sizes and outlines that several parts derive from the machine, in one place so rotor, back iron,
/// stator and the checker can never disagree.
/// </summary>
public static class DesignGeometry
{
    /// <summary>
    /// Radial fit clearance added on each side of a printed part that slides into a printed opening (former
    /// in its seat, sensor body in its pocket), on top of <c>tolerances.print_xy</c>: 0.10 mm, a slip fit that
    /// takes a drop of glue (common practice: +0.1-0.3 mm on size for press to glued fits in printed parts).
    /// </summary>
    public const double SlipFitClearanceMm = 0.10;

    /// <summary>Per-side clearance between a former's flange footprint and its stator seat.</summary>
    public static double SeatClearanceMm(MachineModel m) => m.Tolerances.PrintXyMm + SlipFitClearanceMm;

    /// <summary>Smallest printable wall: <c>process.min_wall_lines x process.nozzle</c>.</summary>
    public static double MinWallMm(MachineModel m) => m.Process.MinWallMm;

    /// <summary>Angle of pocket (pole) i: i x 360 / poles, pocket 0 on +x.</summary>
    public static double PoleAngleDeg(MachineModel m, int i) => i * 360.0 / m.Poles;

    /// <summary>Angle of coil k: k x 360 / coils, coil 0 on +x.</summary>
    public static double CoilAngleDeg(MachineModel m, int k) => k * 360.0 / m.CoilsPerStator;

    /// <summary>Magnet pocket 0 (rotor.pocket_clearance added as the magnet shape defines it).</summary>
    public static Contour PocketOutline(MachineModel m) => m.Magnets.Shape.Outline(m.Rotor.PocketClearanceMm);

    /// <summary>
    /// How the corners of a magnet pocket that the tool cannot reach are relieved, so that a magnet of the nominal
    /// size seats to the bottom of every corner: a printed rotor gets a circle about each corner sized from the
    /// extrusion line (<see cref="CornerCircleRelief"/> with the line width taken as <c>printer.nozzle</c>, common
    /// practice); a cut rotor a dog-bone notch sized from the beam (<see cref="DogBoneRelief"/> with the tool radius
    /// kerf / 2). Null when there is no tool radius (a cut with kerf 0).
    /// </summary>
    public static CornerReliefRule? PocketRelief(MachineModel m, PartProcess process) =>
        process == PartProcess.Print ? new CornerCircleRelief(m.Printer.NozzleMm)
        : m.Cutter.KerfMm > 0 ? new DogBoneRelief(m.Cutter.KerfMm / 2) : null;

    /// <summary>Magnet pocket 0 as made: <see cref="PocketOutline"/> with its unreachable corners relieved (<see cref="PocketRelief"/>);
    /// a pocket without corners (a disc's) is unchanged, and so is one too small for the reliefs (<see cref="PocketReliefFits"/>).</summary>
    public static Contour RelievedPocketOutline(MachineModel m, PartProcess process) => Relieved(m, process).Pocket;

    /// <summary>False when the pocket has corners to relieve but is too small for the reliefs (a side shorter than two notches):
    /// then it is left as drawn, and the rotor builder says so.</summary>
    public static bool PocketReliefFits(MachineModel m, PartProcess process) => Relieved(m, process).Fits;

    private static (Contour Pocket, bool Fits) Relieved(MachineModel m, PartProcess process)
    {
        var pocket = PocketOutline(m);
        if (PocketRelief(m, process) is not { } rule) return (pocket, true);
        try
        {
            return (CornerRelief.RelieveHole(pocket, rule, m.Precision), true);
        }
        catch (ArgumentException)
        {
            return (pocket, false);
        }
    }

    /// <summary>Smallest and largest radius of the bare magnets (no clearance), exact on the outline.</summary>
    public static (double Min, double Max) MagnetRadialExtentMm(MachineModel m) => Exact2D.RadialExtent(m.Magnets.Shape.Outline(0));
}
