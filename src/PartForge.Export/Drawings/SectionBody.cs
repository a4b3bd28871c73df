namespace PartForge.Export.Drawings;

/// <summary>
/// One body cut by the half-section plane: a rectangle from radius RMin to RMax and axial position ZMin to
/// ZMax, mm. <paramref name="Kind"/> picks the hatch/fill.
/// </summary>
public sealed record SectionBody(PartForge.Design.Stack.SlabKind Kind, string Owner, double RMin, double RMax, double ZMin, double ZMax, string Label);
