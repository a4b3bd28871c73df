namespace PartForge.Checks.Hardware;

/// <summary>One step of putting the machine together, in order, with the axial magnetic pull the builder works
/// against while doing it (N; 0 when no magnet attracts another part across the step) and its caution, if any.</summary>
public sealed record AssemblyStep(int Order, string Action, double PullN, string PullNote, string? Caution);
