using PartForge.Design.Machines;
using PartForge.Electrical.Coils;

namespace PartForge.Electrical;

/// <summary>One coil: the pinned results `electrical.coil` keys (lengths in mm) plus additions.</summary>
public sealed record CoilResult
{
    public required CoilShape Shape { get; init; }
    public required int Turns { get; init; }

    /// <summary>True when the turns were solved from `coils.target_emf`.</summary>
    public required bool TurnsSolved { get; init; }

    public int? WireAwg { get; init; }
    public required double WireBareMm { get; init; }
    public required double WireOverallMm { get; init; }

    /// <summary>True when the overall diameter was interpolated/extrapolated from the IEC 60317-0-1 rows (an approximation).</summary>
    public required bool WireOverallIsApproximate { get; init; }

    public required double WireOhmPerM20C { get; init; }
    public required double FillFactor { get; init; }

    /// <summary>Round coils: core diameter, mm (null for keystones, which report <see cref="Outline"/>).</summary>
    public double? InnerDiameterMm { get; init; }

    /// <summary>Round coils: outer diameter, mm (null for keystones).</summary>
    public double? OuterDiameterMm { get; init; }

    public required double HeightMm { get; init; }
    public required double PitchRadiusMm { get; init; }
    public required double RadialBuildMm { get; init; }
    public required double MeanTurnMm { get; init; }
    public required double LeadAllowanceMm { get; init; }
    public required double WireLengthM { get; init; }
    public required double Resistance20COhm { get; init; }
    public required double ResistanceHotOhm { get; init; }
    public required double MaxTemperatureC { get; init; }
    public required double InductanceUh { get; init; }
    public required bool InductanceIsApproximate { get; init; }
    public required double CopperMassG { get; init; }

    /// <summary>Clearance to the neighbouring coil's outline, mm (negative: overlap); null for a single coil.</summary>
    public double? NeighbourGapMm { get; init; }

    /// <summary>Turns that keep a zero neighbour gap with this wire and fill (null for a single coil).</summary>
    public int? MaxTurnsForNeighbourGap { get; init; }

    /// <summary>With target_emf: the thickest AWG that still fits the neighbour gap at the solved turns (null if none or not solved).</summary>
    public int? ThickestFittingAwg { get; init; }

    /// <summary>The exact outline (null only when the coil could not be resolved).</summary>
    public CoilOutline? Outline { get; init; }
}
