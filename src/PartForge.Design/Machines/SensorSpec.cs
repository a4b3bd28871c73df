namespace PartForge.Design.Machines;

/// <summary>The timing sensor(s) (<c>sensor.*</c>), the count resolved (default: one per phase).</summary>
/// <param name="Kind">None, Hall or reed.</param>
/// <param name="Count">Number of sensors (1 or 3).</param>
/// <param name="AdvanceElecDeg">Timing advance, electrical degrees.</param>
/// <param name="Body">Body size (radial length, tangential width, axial height), mm.</param>
public sealed record SensorSpec(SensorKind Kind, int Count, double AdvanceElecDeg, SensorBody Body)
{
    /// <summary>Field at which the sensor switches on, T, along the machine axis, positive toward +z (a reed: pull-in on |B|).</summary>
    public double OperateTesla { get; init; } = DefaultOperateMt(Kind) / 1000;

    /// <summary>Field at which it switches off again, T (below <see cref="OperateTesla"/>; a reed: release on |B|).</summary>
    public double ReleaseTesla { get; init; } = DefaultReleaseMt(Kind) / 1000;

    /// <summary>Default operate (pull-in) field, mT: reed 3, Hall switch 6 (datasheet-typical, from memory).</summary>
    public static double DefaultOperateMt(SensorKind k) => k == SensorKind.Reed ? 3.0 : 6.0;

    /// <summary>Default release field, mT: reed 1.5 (half the pull-in), Hall switch 4 (datasheet-typical, from memory).</summary>
    public static double DefaultReleaseMt(SensorKind k) => k == SensorKind.Reed ? 1.5 : 4.0;
}

/// <summary>A sensor body: radial length, tangential width and axial height, mm.</summary>
public sealed record SensorBody(double LengthMm, double WidthMm, double HeightMm);
