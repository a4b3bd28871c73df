namespace PartForge.Electrical.Wire;

/// <summary>
/// Annealed copper, IEC 60028 (international annealed copper standard): resistivity 1/58 ohm mm^2/m at 20 C,
/// temperature coefficient 0.00393 /K at 20 C, density 8.89 g/cm^3.
/// </summary>
public static class Copper
{
    /// <summary>Resistivity at 20 C, ohm mm^2 / m (IEC 60028: 1/58).</summary>
    public const double Resistivity20OhmMm2PerM = 1.0 / 58.0;

    /// <summary>Temperature coefficient of resistance at 20 C, 1/K (IEC 60028).</summary>
    public const double TemperatureCoefficientPerK = 0.00393;

    /// <summary>Density, g/cm^3 (IEC 60028) = mg/mm^3.</summary>
    public const double DensityGPerCm3 = 8.89;

    /// <summary>Resistance per metre of a round wire of the given bare diameter at 20 C, ohm/m.</summary>
    public static double OhmPerMetre20(double bareDiameterMm) =>
        Resistivity20OhmMm2PerM / (Math.PI * bareDiameterMm * bareDiameterMm / 4.0);

    /// <summary>R(T) = R20 (1 + alpha (T - 20)), the linear rule of IEC 60028.</summary>
    public static double AtTemperature(double resistance20, double temperatureC) =>
        resistance20 * (1.0 + TemperatureCoefficientPerK * (temperatureC - 20.0));

    /// <summary>Mass per metre of a round wire of the given bare diameter, g/m.</summary>
    public static double GramsPerMetre(double bareDiameterMm) =>
        Math.PI * bareDiameterMm * bareDiameterMm / 4.0 * DensityGPerCm3; // mm^2 x 1000 mm x mg/mm^3 / 1000
}
