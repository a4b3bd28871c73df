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

    // The generator's fixes actually help: each value the coil-temperature check offers for wind-duo (which warns: 38.9 C
    // against its own 45 C limit), put back into the design, gives a coil that passes, by the whole engine.
    [Fact]
    public void Generator_fixes_bring_the_coil_below_the_warning_band()
    {
        var preset = PresetLibrary.Find("wind-duo")!;
        var loaded = DesignLoader.LoadText(preset.Text, "wind-duo.yaml");
        var c = BuildPipeline.Evaluate(loaded.Machine!).Checks.Checks.Single(x => x.Id == CheckIds.CoilTemperature);
        Assert.Equal(CheckStatus.Warn, c.Status);
        var offers = new List<(string Key, string Value)>();
        foreach (var (key, pattern) in new[] { ("coils.wire.awg", @"coils\.wire\.awg (\d+)"), ("coils.turns", @"coils\.turns (\d+)"),
                     ("operation.load_resistance", @"operation\.load_resistance ([0-9.]+)") })
        {
            var m = Regex.Match(c.Message, pattern);
            Assert.True(m.Success, $"no {key} in: {c.Message}");
            offers.Add((key, m.Groups[1].Value));
        }
        foreach (var (key, value) in offers)
        {
            var fixedDesign = DesignLoader.LoadText(preset.Text, "wind-duo.yaml", new[] { (key, value) });
            Assert.True(fixedDesign.Success, string.Join("; ", fixedDesign.Errors));
            var after = BuildPipeline.Evaluate(fixedDesign.Machine!).Checks.Checks.Single(x => x.Id == CheckIds.CoilTemperature);
            Assert.True(after.Status == CheckStatus.Pass, $"{key} {value}: {after.Value} C against {after.Limit} C: {after.Message}");
        }
    }
}
