using System.Diagnostics;
using PartForge.Design.Loading;
using static PartForge.Design.Tests.TestSupport;

namespace PartForge.Design.Tests.Loading;

public class DesignOverrideTests
{
    [Fact]
    public void Overrides_replace_keys_and_the_variant_is_fully_validated()
    {
        var r = DesignLoader.LoadText(Crank, "c.yaml", [("coils.turns", "150"), ("gap.air_gap", "1.4"), ("tolerances.print_z", "0.15")]);
        Assert.True(r.Success, string.Join(" | ", r.Errors));
        Assert.Equal(150, r.Design!.Coils.Turns);
        Assert.Equal(1.4, r.Design.Gap.AirGap);
        Assert.Equal(0.15, r.Design.Tolerances.PrintZ);   // the preset has no tolerances section: it is created
        var bad = DesignLoader.LoadText(Crank, "c.yaml", [("machine.poles", "13")]);
        var e = Assert.Single(bad.Errors);
        Assert.Equal("machine.poles", e.KeyPath);
        Assert.True(e.FromOverride);
        Assert.Equal(0, e.Line);
        Assert.Equal("c.yaml: machine.poles (override): 13 is not allowed; allowed: an even number (magnets alternate north and south); use an even number, or magnets.arrangement: same (every magnet shows one pole to the coils, any count)", e.ToString());
    }

    [Fact]
    public void Bad_key_path_gives_the_nearest_key()
    {
        var e = Assert.Single(DesignLoader.LoadText(Crank, "c.yaml", [("coils.turnz", "10")]).Errors);
        Assert.Equal("did you mean 'turns'?", e.Suggestion);
        var s = Assert.Single(DesignLoader.LoadText(Crank, "c.yaml", [("rotor", "10")]).Errors);
        Assert.Contains("is a section", s.Message);
        Assert.Null(DesignSource.CheckKeyPath("rotor.bolt_circle.hole"));
        Assert.NotNull(DesignSource.CheckKeyPath("rotor.bolt_circle.holes"));
    }

    [Fact]
    public void The_parsed_source_is_not_changed_by_overrides()
    {
        var src = DesignLoader.Parse(Crank, "c.yaml");
        var a = src.Load([new DesignOverride("rotor.thickness", "6")]).Design!;
        var b = src.Load().Design!;
        Assert.Equal(6, a.Rotor.Thickness);
        Assert.Equal(5.2, b.Rotor.Thickness);
    }

    [Fact]
    public void A_thousand_variants_map_in_parallel_and_agree_with_sequential_loading()
    {
        var src = DesignLoader.Parse(Crank, "c.yaml");
        var variants = Enumerable.Range(0, 1000).Select(i => new[] { new DesignOverride("coils.turns", (50 + i).ToString()) }).ToArray();
        var sw = Stopwatch.StartNew();
        var results = new DesignLoadResult[variants.Length];
        Parallel.For(0, variants.Length, i => results[i] = src.Load(variants[i]));
        sw.Stop();
        for (int i = 0; i < results.Length; i++) Assert.Equal(50 + i, results[i].Design!.Coils.Turns);
        Assert.Equal(Canon(results[7].Design!), Canon(DesignLoader.LoadText(Crank, "c.yaml", [("coils.turns", "57")]).Design!));
    }
}
