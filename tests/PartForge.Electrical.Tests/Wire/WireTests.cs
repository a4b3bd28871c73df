using PartForge.Electrical.Wire;

namespace PartForge.Electrical.Tests.Wire;

public class WireTests
{
    // Source: ASTM B258 (AWG formula d = 0.127 mm x 92^((36 - n)/39)); values computed from the formula (docs/physics.md §1).
    [Theory]
    [InlineData(20, 0.81182)]
    [InlineData(24, 0.51056)]
    [InlineData(28, 0.32109)]
    [InlineData(30, 0.25464)]
    [InlineData(32, 0.20194)]
    [InlineData(36, 0.12700)]
    [InlineData(40, 0.07987)]
    [InlineData(42, 0.06334)]
    public void AwgFormulaDiameter(int awg, double mm) => Assert.Equal(mm, WireGauge.AwgDiameterMm(awg), 5);

    // Source: ASTM B258 published tables (d rounded to 0.0001 in) and IEC 60028 resistivity 1/58 ohm mm^2/m:
    // docs/physics.md §1, resistance from the table diameter and from the formula diameter.
    [Theory]
    [InlineData(20, 0.0320, 0.03323, 0.03331)]
    [InlineData(24, 0.0201, 0.08422, 0.08422)]
    [InlineData(28, 0.0126, 0.2143, 0.2129)]
    [InlineData(30, 0.0100, 0.3403, 0.3386)]
    [InlineData(32, 0.0080, 0.5317, 0.5383)]
    [InlineData(36, 0.0050, 1.3611, 1.3611)]
    [InlineData(40, 0.0031, 3.541, 3.441)]
    [InlineData(42, 0.0025, 5.444, 5.472)]
    public void AwgTableDiameterAndResistance(int awg, double tableInch, double ohmTable, double ohmFormula)
    {
        Assert.Equal(tableInch * 25.4, WireGauge.AwgTableDiameterMm(awg), 9);
        Assert.Equal(ohmTable, Copper.OhmPerMetre20(WireGauge.AwgTableDiameterMm(awg)), ohmTable * 1.5e-3);
        Assert.Equal(ohmFormula, Copper.OhmPerMetre20(WireGauge.AwgDiameterMm(awg)), ohmFormula * 1.5e-3);
    }

    // Source: a NEMA-based magnet-wire table, ohm per 1000 ft at 20 C (docs/physics.md §1): it
    // matches the rounded table diameter.
    [Theory]
    [InlineData(20, 10.13)]
    [InlineData(24, 25.67)]
    [InlineData(28, 65.33)]
    [InlineData(30, 103.7)]
    [InlineData(32, 162.0)]
    [InlineData(36, 414.8)]
    public void NemaOhmPer1000Ft(int awg, double ohmPerKft) =>
        Assert.Equal(ohmPerKft, Copper.OhmPerMetre20(WireGauge.AwgTableDiameterMm(awg)) * 304.8, ohmPerKft * 2e-3);

    // Source: IEC 60028 R(T) = R20 (1 + 0.00393 (T - 20)); computed: AWG 30 at 80 C = 0.4205 ohm/m (table diameter).
    [Fact]
    public void Awg30At80C() =>
        Assert.Equal(0.4205, Copper.AtTemperature(Copper.OhmPerMetre20(WireGauge.AwgTableDiameterMm(30)), 80), 4);

    // Source: IEC 60028 density 8.89 g/cm^3; mass per metre from the formula diameter (docs/physics.md §1).
    [Theory]
    [InlineData(20, 4.602)]
    [InlineData(24, 1.820)]
    [InlineData(28, 0.7199)]
    [InlineData(36, 0.1126)]
    [InlineData(42, 0.02801)]
    public void GramsPerMetre(int awg, double g) => Assert.Equal(g, Copper.GramsPerMetre(WireGauge.AwgDiameterMm(awg)), g * 1e-3);

    // Source: IEC 60317-0-1 maximum overall diameters, grades 1/2/3 (via a national adoption table; docs/physics.md §1).
    [Theory]
    [InlineData(0.100, 0.117, 0.125, 0.132)]
    [InlineData(0.125, 0.144, 0.154, 0.163)]
    [InlineData(0.160, 0.182, 0.194, 0.205)]
    [InlineData(0.254, 0.286, 0.303, 0.319)]
    [InlineData(0.315, 0.349, 0.367, 0.384)]
    [InlineData(0.508, 0.554, 0.578, 0.601)]
    public void Iec60317Rows(double nominal, double g1, double g2, double g3)
    {
        Assert.Equal(g1, EnamelGrade.MaxOverallMm(nominal, 1), 9);
        Assert.Equal(g2, EnamelGrade.MaxOverallMm(nominal, 2), 9);
        Assert.Equal(g3, EnamelGrade.MaxOverallMm(nominal, 3), 9);
        Assert.True(EnamelGrade.IsTabulated(nominal));
        Assert.False(WireSpec.Of(nominal, 2).OverallIsApproximate);
    }

    // Source: IEC 60317-0-1 at 0.200 mm, grade 1 0.226, grade 2 0.239 (from memory; docs/physics.md §1): linear interpolation
    // between the 0.160 and 0.254 rows is an approximation, within 0.002 mm of those values.
    [Fact]
    public void InterpolationBetweenRowsIsCloseAndFlagged()
    {
        Assert.Equal(0.226, EnamelGrade.MaxOverallMm(0.200, 1), 0.002);
        Assert.Equal(0.239, EnamelGrade.MaxOverallMm(0.200, 2), 0.002);
        Assert.True(WireSpec.Of(0.200, 2).OverallIsApproximate);
    }

    // Fact of the trade: the enamel build grows with the wire and with the grade; the documented extrapolation keeps
    // the end rows' ratio, so it is continuous at the table ends and monotone.
    [Fact]
    public void ExtrapolationIsContinuousAndMonotone()
    {
        for (int g = 1; g <= 3; g++)
        {
            Assert.Equal(EnamelGrade.MaxOverallMm(0.100, g), EnamelGrade.MaxOverallMm(0.1000001, g), 5);
            Assert.Equal(EnamelGrade.MaxOverallMm(0.508, g), EnamelGrade.MaxOverallMm(0.5079999, g), 5);
            double prev = 0;
            for (double d = 0.03; d < 2; d += 0.01)
            {
                double o = EnamelGrade.MaxOverallMm(d, g);
                Assert.True(o > d && o > prev);
                if (g > 1) Assert.True(o > EnamelGrade.MaxOverallMm(d, g - 1));
                prev = o;
            }
        }
    }

    // Fact of the trade (common practice): AWG 42 is about a human hair, ~0.063 mm.
    [Fact]
    public void Awg42IsAboutAHair() => Assert.InRange(WireGauge.AwgDiameterMm(42), 0.060, 0.066);

    // Geometry: hexagonal packing pi/(2 sqrt 3) = 0.9069 times (d/D)^2 (docs/physics.md §2).
    [Fact]
    public void HexagonalFillLimit()
    {
        var w = WireSpec.OfAwg(28, 2);
        Assert.Equal(0.9069 * Math.Pow(w.BareDiameterMm / w.OverallDiameterMm, 2), w.MaxHexagonalFill, 4);
        Assert.Equal(30, WireGauge.ThickestAwgWithin(WireGauge.AwgDiameterMm(30) + 1e-9));
        Assert.Null(WireGauge.ThickestAwgWithin(0.01));
    }
}
