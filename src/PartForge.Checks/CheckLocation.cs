namespace PartForge.Checks;

/// <summary>Where a check's limiting value occurs: the feature(s) involved and, for rotating parts, the rotor angle.</summary>
/// <param name="Feature">Feature names, e.g. "magnet 3 / coil 2 copper" or "pocket 1 / pocket 2".</param>
/// <param name="AngleDeg">Mechanical rotor angle at which the value occurs, degrees; null when it does not depend on rotation.</param>
public sealed record CheckLocation(string Feature, double? AngleDeg = null);
