namespace PartForge.Design.Machines.Magnets;

/// <summary>The rotor magnets: their shape (with size and thickness) and their remanence.</summary>
/// <param name="Shape">Plan shape, sizes, thickness and pitch radius.</param>
/// <param name="Grade">The grade named in the design (N35 ... N52 with an optional suffix).</param>
/// <param name="BrTesla">Remanence used: <c>magnets.br</c> when given, else the grade's mid-range value.</param>
/// <param name="BrGiven">True when <c>magnets.br</c> was given (then the grade is not used for Br).</param>
public sealed record MagnetSet(MagnetShape Shape, string Grade, double BrTesla, bool BrGiven)
{
    /// <summary>"br" when <c>magnets.br</c> was given, else the grade name.</summary>
    public string BrSource => BrGiven ? "br" : Grade;

    /// <summary>Maximum working temperature of the grade's suffix, C (<see cref="Materials.MagnetGrades.MaxWorkingTemperatureC"/>; used even when <c>magnets.br</c> is given).</summary>
    public double MaxWorkingTemperatureC => Materials.MagnetGrades.MaxWorkingTemperatureC(Grade);

    /// <summary>How the poles face the coils (<c>magnets.arrangement</c>).</summary>
    public MagnetArrangement Arrangement { get; init; } = MagnetArrangement.Alternating;

    /// <summary>The sign of magnet k's magnetisation along +z on the front (or only) rotor: alternating +1, -1, ...,
    /// or +1 for every magnet when they all show the same pole.</summary>
    public int SignOf(int k) => Arrangement == MagnetArrangement.Same || k % 2 == 0 ? 1 : -1;
}
