using System.Globalization;
using PartForge.Electrical.Field;
using PartForge.Electrical.Wire;

namespace PartForge.Electrical.Coils;

/// <summary>
/// Everything about a coil except its turns, resolved from the design: shape, pitch radius (default
/// `magnets.pitch_radius`; arc magnets: the arc's mid radius), height, core, fill factor, wire, the number of
/// coils around the stator (for the neighbour gap), lead allowance and hot temperature.
/// Default core when `coils.core` gives nothing: the magnet's tangential size (disc diameter, block width,
/// arc chord at the pitch radius), with a warning.
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

    /// <summary>The default for `coils.pitch_radius`: `magnets.pitch_radius`, or the arc magnets' mid radius.</summary>
    public static double? DefaultPitchRadiusMm(PartForge.Design.Model.Design d)
    {
        if (d.Coils.PitchRadius is { } p) return p;
        if (d.Magnets.Shape == "arc" && d.Magnets.InnerRadius is { } ri && d.Magnets.OuterRadius is { } ro) return (ri + ro) / 2;
        return d.Magnets.PitchRadius;
    }

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
            InductanceUh = CoilInductance.WheelerMicrohenry(meanRadius, HeightMm, b, turns),
            NeighbourGapMm = gap,
            MaxBuildMm = MaxBuildMm(),
        };
    }

    /// <summary>Resolves the coil from the design; impossible values become error diagnostics and give null.</summary>
    public static CoilSpec? FromDesign(PartForge.Design.Model.Design d, MagnetGeometry? magnet, WireSpec wire, List<Diagnostic> diagnostics)
    {
        var c = d.Coils;
        var inv = CultureInfo.InvariantCulture;
        int n0 = diagnostics.Count;
        void Err(string id, string key, string msg) => diagnostics.Add(new Diagnostic(id, DiagnosticSeverity.Error, key, msg));
        CoilShape shape;
        switch (c.Shape)
        {
            case "round": shape = CoilShape.Round; break;
            case "keystone": shape = CoilShape.Keystone; break;
            default: Err("coil-shape-unknown", "coils.shape", $"coils.shape '{c.Shape}' is not known; use round or keystone."); return null;
        }
        double? pr = DefaultPitchRadiusMm(d);
        if (pr is not > 0) { Err("coil-pitch-missing", "coils.pitch_radius", "coils.pitch_radius is missing and magnets.pitch_radius gives no default; give the radius of the coil centres in mm."); return null; }
        if (!(c.Height > 0)) Err("coil-height", "coils.height", "coils.height must be positive (mm).");
        if (!(c.FillFactor > 0) || c.FillFactor > Math.PI / (2 * Math.Sqrt(3)))
            Err("coil-fill-range", "coils.fill_factor", "coils.fill_factor must lie in (0, 0.9069]: copper area over window area, hexagonal packing is the limit.");
        if (d.Machine.Coils < 1) Err("coil-count", "machine.coils", "machine.coils must be at least 1.");
        if (diagnostics.Count > n0) return null;

        double core;
        double radialLength = 0;
        double magnetTangential = magnet is null ? 0 : magnet.Shape switch
        {
            MagnetShape.Disc => magnet.DiameterMm,
            MagnetShape.Block => magnet.WidthMm,
            _ => 2 * magnet.PitchRadiusMm * Math.Sin(magnet.SpanDeg * Math.PI / 360),
        };
        if (shape == CoilShape.Round)
        {
            if (c.Core.Diameter is { } cd and > 0) core = cd;
            else if (magnetTangential > 0)
            {
                core = magnetTangential;
                diagnostics.Add(new Diagnostic("coil-core-default", DiagnosticSeverity.Warning, "coils.core.diameter",
                    string.Format(inv, "coils.core.diameter is not given; using the magnet's size {0:0.###} mm. Give coils.core: {{ diameter: ... }}.", core)));
            }
            else { Err("coil-core-missing", "coils.core.diameter", "coils.core.diameter is missing; give the diameter of the hole in the coil in mm."); return null; }
        }
        else
        {
            if (c.Core.Width is { } cw and > 0) core = cw;
            else if (magnetTangential > 0)
            {
                core = magnetTangential;
                diagnostics.Add(new Diagnostic("coil-core-default", DiagnosticSeverity.Warning, "coils.core.width",
                    string.Format(inv, "coils.core.width is not given; using the magnet's width {0:0.###} mm. Give coils.core: {{ width: ... }}.", core)));
            }
            else { Err("coil-core-missing", "coils.core.width", "coils.core.width is missing; give the inner window width of the keystone coil in mm."); return null; }
            if (magnet is null) { Err("coil-keystone-needs-magnet", "magnets", "a keystone coil's window follows the magnets' radial extent; fix the magnets section first."); return null; }
            radialLength = magnet.RadialLengthMm;
            if (core >= 2 * pr.Value)
            { Err("coil-core-too-wide", "coils.core.width", string.Format(inv, "coils.core.width {0:0.###} mm is not less than the pitch diameter {1:0.###} mm; make it smaller.", core, 2 * pr.Value)); return null; }
            if (radialLength / 2 >= pr.Value)
            { Err("coil-window-crosses-axis", "coils.pitch_radius", string.Format(inv, "the keystone window (radial length {0:0.###} mm) reaches the machine axis; raise coils.pitch_radius above {1:0.###} mm.", radialLength, radialLength / 2)); return null; }
        }
        if (shape == CoilShape.Round && core / 2 >= pr.Value)
            Err("coil-core-crosses-axis", "coils.core.diameter", string.Format(inv, "the coil core (diameter {0:0.###} mm) reaches the machine axis; raise coils.pitch_radius or make the core smaller.", core));
        if (wire.OverallDiameterMm > c.Height)
            Err("wire-thicker-than-window", "coils.wire", string.Format(inv, "the wire ({0:0.###} mm overall) is thicker than the winding height coils.height {1:0.###} mm; use thinner wire or a taller coil.", wire.OverallDiameterMm, c.Height));
        if (c.FillFactor > wire.MaxHexagonalFill)
            Err("fill-unachievable", "coils.fill_factor", string.Format(inv,
                "coils.fill_factor {0:0.###} cannot be reached with this wire: hexagonal packing of {1:0.###} mm bare / {2:0.###} mm enamelled wire gives at most {3:0.###}; lower coils.fill_factor.",
                c.FillFactor, wire.BareDiameterMm, wire.OverallDiameterMm, wire.MaxHexagonalFill));
        if (diagnostics.Count > n0 && diagnostics.Skip(n0).Any(x => x.Severity == DiagnosticSeverity.Error)) return null;
        return new CoilSpec
        {
            Shape = shape,
            PitchRadiusMm = pr.Value,
            HeightMm = c.Height,
            CoreMm = core,
            WindowRadialLengthMm = radialLength,
            FillFactor = c.FillFactor,
            Wire = wire,
            CoilCount = d.Machine.Coils,
            LeadAllowanceMm = d.Operation.LeadAllowance,
            MaxTemperatureC = c.MaxTemperature,
        };
    }
}
