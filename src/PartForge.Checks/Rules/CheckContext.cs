using PartForge.Checks.Inputs;
using PartForge.Checks.Mechanics;
using PartForge.Checks.Stack;
using PartForge.Design.Machines;
using PartForge.Design.Machines.Magnets;
using PartForge.Design.Materials;
using PartForge.Design.Parts;
using PartForge.Design.Stack;

namespace PartForge.Checks.Rules;

/// <summary>Everything the rules share: the machine, its stack, the electrical facts, the parts, and derived figures.</summary>
internal sealed class CheckContext
{
    public MachineModel D { get; }
    public AxialStack Stack => D.Stack;
    public ElectricalFacts E { get; }
    public IReadOnlyList<PartView> Parts { get; }
    public MagnetShape Magnet => D.Magnets.Shape;
    public Material RotorMaterial { get; }
    public RotorPlate Plate { get; }
    public double BulgePerFaceMm { get; }
    public IReadOnlyList<PartId> RotorIds { get; }
    public double SweepStepDeg { get; }

    public CheckContext(MachineModel d, ElectricalFacts e, IReadOnlyList<PartView> parts, double sweepStepDeg)
    {
        D = d;
        E = e;
        Parts = parts;
        SweepStepDeg = sweepStepDeg;
        RotorMaterial = MaterialOf(d.Layout.Rotors[0]);
        Plate = new RotorPlate(d.Rotor.OuterDiameterMm / 2, RotorPlate.HubRadius(d.Rotor), Magnet.PitchRadiusMm, d.Rotor.ThicknessMm, RotorMaterial)
        {
            // The back-iron disc, bolted to the rotor on its bolt circle (not bonded: see RotorPlate).
            Backing = d.Rotor.BackIronThicknessMm is { } bi && d.Layout.AllowsBackIron
                ? new PlateBacking(Magnet.RadialRangeMm(0).Max, bi, // the steel covers at least the magnets (the pull acts inside it)
                    parts.FirstOrDefault(p => p.Id == PartId.BackIron)?.Material ?? PartForge.Design.Materials.MaterialTable.Steel)
                : null,
        };
        BulgePerFaceMm = CoilBulge.PerFaceMm(e.Turns, e.WireBareMm, d.Coils.HeightMm, e.Outline.RadialBuildMm, d.Former.MarginMm);
        RotorIds = d.Stack.OfKind(SlabKind.Rotor).Select(s => s.Owner).Distinct().ToArray();
    }

    public double Pull(PartId rotor) => E.PullOnRotorN.TryGetValue(rotor, out double f) ? Math.Max(0, f) : 0;

    public double Deflection(PartId rotor) => Plate.RimDeflectionMm(Pull(rotor));

    public PartView? Part(PartId id) => Parts.FirstOrDefault(p => p.Id == id);

    /// <summary>The first stator ring (the one the coil checks name).</summary>
    public PartId FirstStator => D.Layout.Stators[0];

    /// <summary>Material of a part: the part view's, else the design's choice for its role (as the part builders resolve it).</summary>
    public Material MaterialOf(PartId part) => Part(part)?.Material ?? D.Parts.For(part.Role).Material;

    public bool IsPrinted(PartId part)
    {
        if (Part(part) is { } pv) return pv.Process == PartProcess.Print;
        var choice = D.Parts.For(part.Role);
        return choice.Process is { } p ? p == PartProcess.Print : choice.Material.IsFilament;
    }

    /// <summary>Smallest wall a part may have: min_wall_lines x nozzle when printed; 1.0 mm when cut (common practice from memory: thinner laser-cut webs burn through or break).</summary>
    public double MinWall(PartId part) => IsPrinted(part) ? D.Process.MinWallMm : CutMinWebMm;

    public const double CutMinWebMm = 1.0;

    /// <summary>
    /// Smallest wall around a magnet pocket: as <see cref="MinWall"/>, but at least 3 lines when the pocket
    /// is a press fit (pocket_clearance up to 0.2 mm; common practice: 3 or more lines around press fits in printed parts).
    /// </summary>
    public double PocketWall(PartId part) =>
        IsPrinted(part) && D.Rotor.PocketClearanceMm <= 0.2 + 1e-12
            ? Math.Max(D.Process.MinWallLines, 3) * D.Process.NozzleMm
            : MinWall(part);

    public IReadOnlyList<FaceGap> Gaps() => StackUp.Compute(Stack, D.Tolerances.PrintZMm, D.Tolerances.RunoutMm, D.Tolerances.AxialPlayMm,
        IsPrinted, Deflection, BulgePerFaceMm, D.Former.FlangeMm);
}
