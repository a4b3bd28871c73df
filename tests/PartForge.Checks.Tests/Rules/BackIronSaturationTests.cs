using System.Globalization;
using PartForge.Checks.Tests.Pipeline;
using PartForge.Electrical;
using PartForge.Electrical.Field;

namespace PartForge.Checks.Tests.Rules;

/// <summary>
/// back-iron-saturation and the saturated image. Source: flux continuity (the flux of a pole leaves it through the
/// steel, half each way: Phi / (2 t L_r)); mild-steel saturation about 2.0 T and its knee about 1.6 T (from memory,
/// common practice).
/// </summary>
public class BackIronSaturationTests
{
    private static string T(double v) => v.ToString(CultureInfo.InvariantCulture);

    /// <summary>The preset without its back-iron disc (the line removed from the file), with overrides.</summary>
    private static PartForge.Design.Model.Design WithoutIron(params (string, string)[] overrides)
    {
        var path = Path.Combine(PresetPipeline.PresetsDir, "hydro-arc.yaml");
        var text = string.Join("\n", File.ReadAllLines(path).Where(l => !l.TrimStart().StartsWith("back_iron:", StringComparison.Ordinal)));
        var r = PartForge.Design.Loading.DesignLoader.LoadText(text, path, overrides);
        return r.Design ?? throw new InvalidOperationException(string.Join("; ", r.Errors));
    }

    private static (CheckResult Check, ElectricalResult E) Run(double ironMm, string preset = "hydro-arc")
    {
        var d = PresetPipeline.Load(preset, ("rotor.back_iron.thickness", T(ironMm)));
        var (e, _) = PresetPipeline.Stages(d);
        var r = PresetPipeline.Check(d);
        return (r.WithId(CheckIds.BackIronSaturation).First(), e);
    }

    [Fact]
    public void ThinIronFailsAndNamesTheThicknessThatPasses()
    {
        var (thin, e) = Run(1.0);
        Assert.Equal(CheckStatus.Fail, thin.Status);
        var f = e.BackIron.Single();
        // B = Phi / (2 t L_r), computed here from the reported flux and the magnet's radial length.
        var m = PartForge.Design.Machines.MachineModel.From(PresetPipeline.Load("hydro-arc"));
        var (r0, r1) = m.Magnets.Shape.RadialRangeMm(0);
        Assert.Equal(f.FluxPerPoleWb / (2 * 1.0e-3 * (r1 - r0) * 1e-3), thin.Value, 1e-9 * thin.Value);
        Assert.True(f.ImageStrength < 1, "iron past saturation weakens its image");
        var match = System.Text.RegularExpressions.Regex.Match(thin.Message, @"rotor\.back_iron\.thickness to ([0-9.]+)");
        Assert.True(match.Success, thin.Message);
        double fix = double.Parse(match.Groups[1].Value, CultureInfo.InvariantCulture);
        var (fixedCheck, fe) = Run(fix);
        Assert.Equal(CheckStatus.Pass, fixedCheck.Status);
        Assert.Equal(1.0, fe.BackIron.Single().ImageStrength, 12);
        // The flux at the face does not depend on the thickness in the image model, so B falls as 1/t.
        Assert.Equal(thin.Value / fix, fixedCheck.Value, 1e-6 * thin.Value);
        // The step below the fix does not reach the pass band (the fix is the thinnest sheet step that passes).
        Assert.NotEqual(CheckStatus.Pass, Run(fix - BackIronFlux.ThicknessStepMm).Check.Status);
    }

    [Fact]
    public void DoublingTheIronChangesTheEmfLessThanTheFirstMillimetre()
    {
        var none = WithoutIron();
        double e0 = ElectricalEngine.Evaluate(PartForge.Design.Machines.MachineModel.From(none)).CoilEmfRmsV;
        double e1 = Run(1).E.CoilEmfRmsV, e3 = Run(3).E.CoilEmfRmsV, e6 = Run(6).E.CoilEmfRmsV;
        Assert.True(e1 > e0 && e3 > e1 && e6 >= e3 - 1e-12, $"{e0} {e1} {e3} {e6}");
        Assert.True(e6 - e3 < e1 - e0, $"doubling 3 -> 6 mm: {e6 - e3}; first millimetre: {e1 - e0}");
        // 0.1 mm of iron is far from the 6 mm EMF (the defect this check answers).
        double e01 = Run(0.1).E.CoilEmfRmsV;
        Assert.True(e6 - e01 > 0.5 * (e6 - e0), $"{e01} vs {e6}");
    }

    [Fact]
    public void SteelRotorActsAsBackIron()
    {
        var plastic = WithoutIron();
        var steel = WithoutIron(("rotor.material", "steel"));
        var ep = ElectricalEngine.Evaluate(PartForge.Design.Machines.MachineModel.From(plastic));
        var es = ElectricalEngine.Evaluate(PartForge.Design.Machines.MachineModel.From(steel));
        Assert.Empty(ep.BackIron);
        var f = Assert.Single(es.BackIron);
        Assert.True(f.Plane.SteelRotor);
        Assert.True(es.CoilEmfRmsV > ep.CoilEmfRmsV, "a steel rotor adds its image to the EMF");
        var c = PresetPipeline.Check(steel).WithId(CheckIds.BackIronSaturation).Single();
        Assert.Equal(f.FluxDensityTesla, c.Value, 12);
        if (c.Status != CheckStatus.Pass) Assert.Contains("rotor.thickness to", c.Message);
    }
}
