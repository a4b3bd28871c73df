namespace PartForge.Checks.Clearance;

/// <summary>
/// The bodies the rotation sweep compares: everything that turns with the shaft and everything that does
/// not, and the angular period after which the rotating set repeats itself (one pole pitch).
/// </summary>
public sealed record SweepScene(IReadOnlyList<SweepPrism> Rotating, IReadOnlyList<SweepPrism> Stationary, double PeriodDeg);
