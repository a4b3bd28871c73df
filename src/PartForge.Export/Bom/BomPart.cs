using PartForge.Design.Machines;
using PartForge.Design.Parts;

namespace PartForge.Export.Bom;

/// <summary>
/// A made part as the BOM needs it: how it is made, of what, how many, the mass of one, and for cut parts
/// the footprint (bounding box) and sheet thickness, mm.
/// </summary>
public sealed record BomPart(PartId Id, PartProcess Process, string Material, int Quantity, double MassEachG,
    double FootprintXMm, double FootprintYMm, double ThicknessMm)
{
    public string Name => Id.Name;
}
