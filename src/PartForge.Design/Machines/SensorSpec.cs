namespace PartForge.Design.Machines;

/// <summary>The timing sensor(s) (<c>sensor.*</c>), the count resolved (default: one per phase).</summary>
/// <param name="Kind">None, Hall or reed.</param>
/// <param name="Count">Number of sensors (1 or 3).</param>
/// <param name="AdvanceElecDeg">Timing advance, electrical degrees.</param>
/// <param name="Body">Body size (radial length, tangential width, axial height), mm.</param>
public sealed record SensorSpec(SensorKind Kind, int Count, double AdvanceElecDeg, SensorBody Body);

/// <summary>A sensor body: radial length, tangential width and axial height, mm.</summary>
public sealed record SensorBody(double LengthMm, double WidthMm, double HeightMm);
