namespace PartForge.Electrical;

/// <summary>The magnets as the engine used them.</summary>
public sealed record MagnetResult
{
    /// <summary>Remanence used, tesla.</summary>
    public required double BrTesla { get; init; }

    /// <summary>"br" when `magnets.br` was given, else the grade name (mid-range value).</summary>
    public required string BrSource { get; init; }

    /// <summary>True when back-iron images were part of the field model (an approximation, see RotorField).</summary>
    public required bool BackIronImageModel { get; init; }
}
