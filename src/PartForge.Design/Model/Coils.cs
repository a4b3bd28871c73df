namespace PartForge.Design.Model;

public sealed class Coils
{
    [OneOf("round", "keystone"), Doc("round: circular coil; keystone: follows the stator sector.")]
    public string Shape { get; init; } = "round";

    [Doc("Bare copper wire: { awg: 28 } or { diameter: 0.32 } (mm).")]
    public Wire Wire { get; init; } = new();

    [OneOf("grade-1", "grade-2", "grade-3"), Doc("Enamel build, IEC 60317 grade.")]
    public string Enamel { get; init; } = "grade-2";

    [Range(1, 100000), Doc("Turns per coil; leave out and give target_emf to have them solved.")]
    public int? Turns { get; init; }

    [Doc("Phase EMF the turns are solved for when turns is left out (with the magnets at operation.ambient_temperature).")]
    public TargetEmf? TargetEmf { get; init; }

    [Range(0, 0.9069, MinExclusive = true), Doc("Copper area / winding window area (hexagonal packing limit 0.9069).")]
    public double FillFactor { get; init; } = 0.45;

    [Range(0, 100, MinExclusive = true), Doc("Axial height of the winding, mm.")]
    public double Height { get; init; } = 5;

    [Range(0, 1000, MinExclusive = true), Doc("Radius of the coil centres, mm (default: magnets.pitch_radius).")]
    public double? PitchRadius { get; init; }

    [Doc("Round: { diameter } of the hole in the coil; keystone: { width } of the inner window.")]
    public Core Core { get; init; } = new();

    [Range(-40, 250), Doc("Highest steady winding temperature you accept, C; the check holds the computed temperature to this and to the former's and stator's softening points.")]
    public double MaxTemperature { get; init; } = 60;
}

public sealed class Wire
{
    [Range(0, 50), Doc("American Wire Gauge number (ASTM B258).")]
    public int? Awg { get; init; }

    [Range(0.01, 5), Doc("Bare copper diameter, mm.")]
    public double? Diameter { get; init; }
}

public sealed class TargetEmf
{
    [Range(0, 100000, MinExclusive = true), Doc("Target phase EMF, V rms.")]
    public double Rms { get; init; } = 6;

    [Range(0, 100000, MinExclusive = true), Doc("Speed at which the target applies, rpm.")]
    public double Rpm { get; init; } = 400;
}

public sealed class Core
{
    [Range(0, 500, MinExclusive = true), Doc("Round coil: diameter of the hole in the coil, mm.")]
    public double? Diameter { get; init; }

    [Range(0, 500, MinExclusive = true), Doc("Keystone coil: width of the inner window, mm.")]
    public double? Width { get; init; }
}
