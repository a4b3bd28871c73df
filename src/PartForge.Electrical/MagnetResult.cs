namespace PartForge.Electrical;

/// <summary>The magnets as the engine used them.</summary>
public sealed record MagnetResult
{
    /// <summary>Remanence at 20 C (the grade's mid-range value or <c>magnets.br</c>), tesla.</summary>
    public required double BrTesla { get; init; }

    /// <summary>Remanence with the magnets at the air's temperature (the machine at rest), tesla: the steel's flux, the pull and
    /// the EMF at <c>machine.max_rpm</c> use it.</summary>
    public double BrAmbientTesla { get; init; }

    /// <summary>Remanence at the magnets' operating temperature, tesla: the EMF and the operating points use it.</summary>
    public double BrOperatingTesla { get; init; }

    /// <summary>The magnets' estimated operating temperature, C (Thermal.ThermalResult: the coils' steady temperature bounds it).</summary>
    public double TemperatureC { get; init; }

    /// <summary>Maximum working temperature of the grade's suffix, C (common practice).</summary>
    public double MaxWorkingTemperatureC { get; init; }

    /// <summary>"br" when `magnets.br` was given, else the grade name (mid-range value).</summary>
    public required string BrSource { get; init; }

    /// <summary>True when back-iron images were part of the field model (an approximation, see RotorField).</summary>
    public required bool BackIronImageModel { get; init; }
}
