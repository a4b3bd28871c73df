using System.Globalization;
using System.Text.Json;
using PartForge.Export.Results;

namespace PartForge.Export.Tests.Results;

public class ResultsJsonTests
{
    private static ResultsDocument Doc(double emf = 6.25, double margin = 0.32) => new()
    {
        Design = "t",
        Summary = new ResultsSummary("warn", 0, 1),
        Electrical = new ElectricalSection
        {
            PolePairs = 6, ElectricalHz = 40, MagneticGap = 1.7999999999999998, WindingFactor = 0.8660254037844387, MagnetBr = 1.3,
            Coil = new CoilSection
            {
                Turns = 120, WireBare = 0.321, WireOverall = 0.357, FillFactor = 0.45, InnerDiameter = 8, OuterDiameter = 20.3, Height = 5,
                PitchRadius = 40, MeanTurn = 44.6, WireLengthM = 5.9, Resistance20cOhm = 1.27, ResistanceHotOhm = 1.47, InductanceUh = 210, CopperMassG = 4.3,
            },
            CoilFluxLinkagePeakWb = 0.0021,
            Phase = new PhaseSection(3, emf * Math.Sqrt(2), emf, 3.81),
            LineEmfRmsV = 10.8, KeVPerKrpm = 27,
        },
        Checks = [new CheckEntry("running-gap", "rotor", "warn", 0.62, 0.3, "mm", margin, "m")],
        Parts = [new PartEntry("rotor", "print", 1, ["t-rotor.stl"], 12345.5, 4500) { Material = "PLA" }],
    };

    [Fact]
    public void Keys_come_in_the_contract_order()
    {
        using var j = JsonDocument.Parse(ResultsJson.Serialize(Doc()));
        Assert.Equal(["format", "design", "summary", "electrical", "checks", "parts", "operating", "mechanics", "bom", "assembly"], j.RootElement.EnumerateObject().Select(p => p.Name));
        // The contract's keys first, in its order; additions after them.
        Assert.Equal(["pole_pairs", "electrical_hz", "magnetic_gap", "winding_factor", "magnet", "coil", "coil_flux_linkage_peak_wb", "phase", "line_emf_rms_v", "ke_v_per_krpm"],
            j.RootElement.GetProperty("electrical").EnumerateObject().Select(p => p.Name).Take(10));
        Assert.Equal(["id", "part", "counterpart", "status", "value", "limit", "unit", "margin", "message"], j.RootElement.GetProperty("checks")[0].EnumerateObject().Select(p => p.Name).Take(9));
        Assert.Equal(1.8, j.RootElement.GetProperty("electrical").GetProperty("magnetic_gap").GetDouble()); // binary noise rounded away
    }

    [Fact]
    public void Output_is_identical_under_another_culture_and_has_no_non_finite_number()
    {
        string a = ResultsJson.Serialize(Doc());
        var saved = CultureInfo.CurrentCulture;
        try
        {
            // The build runs in invariant-globalization mode, so a named culture cannot be made; a clone of the
            // invariant culture with a comma decimal separator stands for one.
            var comma = (CultureInfo)CultureInfo.InvariantCulture.Clone();
            comma.NumberFormat.NumberDecimalSeparator = ",";
            comma.NumberFormat.NumberGroupSeparator = ".";
            CultureInfo.CurrentCulture = comma;
            Assert.Equal(a, ResultsJson.Serialize(Doc()));
        }
        finally { CultureInfo.CurrentCulture = saved; }
        Assert.Throws<NonFiniteResultException>(() => ResultsJson.Serialize(Doc(emf: double.NaN)));
        Assert.Throws<NonFiniteResultException>(() => ResultsJson.Serialize(Doc(margin: double.PositiveInfinity)));
        Assert.DoesNotContain("-0,", ResultsJson.Serialize(Doc(margin: -0.0)));
    }
}
