namespace PartForge.Checks;

/// <summary>Settings of a check run, with their defaults.</summary>
public sealed record CheckOptions
{
    /// <summary>Coarsest angular step of the rotation sweep, degrees (finer when a feature is smaller). Default 0.5.</summary>
    public double SweepStepDeg { get; init; } = 0.5;

    public static CheckOptions Default { get; } = new();
}
