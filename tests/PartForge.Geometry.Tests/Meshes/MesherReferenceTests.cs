using PartForge.Geometry.Meshes;

namespace PartForge.Geometry.Tests.Meshes;

/// <summary>
/// Reference rotors R1 and R2 (docs/physics.md §9): volume against the true-circle geometry,
/// V = pi r^2 h per cylinder (Source: volume of a right circular cylinder), and the true volumes listed there
/// (R1 79,734.25 mm^3, R2 1,179,311.3 mm^3); genus = through holes (Euler-Poincare: chi = 2 - 2g).
/// </summary>
public class MesherReferenceTests
{
    public static TheoryData<string> Rotors => new() { "R1", "R2" };

    private static ReferenceRotors.Spec Spec(string n) => n == "R1" ? ReferenceRotors.R1 : ReferenceRotors.R2;

    [Theory]
    [MemberData(nameof(Rotors))]
    public void RotorIsClosedWithGenusOfItsThroughHolesAndTrueVolume(string name)
    {
        var s = Spec(name);
        var solid = ReferenceRotors.Build(s);
        var mesh = Mesher.Build(solid, Precision.FromChordalTolerance(s.E));
        var rep = MeshValidator.Validate(mesh);
        Assert.True(rep.IsValid, rep.ToString());
        Assert.Equal(1, rep.ShellCount);
        Assert.Equal(1 + s.Bolts, rep.Genus);
        Assert.Equal(solid.AnalyticVolume, mesh.SignedVolume(), 3);
        double truth = ReferenceRotors.TrueVolume(s);
        Assert.InRange(mesh.SignedVolume(), truth * 0.997, truth * 1.003);
        // The listed figures agree with the formula.
        Assert.Equal(name == "R1" ? 79734.25 : 1179311.3, truth, name == "R1" ? 0.01 : 0.1);
    }

    [Fact]
    public void R2HasNoMoreTrianglesThanTheReferenceLibrary()
    {
        var mesh = Mesher.Build(ReferenceRotors.Build(ReferenceRotors.R2), Precision.FromChordalTolerance(ReferenceRotors.R2.E));
        Assert.True(mesh.TriangleCount <= 82996, $"{mesh.TriangleCount} triangles");
    }
}
