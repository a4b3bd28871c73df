using PartForge.Design.Machines;

namespace PartForge.Electrical;

/// <summary>
/// One phase (the pinned results `electrical.phase` keys plus additions), at `machine.rated_rpm`. In a dual-stator
/// machine a phase is the phase's coils of both stators in series. 1-phase parallel: every coil in parallel
/// (one coil in series, `coils` parallel paths).
/// </summary>
public sealed record PhaseResult
{
    public required Connection Connection { get; init; }
    public required int CoilsInSeries { get; init; }
    public required int ParallelPaths { get; init; }
    public required double EmfPeakV { get; init; }
    public required double EmfRmsV { get; init; }
    public required double EmfFundamentalRmsV { get; init; }
    public required double Resistance20COhm { get; init; }
    public required double ResistanceHotOhm { get; init; }

    /// <summary>Sum of the coils' self-inductances (series) or one coil's / paths (parallel), uH; mutual inductance ignored.</summary>
    public required double InductanceUh { get; init; }

    /// <summary>Total harmonic distortion of the phase EMF, percent of the fundamental.</summary>
    public required double ThdPercent { get; init; }
}
