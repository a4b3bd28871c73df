namespace PartForge.Design.Model;

public sealed class Machine
{
    [OneOf("single-rotor", "dual-rotor", "dual-stator"),
     Doc("single-rotor: one rotor facing one stator; dual-rotor: a stator between two rotors; dual-stator: a rotor between two stators.")]
    public string Layout { get; init; } = "dual-rotor";

    [Range(2, 256), Doc("Magnets per rotor face (even).")]
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
