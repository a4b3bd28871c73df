namespace PartForge.Export.Bom;

/// <summary>The bill of materials of one design, lines in a fixed order (magnets, wire, formers, printed, cut, fasteners, sensors).</summary>
public sealed record BillOfMaterials(string DesignName, IReadOnlyList<BomLine> Lines)
{
    public IEnumerable<BomLine> InCategory(string category) => Lines.Where(l => l.Category == category);
}
