using PartForge.Design.Materials;

namespace PartForge.Design.Machines;

/// <summary>The stator ring(s) (<c>stator.*</c>).</summary>
public sealed record StatorSpec(double InnerDiameterMm, double OuterDiameterMm, double ThicknessMm, BoltPattern? Mount, Material Material)
{
    public double InnerRadiusMm => InnerDiameterMm / 2;
    public double OuterRadiusMm => OuterDiameterMm / 2;
}
