using PartForge.Design.Keys;
using PartForge.Geometry;
using PartForge.Geometry.Meshes;
using static PartForge.Design.Tests.TestSupport;

namespace PartForge.Design.Tests.Loading;

/// <summary>
/// The mesher keeps 0.0001 mm grid points apart in float32 output only within 2^(floor(log2 grid) + 23) mm of
/// the part's centre (float32 has a 24-bit significand; its spacing at 2^k is 2^(k-23); IEEE 754 binary32).
/// A design the loader accepts must stay inside it, so the diameters that set a part's extent are limited in
/// the schema and refused at their key (finding: rotor.outer_diameter 1030 passed check and failed build with
/// "coordinate 514.999 mm exceeds 512 mm (Parameter 'layers')").
/// </summary>
public class MeshRangeRuleTests
{
    private static double LimitMm => Mesher.Float32SafeLimitMm(Precision.FromChordalTolerance(0.01));

    [Theory]
    [InlineData("rotor", "outer_diameter")]
    [InlineData("stator", "outer_diameter")]
    [InlineData("stator", "inner_diameter")]
    public void The_schema_maximum_of_a_part_diameter_stays_inside_the_mesh_coordinate_range(string section, string key)
    {
        var spec = SectionSpec.Root.Keys.Single(k => k.Key == section).Section!.Keys.Single(k => k.Key == key);
        Assert.NotNull(spec.Range);
        Assert.True(spec.Range!.Max / 2 < LimitMm, $"{section}.{key} allows radius {spec.Range.Max / 2} mm, the mesh range ends at {LimitMm} mm");
    }

    [Fact]
    public void The_float32_limit_is_512_mm_at_the_grid()
    {
        // 0.0001 mm grid: floor(log2 1e-4) = -14, 2^(-14+23) = 512 mm (worked by hand).
        Assert.Equal(512.0, LimitMm);
    }

    [Fact]
    public void A_rotor_of_1030_mm_is_refused_at_its_key_and_line()
    {
        string text = Edit(Crank, "outer_diameter:", "outer_diameter: 1030");
        var e = Single(text, "rotor.outer_diameter");
        Assert.Equal(LineOf(text, "outer_diameter: 1030"), e.Line);
        Assert.True(e.Column > 0);
        Assert.Contains("1000", e.Allowed);
    }

    [Fact]
    public void A_stator_of_1100_mm_is_refused_at_its_key()
    {
        string text = Crank.Replace("  outer_diameter: 130", "  outer_diameter: 1100");
        Assert.NotEqual(Crank, text);
        var e = Single(text, "stator.outer_diameter");
        Assert.Contains("1000", e.Allowed);
    }

    [Fact]
    public void A_rotor_at_the_new_maximum_loads()
    {
        string text = Edit(Crank, "outer_diameter:", "outer_diameter: 1000");
        Assert.True(PartForge.Design.Loading.DesignLoader.LoadText(text, "t.yaml").Success);
    }
}
