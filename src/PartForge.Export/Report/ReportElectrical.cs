using PartForge.Electrical.Coils;
using PartForge.Export.Drawings;

namespace PartForge.Export.Report;

/// <summary>
/// What the report and the BOM take from the electrical results: the rows of the results table, the
/// waveforms, the total wire and the coil outline (for the half-section).
/// </summary>
public sealed record ReportElectrical
{
    public required IReadOnlyList<ReportRow> Rows { get; init; }
    public required IReadOnlyList<PlotSeries> CoilWaveform { get; init; }
    public required IReadOnlyList<PlotSeries> PhaseWaveforms { get; init; }
    public required double WaveformRpm { get; init; }

    /// <summary>Wire for every coil of the machine, leads included, m (the electrical engine's total).</summary>
    public required double TotalWireM { get; init; }

    /// <summary>Bare copper mass per metre of the wire, g/m.</summary>
    public required double WireGramsPerMetre { get; init; }

    public required CoilOutline Outline { get; init; }

    /// <summary>Coil-to-phase table and other tables of the electrical engine.</summary>
    public IReadOnlyList<ReportTable> Tables { get; init; } = [];

    public IReadOnlyList<string> Notes { get; init; } = [];
}
