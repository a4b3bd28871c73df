namespace PartForge.Design.Model;

public sealed class Sensor
{
    [OneOf("hall", "reed", "none"), Doc("Timing sensor kind.")]
    public string Kind { get; init; } = "hall";

    [OneOf("1", "3"), Doc("Number of sensors: 1 or 3 (default: one per phase).")]
    public int? Count { get; init; }

    [Range(-180, 180), Doc("Timing advance, electrical degrees.")]
    public double AdvanceElec { get; init; }

    [Range(-1000, 1000), Doc("Field at which the sensor switches on, mT, along the machine axis (positive toward the front, +z: the direction magnet 0 makes in the stator, which the sensor planner times on; a Hall is fitted to switch on it). Reed: pull-in on the size of B (either pole); Hall: operate point. Default: reed 3, hall 6 (datasheet-typical, from memory).")]
    public double? Operate { get; init; }

    [Range(-1000, 1000), Doc("Field at which the sensor switches off again, mT (below sensor.operate). Reed: release on the size of B; Hall: release point (negative for a latch). Default: reed 1.5, hall 4 (datasheet-typical, from memory).")]
    public double? Release { get; init; }

    [Doc("Sensor body size, mm.")]
    public SensorBody Body { get; init; } = new();
}

public sealed class SensorBody
{
    [Range(0, 100, MinExclusive = true), Doc("Body length (radial), mm.")]
    public double Length { get; init; } = 4.0;

    [Range(0, 100, MinExclusive = true), Doc("Body width (tangential), mm.")]
    public double Width { get; init; } = 3.0;

    [Range(0, 100, MinExclusive = true), Doc("Body height (axial), mm.")]
    public double Height { get; init; } = 1.6;
}
