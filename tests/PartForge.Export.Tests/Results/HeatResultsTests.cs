using System.Text.RegularExpressions;
using PartForge.Checks;
using PartForge.Design.Loading;
using PartForge.Design.Presets;
using PartForge.Export.Pipeline;
using PartForge.Export.Results;
using PresetRun = PartForge.Export.Tests.Report.Pipeline;

namespace PartForge.Export.Tests.Results;

/// <summary>The heat balance in the results document and the checks that read it (docs/physics.md §13).</summary>
public class HeatResultsTests
{
    public static IEnumerable<object[]> Presets() => PresetRun.Presets();

    // One temperature everywhere: the check's value, electrical.coil.temperature_c and thermal.coil_temperature_c; the hot
    // resistance at it (IEC 60028: R20 (1 + 0.00393 (T - 20))); the heat balance rise = R_th x loss; no preset fails either heat check.
    [Theory]
    [MemberData(nameof(Presets))]
    public void Preset_temperatures_agree_across_the_document(string preset)
    {
        var doc = ResultsBuilder.Build(PresetRun.Evaluate(preset), countTriangles: false);
        var t = doc.Thermal!;
        var coil = doc.Electrical.Coil;
        var check = doc.Checks.Single(c => c.Id == CheckIds.CoilTemperature);
        var magnets = doc.Checks.Single(c => c.Id == CheckIds.MagnetTemperature);
        Assert.Equal(t.CoilTemperatureC, check.Value, 12);
        Assert.Equal(t.CoilTemperatureC, coil.TemperatureC, 12);
        Assert.Equal(t.MagnetTemperatureC, magnets.Value, 12);
        Assert.Equal(doc.Electrical.MagnetTemperatureC, magnets.Value, 12);
        Assert.Equal(coil.Resistance20cOhm * (1 + 0.00393 * (t.CoilTemperatureC - 20)), coil.ResistanceHotOhm, 10);
        Assert.Equal(t.CoilTemperatureC - t.AmbientC, t.ThermalResistanceKPerW * t.CopperLossPerCoilW, 6);
        Assert.Equal(doc.Electrical.MagnetBr * (1 - 0.0012 * (t.MagnetTemperatureC - 20)), doc.Electrical.MagnetBrOperating, 10);
        Assert.NotEqual("fail", check.Status);
        Assert.NotEqual("fail", magnets.Status);
    }

    // The defaults do not fail their own check: the default preset with coils.max_temperature left at the model's default
    // (60 C) and a PLA former is held to PLA's softening point (55 C, resin makers' datasheets) and passes it.
    [Fact]
    public void Default_limit_and_PLA_former_do_not_fail()
    {
        string text = Regex.Replace(PresetLibrary.Default.Text, @"(?m)^\s*max_temperature:.*\n", "");
        var loaded = DesignLoader.LoadText(text, "default.yaml");
        Assert.True(loaded.Success, string.Join("; ", loaded.Errors));
        Assert.Equal(60, loaded.Design!.Coils.MaxTemperature);
        var ev = BuildPipeline.Evaluate(loaded.Machine!);
        var c = ev.Checks.Checks.Single(x => x.Id == CheckIds.CoilTemperature);
        Assert.Equal(55, c.Limit, 12);
        Assert.Equal(CheckStatus.Pass, c.Status);
        Assert.Contains("PLA", c.Message);
    }
}
