using PartForge.Design.Loading;
using PartForge.Design.Presets;

namespace PartForge.Design.Tests.Presets;

public class PresetLibraryTests
{
    [Fact]
    public void Every_preset_loads_without_errors()
    {
        Assert.True(PresetLibrary.All.Count >= 3);
        foreach (var p in PresetLibrary.All)
        {
            var r = DesignLoader.LoadText(p.Text, p.Name + ".yaml");
            Assert.True(r.Success, p.Name + ": " + string.Join(" | ", r.Errors));
            Assert.Equal(p.Name, r.Design!.Name);
        }
    }

    [Fact]
    public void Presets_cover_every_layout_magnet_shape_coil_shape_and_phase_count()
    {
        var designs = PresetLibrary.All.Select(p => DesignLoader.LoadText(p.Text, p.Name).Design!).ToList();
        Assert.Equal(["dual-rotor", "dual-stator", "single-rotor"], designs.Select(d => d.Machine.Layout).Distinct().Order());
        Assert.Equal(["arc", "block", "disc", "sector"], designs.Select(d => d.Magnets.Shape).Distinct().Order());
        Assert.Equal(["keystone", "round"], designs.Select(d => d.Coils.Shape).Distinct().Order());
        Assert.Equal([1, 3], designs.Select(d => d.Machine.Phases).Distinct().Order());
    }

    [Fact]
    public void Presets_are_marked_invented_and_described()
    {
        foreach (var p in PresetLibrary.All)
        {
            Assert.StartsWith("# Invented scenario", p.Text);
            Assert.DoesNotContain('\n', p.Description);
            Assert.True(p.Description.Length is > 10 and < 120, p.Description);
        }
        Assert.Equal(PresetLibrary.DefaultName, PresetLibrary.Default.Name);
    }

    [Fact]
    public void Template_lists_every_key_and_loads_to_the_same_design_as_its_preset()
    {
        var keys = PartForge.Design.Keys.SectionSpec.Root.LeafPaths().Select(p => p.Key.Key).Distinct();
        foreach (var p in PresetLibrary.All)
        {
            string t = DesignTemplate.Render(p);
            var a = DesignLoader.LoadText(p.Text, "a.yaml");
            var b = DesignLoader.LoadText(t, "b.yaml");
            Assert.True(b.Success, p.Name + ": " + string.Join(" | ", b.Errors) + "\n" + t);
            Assert.Equal(TestSupport.Canon(a.Design!), TestSupport.Canon(b.Design!));
            foreach (var k in keys) Assert.Contains(k + ":", t);
        }
    }
}
