using PartForge.Design.Machines;
using PartForge.Formats.Cutting;
using PartForge.Parts;

namespace PartForge.Export.Exporters;

/// <summary>The cut sheet of a cut part: its exact profile, its engraved marks and the machine's kerf.</summary>
internal static class CutSheets
{
    public static CutSheet Of(MachineModel m, PartModel p) =>
        new(p.Name, p.CutProfile ?? throw new InvalidOperationException($"cut part {p.Name} has no cut profile"), p.Marks, m.Process.KerfMm);
}
