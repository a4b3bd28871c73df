using System.Text;
using PartForge.Design.Machines;
using PartForge.Design.Parts;
using PartForge.Export.Bom;
using PartForge.Export.Pipeline;
using PartForge.Parts;

namespace PartForge.Export.Report;

/// <summary>
/// The bytes of the report-side outputs of one evaluated design: <c>&lt;name&gt;-report.html</c>,
/// <c>&lt;name&gt;-bom.csv</c>, <c>&lt;name&gt;-&lt;part&gt;.png</c> for each printed part and
/// <c>&lt;name&gt;-assembly.png</c>. The exporter writes them (atomically) under <see cref="OutputNames"/>.
/// Everything is deterministic: the same evaluation gives the same bytes.
/// </summary>
public static class ReportFiles
{
    private static readonly UTF8Encoding Utf8 = new(false);

    /// <summary>The report's input from an evaluation that has parts (throws when it has none).</summary>
    public static ReportInput InputOf(Evaluation ev, bool forced, bool embedAssemblyPreview = true)
    {
        var parts = ev.Parts ?? throw new InvalidOperationException("the design has no parts, so there is nothing to report on");
        var previews = embedAssemblyPreview ? new[] { ("exploded assembly", Previews.Assembly(parts)) } : [];
        return ReportBuilder.Build(ev.Machine, ElectricalView.From(ev.Machine, ev.Electrical), parts, ev.Checks, forced, previews);
    }

    public static byte[] Html(Evaluation ev, bool forced) => Utf8.GetBytes(HtmlReport.Render(InputOf(ev, forced)));

    public static BillOfMaterials BomOf(Evaluation ev)
    {
        var parts = ev.Parts ?? throw new InvalidOperationException("the design has no parts, so there is no bill of materials");
        var e = ElectricalView.From(ev.Machine, ev.Electrical);
        return BomBuilder.Build(ev.Machine, e.TotalWireM, e.WireGramsPerMetre, ReportBuilder.BomParts(parts), ev.Checks.Joints, ev.Checks.Jacks);
    }

    public static byte[] Bom(Evaluation ev) => BomCsv.WriteUtf8(BomOf(ev));

    /// <summary>(file name, PNG bytes) of every printed part's preview and of the assembly, in part order.</summary>
    public static IReadOnlyList<(string FileName, byte[] Png)> Pngs(Evaluation ev, IReadOnlyCollection<PartId>? onlyParts = null)
    {
        var parts = ev.Parts ?? throw new InvalidOperationException("the design has no parts, so there is nothing to preview");
        var list = new List<(string, byte[])>();
        foreach (var p in parts.Parts.Where(p => p.Process == PartProcess.Print && (onlyParts == null || onlyParts.Contains(p.Id))))
            list.Add((OutputNames.PartFile(ev.Machine.Name, p.Name, "png"), Previews.Part(p)));
        list.Add((OutputNames.PartFile(ev.Machine.Name, "assembly", "png"), Previews.Assembly(parts)));
        return list;
    }
}
