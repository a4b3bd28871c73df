using PartForge.Export.Bom;
using PartForge.Export.Drawings;

namespace PartForge.Export.Report;

/// <summary>
/// Everything the HTML report shows, already computed by the pipeline stages. The report renders; it never
/// computes a figure of its own, so what it shows is exactly what the stages produced.
/// </summary>
public sealed record ReportInput
{
    public required string DesignName { get; init; }

    /// <summary>Layout, poles, coils and other headline facts of the design.</summary>
    public required IReadOnlyList<ReportRow> Summary { get; init; }

    public required IReadOnlyList<ReportRow> Electrical { get; init; }

    /// <summary>Back-EMF of one coil over one electrical period (x: electrical degrees, y: volts).</summary>
    public required IReadOnlyList<PlotSeries> CoilWaveform { get; init; }

    /// <summary>Back-EMF of each phase over one electrical period.</summary>
    public required IReadOnlyList<PlotSeries> PhaseWaveforms { get; init; }

    /// <summary>Speed the waveforms are computed at, rpm.</summary>
    public required double WaveformRpm { get; init; }

    public required IReadOnlyList<ReportCheck> Checks { get; init; }

    /// <summary>The overall status of the checks: pass, warn or fail.</summary>
    public required string Status { get; init; }

    /// <summary>Set when the build was forced past failing checks: the report carries a FAILED banner.</summary>
    public bool Forced { get; init; }

    public required IReadOnlyList<PartSketch> Drawings { get; init; }

    public required IReadOnlyList<SectionBody> SectionBodies { get; init; }
    public required IReadOnlyList<LinearDimension> SectionDimensions { get; init; }

    public required BillOfMaterials Bom { get; init; }

    /// <summary>The ordered assembly steps with the pull at each.</summary>
    public IReadOnlyList<PartForge.Checks.Hardware.AssemblyStep> Assembly { get; init; } = [];

    /// <summary>Further tables (winding layout, parts list).</summary>
    public IReadOnlyList<ReportTable> Tables { get; init; } = [];

    /// <summary>How the parts are laid out for the machines that make them (print plates, ...), one table each.</summary>
    public IReadOnlyList<ReportTable> Fabrication { get; init; } = [];

    /// <summary>Notes on approximations and assumptions.</summary>
    public IReadOnlyList<string> Notes { get; init; } = [];

    /// <summary>The 3D view's scene (<see cref="ViewerScene.Json"/>); empty leaves the view out.</summary>
    public string SceneJson { get; init; } = "";

    /// <summary>Inline PNG previews (name, PNG bytes); embedded as data URIs so the report stays one file.</summary>
    public IReadOnlyList<(string Name, byte[] Png)> Previews { get; init; } = [];
}
