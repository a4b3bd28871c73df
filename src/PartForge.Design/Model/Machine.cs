namespace PartForge.Design.Model;

public sealed class Machine
{
    [OneOf("single-rotor", "dual-rotor", "dual-stator"),
     Doc("single-rotor: one rotor facing one stator; dual-rotor: a stator between two rotors; dual-stator: a rotor between two stators.")]
    public string Layout { get; init; } = "dual-rotor";

    [OneOf("generator", "motor", "motor-generator"),
     Doc("What the machine is for: generator (driven, into operation.load_resistance), motor (switched from operation.supply_voltage by its timing sensor) or motor-generator (both operating points). Default generator; never inferred from sensor.kind.")]
    public string Role { get; init; } = "generator";

    [Range(2, 256), Doc("Magnets per rotor face (even with magnets.arrangement: alternating; odd counts allowed with same).")]
    public int Poles { get; init; } = 12;

    [Range(1, 192), Doc("Coils per stator.")]
    public int Coils { get; init; } = 9;

    [OneOf("1", "3"), Doc("Number of phases: 1 or 3.")]
    public int Phases { get; init; } = 3;

    [OneOf("star", "delta", "series", "parallel"),
     Doc("3-phase: star | delta; 1-phase: series | parallel. Default: star for 3 phases, series for 1.")]
    public string? Connection { get; init; }

    [Range(0, 100000, MinExclusive = true), Doc("Rated speed, rpm.")]
    public double RatedRpm { get; init; } = 400;

    [Range(0, 100000, MinExclusive = true), Doc("Highest speed the machine must survive, rpm.")]
    public double MaxRpm { get; init; } = 1200;
}
