namespace PartForge.Electrical.Sensors;

/// <summary>One timing sensor.</summary>
/// <param name="Label">"H-A", "H-B", "H-C" (3 halls) or "S" (single sensor).</param>
/// <param name="AngleDeg">Mechanical angle in the machine frame (coil 0 centred at 0 on +x), 0..360, degrees.</param>
/// <param name="RadiusMm">Radius of the sensor centre (the coil pitch radius), mm.</param>
/// <param name="ElectricalDeg">The sensor's electrical position p x AngleDeg mod 360, degrees.</param>
/// <param name="Inverted">True when the sensor sits a pole pitch away from the nominal position, so its output must be inverted (or a sensor of the opposite pole used).</param>
/// <param name="ClearanceMm">Tangential room between the sensor body's side and the nearest coil outline (smallest over the body's radial length); negative: it does not fit.</param>
/// <param name="Fits">ClearanceMm &gt;= 0.</param>
public sealed record SensorPlacement(string Label, double AngleDeg, double RadiusMm, double ElectricalDeg, bool Inverted, double ClearanceMm, bool Fits);
