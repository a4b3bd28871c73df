using PartForge.Electrical.Field;

namespace PartForge.Electrical.Tests.Field;

public class MagnetGradesTests
{
    // Source: manufacturer grade tables (REFERENCE.md section 2): N35 1.17-1.22, N42 1.28-1.32, N52 1.42-1.48 T; mid-range used.
    [Theory]
    [InlineData("N35", 1.195)]
    [InlineData("N42", 1.30)]
    [InlineData("N52", 1.45)]
    [InlineData("N42SH", 1.30)]
    public void MidRange(string grade, double br) => Assert.Equal(br, MagnetGrades.MidRangeBrTesla(grade)!.Value, 9);

    // Documented interpolation between the anchors, and within the published ranges of the anchors' neighbours.
    [Fact]
    public void InterpolatedGradesAreMonotoneAndBounded()
    {
        double prev = 0;
        for (int n = 35; n <= 52; n++)
        {
            double b = MagnetGrades.MidRangeBrTesla("N" + n)!.Value;
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
        Assert.Null(MagnetGrades.MidRangeBrTesla(grade));
        var diags = new List<Diagnostic>();
        Assert.Null(MagnetGrades.FromDesign(new PartForge.Design.Model.Magnets { Grade = grade }, diags));
        Assert.Contains(diags, d => d.Id == "magnet-grade-unknown" && d.Severity == DiagnosticSeverity.Error && d.Message.Contains("magnets.grade"));
    }

    [Fact]
    public void GivenBrOverridesTheGrade()
    {
        var diags = new List<Diagnostic>();
        Assert.Equal(1.21, MagnetGrades.FromDesign(new PartForge.Design.Model.Magnets { Grade = "N52", Br = 1.21 }, diags));
        Assert.Empty(diags);
    }
}
