using PartForge.Checks.Inputs;
using PartForge.Checks.Materials;
using PartForge.Checks.Mechanics;
using PartForge.Checks.Stack;
using PartForge.Design.Stack;
using PartForge.Parts;

namespace PartForge.Checks.Rules;

/// <summary>Everything the rules share: the design, the nominal stack, the electrical facts, the parts, and derived figures.</summary>
internal sealed class CheckContext
{
    public Design.Model.Design D { get; }
    public AxialStack Stack { get; }
    public ElectricalFacts E { get; }
    public IReadOnlyList<PartView> Parts { get; }
    public MagnetBody Magnet { get; }
    public Material RotorMaterial { get; }
    public RotorPlate Plate { get; }
    public double BulgePerFaceMm { get; }
    public IReadOnlyList<string> RotorNames { get; }
    public double SweepStepDeg { get; }

    public CheckContext(Design.Model.Design d, AxialStack stack, ElectricalFacts e, IReadOnlyList<PartView> parts, double sweepStepDeg)
    {
        D = d;
        Stack = stack;
        E = e;
        Parts = parts;
        SweepStepDeg = sweepStepDeg;
        Magnet = MagnetBody.From(d.Magnets);
        RotorMaterial = MaterialTable.Get(MaterialOf("rotor"));
        double loadRadius = Magnet.Shape == "arc" ? (Magnet.InnerRadiusMm + Magnet.OuterRadiusMm) / 2 : Magnet.PitchRadiusMm;
        Plate = new RotorPlate(d.Rotor.OuterDiameter / 2, RotorPlate.HubRadius(d.Rotor), loadRadius, d.Rotor.Thickness, RotorMaterial);
        BulgePerFaceMm = CoilBulge.PerFaceMm(e.Turns, e.WireBareMm, d.Coils.Height, e.Outline.RadialBuildMm, d.Former.Margin);
        RotorNames = stack.Slabs.Where(s => s.Kind == SlabKind.Rotor).Select(s => s.Owner).Distinct().ToArray();
    }

    public double Pull(string rotor) => E.PullOnRotorN.TryGetValue(rotor, out double f) ? Math.Max(0, f) : 0;

    public double Deflection(string rotor) => Plate.RimDeflectionMm(Pull(rotor));

    public PartView? Part(string name) => Parts.FirstOrDefault(p => p.Name == name);

    /// <summary>Material of a part: the part view's, else the design's override / section / default (as the part builders resolve it).</summary>
    public string MaterialOf(string part)
    {
        if (Part(part) is { } pv) return pv.Material;
        var o = D.Parts;
        if (part.StartsWith("rotor", StringComparison.Ordinal)) return o.Rotor?.Material ?? D.Rotor.Material;
        if (part.StartsWith("stator", StringComparison.Ordinal)) return o.Stator?.Material ?? D.Stator.Material;
        if (part == "former") return o.Former?.Material ?? "PLA";
        if (part == "back-iron") return o.BackIron?.Material ?? "steel";
        return o.Spacer?.Material ?? "acrylic";
    }

    public bool IsPrinted(string part)
    {
        if (Part(part) is { } pv) return pv.Process == PartProcess.Print;
        var over = part.StartsWith("rotor", StringComparison.Ordinal) ? D.Parts.Rotor
            : part.StartsWith("stator", StringComparison.Ordinal) ? D.Parts.Stator
            : part == "former" ? D.Parts.Former : null;
        return over?.Process switch
        {
            "print" => true,
            "cut" => false,
            _ => MaterialTable.Get(MaterialOf(part)).IsPlastic,
        };
    }

    /// <summary>Smallest wall a part may have: min_wall_lines x nozzle when printed; 1.0 mm when cut (common practice from memory: thinner laser-cut webs burn through or break).</summary>
    public double MinWall(string part) => IsPrinted(part) ? D.Process.MinWallLines * D.Process.Nozzle : CutMinWebMm;

    public const double CutMinWebMm = 1.0;

    /// <summary>
    /// Smallest wall around a magnet pocket: as <see cref="MinWall"/>, but at least 3 lines when the pocket
    /// is a press fit (pocket_clearance up to 0.2 mm; REFERENCE.md section 4, practice: "3+ around press fits").
    /// </summary>
    public double PocketWall(string part) =>
        IsPrinted(part) && D.Rotor.PocketClearance <= 0.2 + 1e-12
            ? Math.Max(D.Process.MinWallLines, 3) * D.Process.Nozzle
            : MinWall(part);

    public IReadOnlyList<FaceGap> Gaps() => StackUp.Compute(Stack, D.Tolerances.PrintZ, D.Tolerances.Runout, D.Tolerances.AxialPlay,
        IsPrinted, Deflection, BulgePerFaceMm, D.Former.Flange);
}
