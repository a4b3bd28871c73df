using PartForge.Design.Machines;
using PartForge.Electrical.Coils;
using PartForge.Electrical.Wire;

namespace PartForge.Electrical.Tests.Coils;

public class CoilWindingTests
{
    // Source: Wheeler, Proc. IRE 16(10) 1928, worked values computed from the formula (docs/physics.md §2).
    [Theory]
    [InlineData(25.4, 25.4, 12.7, 100, 400.0)]
    [InlineData(7, 3, 6, 100, 119.6)]
    public void WheelerWorkedValues(double a, double b, double c, int n, double uh) =>
        Assert.Equal(uh, CoilInductance.WheelerMicrohenry(a, b, c, n), 0.1);

    private static CoilSpec Spec(CoilShape shape) => new()
    {
        Shape = shape, PitchRadiusMm = 40, HeightMm = 5, CoreMm = 8, WindowRadialLengthMm = 12, FillFactor = 0.45,
        Wire = WireSpec.OfAwg(28, 2), CoilCount = 9, LeadAllowanceMm = 150, MaxTemperatureC = 60,
    };

    // Definition (documented rule): build = N pi d^2 / (4 fill h); copper area in the winding = fill x window area.
    [Theory]
    [InlineData(CoilShape.Round)]
    [InlineData(CoilShape.Keystone)]
    public void BuildHoldsTheCopperAtTheFillFactor(CoilShape shape)
    {
        var s = Spec(shape);
        var c = s.Wind(120);
        double copper = 120 * s.Wire.CopperAreaMm2;
        Assert.Equal(copper, s.FillFactor * c.Outline.RadialBuildMm * s.HeightMm, 9);
        // Mean turn x turns = the winding's plan-area centroid length: window perimeter + pi build.
        Assert.Equal(c.Outline.WindowPerimeterMm + Math.PI * c.Outline.RadialBuildMm, c.MeanTurnMm, 9);
    }

    // Source: IEC 60028 (resistivity, alpha, density); the resistance is wire length x ohm per metre.
    [Fact]
    public void ResistanceIsLengthTimesOhmPerMetreAndHotFollowsAlpha()
    {
        var c = Spec(CoilShape.Round).Wind(120);
        double len = (120 * c.MeanTurnMm + 150) / 1000;
        Assert.Equal(len, c.WireLengthM, 12);
        Assert.Equal(len * (1.0 / 58) / (Math.PI * Math.Pow(WireGauge.AwgDiameterMm(28), 2) / 4), c.Resistance20COhm, 12);
        Assert.Equal(c.Resistance20COhm * (1 + 0.00393 * 40), c.ResistanceHotOhm, 12);
        Assert.Equal(len * 1000 * Math.PI * Math.Pow(WireGauge.AwgDiameterMm(28), 2) / 4 * 8.89 / 1000, c.CopperMassG, 9);
    }

    // Source: Wheeler multilayer formula applied with the round coil's mean radius, axial height and build.
    [Fact]
    public void RoundInductanceUsesWheeler()
    {
        var c = Spec(CoilShape.Round).Wind(150);
        double b = c.Outline.RadialBuildMm;
        Assert.Equal(CoilInductance.WheelerMicrohenry(4 + b / 2, 5, b, 150), c.InductanceUh, 9);
        Assert.False(c.InductanceIsApproximate);
        Assert.True(Spec(CoilShape.Keystone).Wind(150).InductanceIsApproximate);
    }
}
