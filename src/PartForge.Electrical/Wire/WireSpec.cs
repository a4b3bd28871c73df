namespace PartForge.Electrical.Wire;

/// <summary>
/// The magnet wire a coil is wound with, resolved from `coils.wire` and `coils.enamel`.
/// AWG sizes use the ASTM B258 formula diameter (not the table value rounded to 0.0001 in).
/// </summary>
public sealed record WireSpec
{
    /// <summary>AWG number when the design gave one, else null (metric diameter).</summary>
    public int? Awg { get; init; }

    /// <summary>Bare copper diameter, mm.</summary>
    public required double BareDiameterMm { get; init; }

    /// <summary>Enamel grade 1..3 (IEC 60317-0-1).</summary>
    public required int EnamelGrade { get; init; }

    /// <summary>Maximum overall (enamelled) diameter, mm, from <see cref="Wire.EnamelGrade"/>.</summary>
    public required double OverallDiameterMm { get; init; }

    /// <summary>True when the overall diameter was interpolated or extrapolated rather than read from a row of the table.</summary>
    public required bool OverallIsApproximate { get; init; }

    /// <summary>Bare copper cross-section, mm^2.</summary>
    public double CopperAreaMm2 => Math.PI * BareDiameterMm * BareDiameterMm / 4.0;

    /// <summary>Resistance per metre at 20 C, ohm/m (IEC 60028 resistivity).</summary>
    public double OhmPerMetre20 => Copper.OhmPerMetre20(BareDiameterMm);

    /// <summary>Copper mass per metre, g/m (IEC 60028 density).</summary>
    public double GramsPerMetre => Copper.GramsPerMetre(BareDiameterMm);

    /// <summary>Best achievable copper fill with hexagonal packing of this wire: 0.9069 (d/D)^2.</summary>
    public double MaxHexagonalFill => Math.PI / (2 * Math.Sqrt(3)) * Math.Pow(BareDiameterMm / OverallDiameterMm, 2);

    /// <summary>A wire of the given bare diameter and grade.</summary>
    public static WireSpec Of(double bareDiameterMm, int grade, int? awg = null) => new()
    {
        Awg = awg,
        BareDiameterMm = bareDiameterMm,
        EnamelGrade = grade,
        OverallDiameterMm = Wire.EnamelGrade.MaxOverallMm(bareDiameterMm, grade),
        OverallIsApproximate = !Wire.EnamelGrade.IsTabulated(bareDiameterMm),
    };

    /// <summary>AWG wire (ASTM B258 formula diameter) of the given grade.</summary>
    public static WireSpec OfAwg(int awg, int grade) => Of(WireGauge.AwgDiameterMm(awg), grade, awg);

    /// <summary>The machine's wire: its AWG number or bare diameter, with the enamel grade.</summary>
    public static WireSpec From(PartForge.Design.Machines.WireSize size, int grade) =>
        size.Awg is { } n ? OfAwg(n, grade) : Of(size.BareDiameterMm ?? throw new ArgumentException("the wire has neither an AWG nor a diameter", nameof(size)), grade);
}
