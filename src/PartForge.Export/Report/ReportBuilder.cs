using PartForge.Checks;
using PartForge.Design.Machines;
using PartForge.Design.Parts;
using PartForge.Export.Bom;
using PartForge.Export.Pipeline;
using PartForge.Parts;

namespace PartForge.Export.Report;

/// <summary>Assembles the report input from the stage outputs (design, electrical results, parts, checks).</summary>
public static class ReportBuilder
{
    public static ReportInput Build(MachineModel d, ReportElectrical e, PartSet parts, CheckReport checks, bool forced,
        IReadOnlyList<(string Name, byte[] Png)>? previews = null)
    {
        var o = e.Outline;
        double margin = d.Former.MarginMm;
        var coil = new CoilSection(o.OuterMinRadiusMm, o.OuterMaxRadiusMm, o.WindowMinRadiusMm, o.WindowMaxRadiusMm,
            o.OuterMinRadiusMm - margin, o.OuterMaxRadiusMm + margin);
        var gaps = checks.WithId(CheckIds.RunningGap)
            .Where(c => c.Part is not null)
            .GroupBy(c => c.Part!.Value)
            .ToDictionary(g => g.Key, g => g.Min(c => c.Value));
        (double, double)? backIron = null;
        if (parts.Find(PartId.BackIron) is { } bi)
        {
            // Radial extent of the back-iron disc from its exact outline (the builder sizes it, not the design).
            var pts = bi.ExactLayers.SelectMany(l => l.Outers).SelectMany(c => c.Circle is { } ci ? [ci.Radius + ci.Center.Length] : c.Segments.Select(g => g.Start.Length)).ToList();
            var bore = bi.FeaturesOf(FeatureKind.Bore).Select(f => f.Contour.Circle?.Radius ?? 0).DefaultIfEmpty(0).Max();
            if (pts.Count > 0) backIron = (bore, pts.Max());
        }
        var (bodies, dims) = SectionBuilder.Build(d, parts.Stack, coil, gaps, backIron);

        return new ReportInput
        {
            DesignName = d.Name,
            Summary = DesignSummary.Rows(d),
            Electrical = e.Rows,
            CoilWaveform = e.CoilWaveform,
            PhaseWaveforms = e.PhaseWaveforms,
            WaveformRpm = e.WaveformRpm,
            Checks = checks.Checks.Select(c => new ReportCheck(c.Id, c.PartName, c.StatusText, c.Value, c.Limit, c.Unit, c.Margin, c.Message, c.Basis ?? "", c.CounterpartName ?? "")).ToArray(),
            Status = checks.StatusText,
            Forced = forced,
            Drawings = parts.Parts.Select(p => PartSketches.For(d, p)).ToArray(),
            SectionBodies = bodies,
            SectionDimensions = dims,
            Bom = BomBuilder.Build(d, e.TotalWireM, e.WireGramsPerMetre, BomParts(parts), checks.Joints, checks.Jacks),
            Assembly = checks.Assembly,
            Tables = e.Tables,
            Fabrication = FabricationTables(d, parts),
            Notes = e.Notes.Concat(parts.Parts.SelectMany(p => p.Notes.Select(n => n.StartsWith(p.Name, StringComparison.Ordinal) ? n : $"{p.Name}: {n}"))).ToArray(),
            Previews = previews ?? [],
            SceneJson = ViewerScene.Json(parts, checks),
        };
    }

    /// <summary>The print plates of every printed part (the layout of <c>&lt;name&gt;.3mf</c> for the whole machine).</summary>
    public static IReadOnlyList<ReportTable> FabricationTables(MachineModel d, PartSet parts)
    {
        var printed = parts.Parts.Where(p => p.Process == PartProcess.Print).ToArray();
        if (printed.Length == 0) return [];
        var plates = parts.PlatesOf(printed, d.Printer, d.Precision);
        static string F(double v) => v.ToString("0.#", System.Globalization.CultureInfo.InvariantCulture);
        var rows = new List<IReadOnlyList<string>>();
        for (int k = 0; k < plates.PlateCount; k++)
        {
            var on = plates.Layout.Placements.Where(p => p.BinIndex == k).GroupBy(p => p.PartId).Select(g => g.Count() > 1 ? $"{g.Key} x {g.Count()}" : g.Key);
            string file = plates.PlateCount > 1 ? OutputNames.PlateThreeMf(d.Name, k + 1) : OutputNames.ThreeMf(d.Name);
            rows.Add([(k + 1).ToString(System.Globalization.CultureInfo.InvariantCulture), string.Join(", ", on), F(100 * plates.Fill(k)) + " %", file]);
        }
        foreach (var miss in plates.Layout.NotPlaced.GroupBy(m => m.PartId))
            rows.Add(["-", $"{miss.Key} x {miss.Count()} not placed: larger than the bed", "", ""]);
        string title = $"Print plates: {plates.PlateCount} on a {F(d.Printer.BedXMm)} x {F(d.Printer.BedYMm)} mm bed, {F(d.Printer.SpacingMm)} mm apart, each part with its larger flat face down";
        return [new ReportTable(title, ["plate", "parts", "first-layer fill", "file"], rows)];
    }

    public static IReadOnlyList<BomPart> BomParts(PartSet parts) => parts.Parts.Select(p =>
    {
        var (lo, hi) = p.Mesh.Bounds();
        return new BomPart(p.Id, p.Process, p.Material.Name, p.Quantity, p.MassG, hi.X - lo.X, hi.Y - lo.Y, p.HeightMm);
    }).ToArray();
}
