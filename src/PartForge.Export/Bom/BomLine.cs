namespace PartForge.Export.Bom;

/// <summary>
/// One line of the bill of materials. <paramref name="Quantity"/> is a count for pieces and a length or mass
/// for stock (then <paramref name="Unit"/> says which: "pcs", "m", "g").
/// </summary>
public sealed record BomLine(string Category, string Item, string Specification, double Quantity, string Unit, string Notes);
