using PartForge.Design.Machines;
using PartForge.Electrical.Wire;

namespace PartForge.Electrical.Coils;

/// <summary>
/// One wound coil: its outline, turns, wire and the figures that follow from them.
///
/// Build rule: the winding occupies a rectangle of `coils.height` x radial build in cross-section, of which
/// the copper is the fill factor, so build = N pi d_bare^2 / (4 fill height).
/// Mean turn = the perimeter of the turn halfway through the build (window perimeter + pi build).
/// Wire length = turns x mean turn + `operation.lead_allowance` (the total lead length of a coil, both ends,
/// default 150 mm). Resistance = wire length x ohm per metre (IEC 60028 copper), hot resistance at
/// `coils.max_temperature`. Copper mass = wire length x copper area x 8.89 g/cm^3.
/// Inductance: Wheeler's multilayer formula with a = the mean turn radius (round coils); for keystones Maxwell's
/// geometric-mean-distance method on the mean turn (CoilInductance.KeystoneMicrohenry), tested within 3 % of a
/// filament-by-filament Neumann integral. Both ignore mutual inductance between coils and any iron nearby.
/// </summary>
public sealed record CoilWinding
{
    public required CoilOutline Outline { get; init; }
    public required int Turns { get; init; }
    public required WireSpec Wire { get; init; }
    public required double FillFactor { get; init; }
    public required double MeanTurnMm { get; init; }
    public required double LeadAllowanceMm { get; init; }
    public double WireLengthM => (Turns * MeanTurnMm + LeadAllowanceMm) / 1000.0;
    public double Resistance20COhm => WireLengthM * Wire.OhmPerMetre20;
    public required double MaxTemperatureC { get; init; }
    public double ResistanceHotOhm => Copper.AtTemperature(Resistance20COhm, MaxTemperatureC);
    public double CopperMassG => WireLengthM * Wire.GramsPerMetre;
    public required double InductanceUh { get; init; }

    /// <summary>True when the inductance comes from the equivalent-perimeter radius (keystone): approximate.</summary>
    public bool InductanceIsApproximate => Outline.Shape == CoilShape.Keystone;

    /// <summary>Clearance between this coil's outer boundary and its neighbour's, mm (negative: they overlap); null for a single coil.</summary>
    public required double? NeighbourGapMm { get; init; }

    /// <summary>Largest radial build that keeps a zero gap to the neighbouring coil, mm (null for a single coil).</summary>
    public required double? MaxBuildMm { get; init; }
}
