namespace PartForge.Design.Machines;

/// <summary>The bare copper wire: an AWG number (ASTM B258) or a metric bare diameter; exactly one is set.</summary>
public sealed record WireSize(int? Awg, double? BareDiameterMm);
