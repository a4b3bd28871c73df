using PartForge.Electrical.Field;
using PartForge.Electrical.Flux;
using PartForge.Electrical.Operation;
using PartForge.Electrical.Sensors;
using PartForge.Electrical.Winding;

namespace PartForge.Electrical;

/// <summary>
/// Everything the electrical engine found for a design: the pinned results `electrical` keys (pole_pairs,
/// electrical_hz, magnetic_gap, winding_factor, magnet.br, coil{...}, coil_flux_linkage_peak_wb,
/// phase{...}, line_emf_rms_v, ke_v_per_krpm) and more. Values at `machine.rated_rpm` unless named
/// otherwise. When <see cref="Diagnostics"/> holds an error, the values it prevents are 0 (never NaN) and
/// the optional sections are null.
/// </summary>
public sealed record ElectricalResult
{
    public required int PolePairs { get; init; }
    public required double RatedRpm { get; init; }

    /// <summary>f = p rpm / 60 at rated speed, Hz.</summary>
    public required double ElectricalHz { get; init; }

    /// <summary>Axial distance from a magnet face to the nearest copper (AxialStack.MagneticGapMm), mm.</summary>
    public required double MagneticGapMm { get; init; }

    /// <summary>Fundamental winding factor kw1 = kp kd (see WindingLayout).</summary>
    public required double WindingFactor { get; init; }

    public required MagnetResult Magnet { get; init; }

    /// <summary>The coil (null when the coil section cannot be resolved).</summary>
    public CoilResult? Coil { get; init; }

    /// <summary>Peak flux linkage of one coil, Wb-turns.</summary>
    public required double CoilFluxLinkagePeakWb { get; init; }

    /// <summary>Peak flux linked by one turn (average over the winding), Wb.</summary>
    public required double FluxPerTurnPeakWb { get; init; }

    /// <summary>Coil EMF at rated speed, V rms.</summary>
    public required double CoilEmfRmsV { get; init; }

    public PhaseResult? Phase { get; init; }

    /// <summary>Line-to-line EMF at rated speed from the waveforms (star: A - B; delta: the phase less its triplens; 1-phase: the winding), V rms.</summary>
    public required double LineEmfRmsV { get; init; }
    public required double LineEmfPeakV { get; init; }

    /// <summary>Line EMF per 1000 rpm, V rms.</summary>
    public required double KeVPerKrpm { get; init; }

    /// <summary>Torque per ampere of line current (rms, sinusoidal, in phase with the EMF), N m/A.</summary>
    public required double KtNmPerA { get; init; }

    /// <summary>Line EMF at `machine.max_rpm`, V rms and V peak.</summary>
    public required double LineEmfRmsAtMaxRpmV { get; init; }
    public required double LineEmfPeakAtMaxRpmV { get; init; }

    /// <summary>Odd harmonics of the phase EMF (empty when not computed).</summary>
    public required IReadOnlyList<Harmonic> Harmonics { get; init; }

    /// <summary>The coil's flux-linkage series (null when not computed).</summary>
    public FluxLinkageSeries? FluxLinkage { get; init; }

    /// <summary>Coil to phase and direction table.</summary>
    public required WindingLayout Winding { get; init; }

    public SensorLayout? Sensors { get; init; }

    /// <summary>The drive as the sensors switch it (motor roles with a sensor; null otherwise).</summary>
    public Switching.SwitchingPlan? Switching { get; init; }

    /// <summary>Each phase's flux linkage against the rotor angle (empty when not computed).</summary>
    public IReadOnlyList<Switching.PhaseFlux> PhaseFlux { get; init; } = Array.Empty<Switching.PhaseFlux>();
    public GeneratorPoint? Generator { get; init; }
    public MotorPoint? Motor { get; init; }

    /// <summary>The generator charging its store through the rectifier (generator roles with a store; null otherwise).</summary>
    public ChargingPoint? Charging { get; init; }
    public Waveforms? Waveforms { get; init; }

    /// <summary>Axial magnetic forces on the rotors (computed where a rotor feels a net pull: dual-rotor); null otherwise.</summary>
    public MagneticPullResult? Pull { get; init; }

    /// <summary>Flux density in each steel face behind the magnets (back iron or a steel rotor) and its image strength; empty without steel.</summary>
    public IReadOnlyList<Field.BackIronFluxResult> BackIron { get; init; } = Array.Empty<Field.BackIronFluxResult>();

    /// <summary>The coils' and magnets' steady temperatures at the operating point (null when no EMF was computed).</summary>
    public Thermal.ThermalResult? Thermal { get; init; }

    public required IReadOnlyList<Diagnostic> Diagnostics { get; init; }

    public bool HasErrors => Diagnostics.Any(d => d.Severity == DiagnosticSeverity.Error);
}
