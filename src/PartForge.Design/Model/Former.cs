namespace PartForge.Design.Model;

public sealed class Former
{
    [Range(0, 20, MinExclusive = true), Doc("Flange thickness each side of the winding, mm.")]
    public double Flange { get; init; } = 0.8;

    [Range(0, 50), Doc("Flange overhang beyond the winding, mm.")]
    public double Margin { get; init; } = 1.0;
}
