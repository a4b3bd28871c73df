namespace PartForge.Electrical;

/// <summary>
/// Waveforms over one electrical period at rated speed, sampled at SamplesPerPeriod equal steps
/// (theta_elec = 0 when magnet 0 is centred over coil 0). Phases in order A, B, C (1-phase: A only).
/// Line: star A-B, delta: the A phase without its triplen harmonics (they circulate in the delta), 1-phase: A.
/// </summary>
public sealed record Waveforms
{
    public required IReadOnlyList<double> ThetaElecDeg { get; init; }
    public required IReadOnlyList<double> ThetaMechDeg { get; init; }
    public required IReadOnlyList<double> CoilFluxLinkageWb { get; init; }
    public required IReadOnlyList<double> CoilEmfV { get; init; }
    public required IReadOnlyList<IReadOnlyList<double>> PhaseEmfV { get; init; }
    public required IReadOnlyList<double> LineEmfV { get; init; }
}
