namespace PartForge.Export.Results;

/// <summary>
/// The results document of CONTRACT.md ("Results document"): what <c>check --json</c> prints and
/// <c>&lt;name&gt;-results.json</c> holds. Serialised by <see cref="ResultsJson"/> in a fixed key order.
/// </summary>
public sealed record ResultsDocument
{
    public const string FormatName = "partforge-results/1";

    public string Format { get; init; } = FormatName;
    public required string Design { get; init; }
    public required ResultsSummary Summary { get; init; }
    public required ElectricalSection Electrical { get; init; }
    public required IReadOnlyList<CheckEntry> Checks { get; init; }
    public required IReadOnlyList<PartEntry> Parts { get; init; }
}

/// <summary>pass / warn / fail and the counts; <see cref="Forced"/> when --force wrote a failing design.</summary>
public sealed record ResultsSummary(string Status, int Fail, int Warn)
{
    /// <summary>Written with --force although a check failed (the document says so).</summary>
    public bool Forced { get; init; }
}

public sealed record CheckEntry(string Id, string Part, string Status, double Value, double Limit, string Unit, double Margin, string Message)
{
    /// <summary>The other part of the pair the check is about, or null (CONTRACT "Additions": every check carries it).</summary>
    public string? Counterpart { get; init; }
}

public sealed record PartEntry(string Name, string Process, int Quantity, IReadOnlyList<string> Files, double VolumeMm3, long Triangles)
{
    /// <summary>Material of the part (an addition to the contract).</summary>
    public string? Material { get; init; }
}

/// <summary>The "electrical" object of the contract.</summary>
public sealed record ElectricalSection
{
    public required int PolePairs { get; init; }
    public required double ElectricalHz { get; init; }
    public required double MagneticGap { get; init; }
    public required double WindingFactor { get; init; }
    public required double MagnetBr { get; init; }
    public required CoilSection Coil { get; init; }
    public required double CoilFluxLinkagePeakWb { get; init; }
    public required PhaseSection Phase { get; init; }
    public required double LineEmfRmsV { get; init; }
    public required double KeVPerKrpm { get; init; }
}

public sealed record CoilSection
{
    public required int Turns { get; init; }
    public required double WireBare { get; init; }
    public required double WireOverall { get; init; }
    public required double FillFactor { get; init; }

    /// <summary>Round coils only.</summary>
    public double? InnerDiameter { get; init; }

    /// <summary>Round coils only.</summary>
    public double? OuterDiameter { get; init; }

    /// <summary>Keystone coils: their outline instead of the diameters.</summary>
    public KeystoneOutline? Outline { get; init; }

    public required double Height { get; init; }
    public required double PitchRadius { get; init; }
    public required double MeanTurn { get; init; }
    public required double WireLengthM { get; init; }
    public required double Resistance20cOhm { get; init; }
    public required double ResistanceHotOhm { get; init; }
    public required double InductanceUh { get; init; }
    public required double CopperMassG { get; init; }
}

/// <summary>
/// Keystone coil outline, mm: radial extent of the winding's outer boundary, the inner window's width at the
/// pitch radius (coils.core.width) and the winding's overall width there (window + 2 x radial build).
/// </summary>
public sealed record KeystoneOutline(double InnerRadius, double OuterRadius, double WindowWidth, double Width, double RadialBuild);

public sealed record PhaseSection(int CoilsInSeries, double EmfPeakV, double EmfRmsV, double Resistance20cOhm);
