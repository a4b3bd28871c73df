using System.Globalization;

namespace PartForge.Electrical.Field;

/// <summary>
/// The rotor magnets' size and placement, resolved from `magnets.*`. Magnet k of a rotor is centred at
/// mechanical angle k x 360/poles (magnet 0 on +x at rotor angle 0). Arc magnets are centred on their
/// span; their pitch radius is the mid radius of the arc.
/// </summary>
public sealed record MagnetGeometry
{
    public required MagnetShape Shape { get; init; }

    /// <summary>Disc diameter, mm (disc only, else 0).</summary>
    public double DiameterMm { get; init; }

    /// <summary>Block radial length, mm (block only, else 0).</summary>
    public double LengthMm { get; init; }

    /// <summary>Block tangential width, mm (block only, else 0).</summary>
    public double WidthMm { get; init; }

    /// <summary>Arc inner radius, mm (arc only, else 0).</summary>
    public double InnerRadiusMm { get; init; }

    /// <summary>Arc outer radius, mm (arc only, else 0).</summary>
    public double OuterRadiusMm { get; init; }

    /// <summary>Arc span, degrees (arc only, else 0).</summary>
    public double SpanDeg { get; init; }

    /// <summary>Thickness along the axis, mm.</summary>
    public required double ThicknessMm { get; init; }

    /// <summary>Radius of the magnet centres, mm (arc: mid radius).</summary>
    public required double PitchRadiusMm { get; init; }

    /// <summary>Smallest radius the magnet reaches from the machine axis, mm.</summary>
    public double RadialMinMm => Shape switch
    {
        MagnetShape.Disc => PitchRadiusMm - DiameterMm / 2,
        MagnetShape.Block => PitchRadiusMm - LengthMm / 2,
        _ => InnerRadiusMm,
    };

    /// <summary>Largest radius the magnet reaches from the machine axis, mm (block: its outer corners).</summary>
    public double RadialMaxMm => Shape switch
    {
        MagnetShape.Disc => PitchRadiusMm + DiameterMm / 2,
        MagnetShape.Block => Math.Sqrt(Math.Pow(PitchRadiusMm + LengthMm / 2, 2) + WidthMm * WidthMm / 4),
        _ => OuterRadiusMm,
    };

    /// <summary>Radial length of the magnet along its centre line, mm.</summary>
    public double RadialLengthMm => Shape switch
    {
        MagnetShape.Disc => DiameterMm,
        MagnetShape.Block => LengthMm,
        _ => OuterRadiusMm - InnerRadiusMm,
    };

    /// <summary>Pole face area, mm^2.</summary>
    public double FaceAreaMm2 => Shape switch
    {
        MagnetShape.Disc => Math.PI * DiameterMm * DiameterMm / 4,
        MagnetShape.Block => LengthMm * WidthMm,
        _ => SpanDeg / 360.0 * Math.PI * (OuterRadiusMm * OuterRadiusMm - InnerRadiusMm * InnerRadiusMm),
    };

    /// <summary>Volume, mm^3.</summary>
    public double VolumeMm3 => FaceAreaMm2 * ThicknessMm;

    /// <summary>Resolves `magnets.*`; missing or impossible sizes become error diagnostics and give null.</summary>
    public static MagnetGeometry? FromDesign(PartForge.Design.Model.Design d, List<Diagnostic> diagnostics)
    {
        var m = d.Magnets;
        int n0 = diagnostics.Count;
        void Err(string id, string key, string msg) => diagnostics.Add(new Diagnostic(id, DiagnosticSeverity.Error, key, msg));
        if (!(m.Thickness > 0)) Err("magnet-thickness", "magnets.thickness", "magnets.thickness must be positive (mm).");
        switch (m.Shape)
        {
            case "disc":
            {
                if (m.Diameter is not > 0) Err("magnet-size-missing", "magnets.diameter", "magnets.shape is disc but magnets.diameter is missing; give the disc diameter in mm.");
                if (m.PitchRadius is not > 0) Err("magnet-pitch-missing", "magnets.pitch_radius", "magnets.pitch_radius is missing; give the radius of the magnet centres in mm.");
                if (diagnostics.Count > n0) return null;
                var g = new MagnetGeometry { Shape = MagnetShape.Disc, DiameterMm = m.Diameter!.Value, ThicknessMm = m.Thickness, PitchRadiusMm = m.PitchRadius!.Value };
                return CheckFits(g, d, diagnostics);
            }
            case "block":
            {
                if (m.Length is not > 0) Err("magnet-size-missing", "magnets.length", "magnets.shape is block but magnets.length (radial) is missing; give it in mm.");
                if (m.Width is not > 0) Err("magnet-size-missing", "magnets.width", "magnets.shape is block but magnets.width (tangential) is missing; give it in mm.");
                if (m.PitchRadius is not > 0) Err("magnet-pitch-missing", "magnets.pitch_radius", "magnets.pitch_radius is missing; give the radius of the magnet centres in mm.");
                if (diagnostics.Count > n0) return null;
                var g = new MagnetGeometry { Shape = MagnetShape.Block, LengthMm = m.Length!.Value, WidthMm = m.Width!.Value, ThicknessMm = m.Thickness, PitchRadiusMm = m.PitchRadius!.Value };
                return CheckFits(g, d, diagnostics);
            }
            case "arc":
            {
                if (m.InnerRadius is not { } ri || ri < 0) Err("magnet-size-missing", "magnets.inner_radius", "magnets.shape is arc but magnets.inner_radius is missing; give it in mm.");
                if (m.OuterRadius is not > 0) Err("magnet-size-missing", "magnets.outer_radius", "magnets.shape is arc but magnets.outer_radius is missing; give it in mm.");
                if (m.Span is not > 0) Err("magnet-size-missing", "magnets.span", "magnets.shape is arc but magnets.span (degrees) is missing.");
                if (diagnostics.Count > n0) return null;
                if (m.OuterRadius!.Value <= m.InnerRadius!.Value)
                {
                    Err("magnet-arc-radii", "magnets.outer_radius", "magnets.outer_radius must be larger than magnets.inner_radius.");
                    return null;
                }
                var g = new MagnetGeometry
                {
                    Shape = MagnetShape.Arc, InnerRadiusMm = m.InnerRadius.Value, OuterRadiusMm = m.OuterRadius.Value,
                    SpanDeg = m.Span!.Value, ThicknessMm = m.Thickness, PitchRadiusMm = (m.InnerRadius.Value + m.OuterRadius.Value) / 2,
                };
                return CheckFits(g, d, diagnostics);
            }
            default:
                Err("magnet-shape-unknown", "magnets.shape", $"magnets.shape '{m.Shape}' is not known; use disc, block or arc.");
                return null;
        }
    }

    private static MagnetGeometry? CheckFits(MagnetGeometry g, PartForge.Design.Model.Design d, List<Diagnostic> diagnostics)
    {
        if (g.ThicknessMm <= 0) return null;
        int poles = d.Machine.Poles;
        if (poles < 2) return g;
        // Neighbouring magnets must not overlap: compare the tangential extent with the pitch chord.
        double pitchDeg = 360.0 / poles;
        bool overlap = g.Shape switch
        {
            MagnetShape.Arc => g.SpanDeg > pitchDeg + 1e-9,
            MagnetShape.Disc => g.DiameterMm > 2 * g.PitchRadiusMm * Math.Sin(Math.PI / poles) + 1e-9,
            _ => BlocksOverlap(g, poles),
        };
        if (g.RadialMinMm < 0 && g.Shape != MagnetShape.Arc)
        {
            diagnostics.Add(new Diagnostic("magnet-crosses-axis", DiagnosticSeverity.Error, "magnets.pitch_radius",
                string.Format(CultureInfo.InvariantCulture, "the magnets reach across the machine axis; raise magnets.pitch_radius to at least {0:0.##} mm.", g.RadialLengthMm / 2)));
            return null;
        }
        if (overlap)
            diagnostics.Add(new Diagnostic("magnet-overlap", DiagnosticSeverity.Error, "magnets.pitch_radius",
                string.Format(CultureInfo.InvariantCulture, "{0} magnets of this size overlap their neighbours at this pitch radius; raise magnets.pitch_radius, make the magnets smaller or use fewer poles.", poles)));
        return g;
    }

    private static bool BlocksOverlap(MagnetGeometry g, int poles)
    {
        // The inner corners come closest: the corner at (r - L/2, W/2) must stay below the bisector at pi/poles.
        double x = g.PitchRadiusMm - g.LengthMm / 2, y = g.WidthMm / 2;
        return Math.Atan2(y, x) > Math.PI / poles + 1e-12 || x <= 0;
    }
}
