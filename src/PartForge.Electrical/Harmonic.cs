namespace PartForge.Electrical;

/// <summary>One odd harmonic of the phase-A EMF at rated speed.</summary>
/// <param name="Order">Electrical harmonic order n (1 = fundamental).</param>
/// <param name="PeakV">Amplitude, V.</param>
/// <param name="PercentOfFundamental">Amplitude relative to the fundamental, percent.</param>
public sealed record Harmonic(int Order, double PeakV, double PercentOfFundamental);
