using PartForge.Export.Results;
using PresetRun = PartForge.Export.Tests.Report.Pipeline;

namespace PartForge.Export.Tests.Results;

/// <summary>
/// A check row is known by (id, part, counterpart): no two rows of a results document share all three, so a
/// reader can tell, say, the front and back running gaps of a dual-stator machine apart without reading the
/// message; and each part of a preset has its own name (one name per role and side).
/// </summary>
public class CheckKeyTests
{
    public static IEnumerable<object[]> Presets() => PresetRun.Presets();

    [Theory]
    [MemberData(nameof(Presets))]
    public void Every_check_row_is_unique_by_id_part_and_counterpart(string preset)
    {
        var doc = ResultsBuilder.Build(PresetRun.Evaluate(preset), countTriangles: false);
        var dupes = doc.Checks.GroupBy(c => (c.Id, c.Part, c.Counterpart)).Where(g => g.Count() > 1).Select(g => g.Key).ToArray();
        Assert.True(dupes.Length == 0, $"{preset}: repeated check keys: {string.Join(", ", dupes)}");
    }

    [Fact]
    public void A_dual_stator_machine_names_the_side_of_each_running_gap()
    {
        // pulse-sculpture is the bundled dual-stator preset: one rotor between two stators, so two running gaps.
        var doc = ResultsBuilder.Build(PresetRun.Evaluate("pulse-sculpture"), countTriangles: false);
        var gaps = doc.Checks.Where(c => c.Id == "running-gap").ToArray();
        Assert.Equal(2, gaps.Length);
        Assert.All(gaps, g => Assert.Equal("rotor", g.Part));
        Assert.Equal(["stator-back", "stator-front"], gaps.Select(g => g.Counterpart!).Order(StringComparer.Ordinal));
    }

    [Theory]
    [MemberData(nameof(Presets))]
    public void Each_part_role_and_side_has_its_own_name(string preset)
    {
        var parts = PresetRun.Evaluate(preset).Parts!.Parts;
        Assert.Equal(parts.Count, parts.Select(p => p.Name).Distinct(StringComparer.Ordinal).Count());
        Assert.Equal(parts.Count, parts.Select(p => p.Id).Distinct().Count());
        // The name is a function of the identity: the same (role, side) is never written under two names.
        Assert.All(parts, p => Assert.Equal(p.Id.Name, p.Name));
    }
}
