using System.Globalization;
using PartForge.Design.Machines;
using PartForge.Electrical.Wire;

namespace PartForge.Electrical.Coils;

/// <summary>
/// Everything about a coil except its turns, from the machine model: shape, pitch radius, height, core, fill
/// factor, wire, the number of coils around the stator (for the neighbour gap), lead allowance and hot
/// temperature. A keystone window spans the magnets' radial length.
/// </summary>
public sealed record CoilSpec
{
    public required CoilShape Shape { get; init; }
    public required double PitchRadiusMm { get; init; }
    public required double HeightMm { get; init; }

    /// <summary>Round: core diameter; keystone: window width (chord) at the pitch radius, mm.</summary>
    public required double CoreMm { get; init; }

    /// <summary>Keystone: radial length of the window (the magnets' radial length), mm.</summary>
    public required double WindowRadialLengthMm { get; init; }

    public required double FillFactor { get; init; }
    public required WireSpec Wire { get; init; }
    public required int CoilCount { get; init; }
    public required double LeadAllowanceMm { get; init; }
    public required double MaxTemperatureC { get; init; }

    /// <summary>Radial build of <paramref name="turns"/> turns: N pi d^2 / (4 fill height), mm.</summary>
    public double BuildMm(int turns) => turns * Wire.CopperAreaMm2 / (FillFactor * HeightMm);

    /// <summary>Largest build that leaves a zero gap to the neighbouring coil, mm; null for a single coil.</summary>
    public double? MaxBuildMm()
    {
        if (CoilCount < 2) return null;
        if (Shape == CoilShape.Round)
            return (2 * PitchRadiusMm * Math.Sin(Math.PI / CoilCount) - CoreMm) / 2;
        var w = CoilOutline.Keystone(PitchRadiusMm, HeightMm, CoreMm, WindowRadialLengthMm, 0);
        return WindowGapMm(w) / 2;
    }

    /// <summary>Distance between the windows of neighbouring keystone coils (their inner corners), mm.</summary>
    private double WindowGapMm(CoilOutline w)
    {
        double delta = 2 * Math.PI / CoilCount - 2 * w.WindowHalfAngleDeg * Math.PI / 180;
        return delta >= Math.PI ? double.MaxValue : 2 * w.WindowMinRadiusMm * Math.Sin(delta / 2);
    }

    /// <summary>The coil with <paramref name="turns"/> turns.</summary>
    public CoilWinding Wind(int turns)
    {
        double b = BuildMm(turns);
        CoilOutline o = Shape == CoilShape.Round
            ? CoilOutline.Round(PitchRadiusMm, HeightMm, CoreMm, b)
            : CoilOutline.Keystone(PitchRadiusMm, HeightMm, CoreMm, WindowRadialLengthMm, b);
        double mtl = o.TurnPerimeterMm(b / 2);
        double meanRadius = Shape == CoilShape.Round ? CoreMm / 2 + b / 2 : mtl / (2 * Math.PI);
        double? gap = null;
        if (CoilCount >= 2)
        {
            if (Shape == CoilShape.Round) gap = 2 * PitchRadiusMm * Math.Sin(Math.PI / CoilCount) - o.OuterDiameterMm!.Value;
            else
            {
                double wg = WindowGapMm(o);
                gap = wg == double.MaxValue ? null : wg - 2 * b;
            }
        }
        return new CoilWinding
        {
            Outline = o,
            Turns = turns,
            Wire = Wire,
            FillFactor = FillFactor,
            MeanTurnMm = mtl,
            LeadAllowanceMm = LeadAllowanceMm,
            MaxTemperatureC = MaxTemperatureC,
            InductanceUh = Shape == CoilShape.Round
                ? CoilInductance.WheelerMicrohenry(meanRadius, HeightMm, b, turns)
                : CoilInductance.KeystoneMicrohenry(o, HeightMm, b, turns),
            NeighbourGapMm = gap,
            MaxBuildMm = MaxBuildMm(),
        };
    }

    /// <summary>The coil of a machine; impossible combinations become error diagnostics and give null.</summary>
    public static CoilSpec? From(MachineModel m, WireSpec wire, List<Diagnostic> diagnostics)
    {
        var c = m.Coils;
        var inv = CultureInfo.InvariantCulture;
        int n0 = diagnostics.Count;
        void Err(string id, string key, string msg) => diagnostics.Add(new Diagnostic(id, DiagnosticSeverity.Error, key, msg));
        double pr = c.PitchRadiusMm;
        double core = c.CoreMm ?? throw new ArgumentException("the coil core is not resolved for this coil shape", nameof(m));
        double radialLength = 0;
        if (c.Shape == CoilShape.Keystone)
        {
            radialLength = m.Magnets.Shape.RadialLengthMm;
            if (core >= 2 * pr)
            { Err("coil-core-too-wide", "coils.core.width", string.Format(inv, "coils.core.width {0:0.###} mm is not less than the pitch diameter {1:0.###} mm; make it smaller.", core, 2 * pr)); return null; }
            if (radialLength / 2 >= pr)
            { Err("coil-window-crosses-axis", "coils.pitch_radius", string.Format(inv, "the keystone window (radial length {0:0.###} mm) reaches the machine axis; raise coils.pitch_radius above {1:0.###} mm.", radialLength, radialLength / 2)); return null; }
        }
        if (c.Shape == CoilShape.Round && core / 2 >= pr)
            Err("coil-core-crosses-axis", "coils.core.diameter", string.Format(inv, "the coil core (diameter {0:0.###} mm) reaches the machine axis; raise coils.pitch_radius or make the core smaller.", core));
        if (wire.OverallDiameterMm > c.HeightMm)
            Err("wire-thicker-than-window", "coils.wire", string.Format(inv, "the wire ({0:0.###} mm overall) is thicker than the winding height coils.height {1:0.###} mm; use thinner wire or a taller coil.", wire.OverallDiameterMm, c.HeightMm));
        if (c.FillFactor > wire.MaxHexagonalFill)
            Err("fill-unachievable", "coils.fill_factor", string.Format(inv,
                "coils.fill_factor {0:0.###} cannot be reached with this wire: hexagonal packing of {1:0.###} mm bare / {2:0.###} mm enamelled wire gives at most {3:0.###}; lower coils.fill_factor.",
                c.FillFactor, wire.BareDiameterMm, wire.OverallDiameterMm, wire.MaxHexagonalFill));
        if (diagnostics.Count > n0 && diagnostics.Skip(n0).Any(x => x.Severity == DiagnosticSeverity.Error)) return null;
        return new CoilSpec
        {
            Shape = c.Shape,
            PitchRadiusMm = pr,
            HeightMm = c.HeightMm,
            CoreMm = core,
            WindowRadialLengthMm = radialLength,
            FillFactor = c.FillFactor,
            Wire = wire,
            CoilCount = m.CoilsPerStator,
            LeadAllowanceMm = m.Operation.LeadAllowanceMm,
            MaxTemperatureC = c.MaxTemperatureC,
        };
    }
}
