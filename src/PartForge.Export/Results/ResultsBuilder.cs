using PartForge.Checks;
using PartForge.Design.Machines;
using PartForge.Electrical;
using PartForge.Export.Pipeline;
using PartForge.Parts;

namespace PartForge.Export.Results;

/// <summary>Fills the results document from the stages' outputs.</summary>
public static class ResultsBuilder
{
    /// <param name="ev">The evaluated design.</param>
    /// <param name="files">Output file names per part name (empty for <c>check</c>, which writes nothing).</param>
    /// <param name="forced">Written with --force although a check failed.</param>
    /// <param name="countTriangles">Measure the parts: their volumes (from the solids) and triangle counts (from
    /// the meshes). False reports 0 for both and makes neither, for summaries that do not show them and builds
    /// that do not write the results document; the solids and meshes are otherwise made on first use.</param>
    public static ResultsDocument Build(Evaluation ev, IReadOnlyDictionary<string, IReadOnlyList<string>>? files = null, bool forced = false, bool countTriangles = true)
    {
        var checks = ev.Checks;
        return new ResultsDocument
        {
            Design = ev.Machine.Name,
            Summary = new ResultsSummary(checks.StatusText, checks.FailCount, checks.WarnCount) { Forced = forced && checks.HasFailures },
            Electrical = ElectricalOf(ev.Machine, ev.Electrical),
            Checks = checks.Checks.Select(c => new CheckEntry(c.Id, c.PartName, c.StatusText, c.Value, c.Limit, c.Unit, c.Margin, c.Message) { Counterpart = c.CounterpartName }).ToArray(),
            Parts = ev.Parts?.Parts.Select(p => new PartEntry(p.Name, Words.Of(p.Process), p.Quantity,
                files != null && files.TryGetValue(p.Name, out var f) ? f : Array.Empty<string>(), countTriangles ? p.VolumeMm3 : 0, countTriangles ? p.Mesh.TriangleCount : 0)
            { Material = p.Material.Name }).ToArray() ?? [],
        };
    }

    public static ElectricalSection ElectricalOf(MachineModel d, ElectricalResult e)
    {
        var c = e.Coil;
        var o = c?.Outline;
        KeystoneOutline? outline = null;
        if (c != null && o != null && c.Shape != CoilShape.Round)
        {
            double build = o.RadialBuildMm;
            double window = d.Coils.CoreWidthMm ?? 0;
            outline = new KeystoneOutline(o.WindowMinRadiusMm - build, o.WindowMaxRadiusMm + build, window, window + 2 * build, build);
        }
        return new ElectricalSection
        {
            PolePairs = e.PolePairs,
            ElectricalHz = e.ElectricalHz,
            MagneticGap = e.MagneticGapMm,
            WindingFactor = e.WindingFactor,
            MagnetBr = e.Magnet.BrTesla,
            Coil = new CoilSection
            {
                Turns = c?.Turns ?? 0,
                WireBare = c?.WireBareMm ?? 0,
                WireOverall = c?.WireOverallMm ?? 0,
                FillFactor = c?.FillFactor ?? d.Coils.FillFactor,
                InnerDiameter = c?.InnerDiameterMm,
                OuterDiameter = c?.OuterDiameterMm,
                Outline = outline,
                Height = c?.HeightMm ?? d.Coils.HeightMm,
                PitchRadius = c?.PitchRadiusMm ?? d.Coils.PitchRadiusMm,
                MeanTurn = c?.MeanTurnMm ?? 0,
                WireLengthM = c?.WireLengthM ?? 0,
                Resistance20cOhm = c?.Resistance20COhm ?? 0,
                ResistanceHotOhm = c?.ResistanceHotOhm ?? 0,
                InductanceUh = c?.InductanceUh ?? 0,
                CopperMassG = c?.CopperMassG ?? 0,
            },
            CoilFluxLinkagePeakWb = e.CoilFluxLinkagePeakWb,
            Phase = new PhaseSection(e.Phase?.CoilsInSeries ?? 0, e.Phase?.EmfPeakV ?? 0, e.Phase?.EmfRmsV ?? 0, e.Phase?.Resistance20COhm ?? 0),
            LineEmfRmsV = e.LineEmfRmsV,
            KeVPerKrpm = e.KeVPerKrpm,
        };
    }
}
