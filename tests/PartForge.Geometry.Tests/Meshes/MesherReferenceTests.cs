using PartForge.Geometry.Meshes;

namespace PartForge.Geometry.Tests.Meshes;

public class MesherReferenceTests
{
    [Fact]
    public void R1IsClosedWithGenusOfItsThroughHoles()
    {
        var solid = ReferenceRotors.Build(ReferenceRotors.R1);
        var mesh = Mesher.Build(solid, Precision.FromChordalTolerance(ReferenceRotors.R1.E));
        var rep = MeshValidator.Validate(mesh);
        Assert.True(rep.IsValid, rep.ToString());
        Assert.Equal(1, rep.ShellCount);
        Assert.Equal(1 + ReferenceRotors.R1.Bolts, rep.Genus);
        Assert.Equal(solid.AnalyticVolume, mesh.SignedVolume(), 6);
    }
}
