using PartForge.Design.Machines.Magnets;
using PartForge.Electrical.Field;

namespace PartForge.Electrical.Tests.Field;

public class MagnetGradesTests
{
    // Source: manufacturer grade tables (docs/physics.md §3): N35 1.17-1.22, N42 1.28-1.32, N52 1.42-1.48 T; mid-range used.
    [Theory]
    [InlineData("N35", 1.195)]
    [InlineData("N42", 1.30)]
    [InlineData("N52", 1.45)]
    [InlineData("N42SH", 1.30)]
    public void MidRange(string grade, double br) => Assert.Equal(br, PartForge.Design.Materials.MagnetGrades.MidRangeBrTesla(grade)!.Value, 9);

    // Documented interpolation between the anchors, and within the published ranges of the anchors' neighbours.
    [Fact]
    public void InterpolatedGradesAreMonotoneAndBounded()
    {
        double prev = 0;
        for (int n = 35; n <= 52; n++)
        {
            double b = PartForge.Design.Materials.MagnetGrades.MidRangeBrTesla("N" + n)!.Value;
            Assert.True(b > prev);
            Assert.InRange(b, 1.17, 1.48);
            prev = b;
        }
    }

    [Theory]
    [InlineData("N60")]
    [InlineData("N30")]
    [InlineData("X42")]
    [InlineData("")]
    public void UnknownGradesAreRejected(string grade)
    {
        Assert.Null(PartForge.Design.Materials.MagnetGrades.MidRangeBrTesla(grade));
    }

    [Fact]
    public void GivenBrOverridesTheGrade()
    {
        var d = TestDesigns.Crank();
        var m = PartForge.Design.Machines.MachineModel.From(Copy.With(d, magnets: new PartForge.Design.Model.Magnets
        {
            Shape = "disc", Diameter = 12, Thickness = 4, Grade = "N52", Br = 1.21, PitchRadius = 40,
        }));
        Assert.Equal(1.21, m.Magnets.BrTesla);
        Assert.Equal("br", m.Magnets.BrSource);
        Assert.Equal(1.21, ElectricalEngine.Evaluate(m).Magnet.BrTesla);
    }
}
