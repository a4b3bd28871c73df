using System.Text.RegularExpressions;
using PartForge.Hardening.Tests.Support;

namespace PartForge.Hardening.Tests.Architecture;

/// <summary>
/// The design file's words for closed sets (layouts, part names, magnet and coil shapes, sensor kinds,
/// connections, processes) are read by the loader and written by the name writers, and compared nowhere else:
/// every later stage asks the typed machine model. And there is one material table.
/// </summary>
public sealed class ClosedSetTests
{
    private static readonly string Words =
        "single-rotor|dual-rotor|dual-stator|rotor|rotor-front|rotor-back|back-iron|former|stator|stator-front|stator-back|" +
        "spacer|gap-gauge|hub-spacer|rim-spacer|disc|block|arc|sector|round|keystone|hall|reed|none|star|delta|series|parallel|print|cut";

    // A word compared, tested, matched or switched on: == "x", != "x", StartsWith("x"), case "x", "x" =>.
    private static readonly Regex Comparison = new(
        $@"(==|!=|StartsWith\(|EndsWith\(|\bcase)\s*""({Words})""|""({Words})""\s*(=>|==|!=)", RegexOptions.CultureInvariant);

    /// <summary>Where the words may be read or written: the loader and its model of the file, the model's resolution
    /// and its name writers, the shape registrations, and the drawing legend's word table.</summary>
    private static readonly string[] Allowed =
    [
        "src/PartForge.Design/Loading/",
        "src/PartForge.Design/Model/",
        "src/PartForge.Design/Schema/",
        "src/PartForge.Design/Machines/MachineModel.cs",
        "src/PartForge.Design/Machines/Words.cs",
        "src/PartForge.Design/Machines/Layout.cs",
        "src/PartForge.Design/Parts/PartNames.cs",
        "src/PartForge.Export/Drawings/HalfSection.cs",
    ];

    private static IEnumerable<(string Rel, string Text)> Sources()
    {
        string root = Path.GetDirectoryName(Repo.PresetsFolder)!;
        foreach (var f in Directory.GetFiles(Path.Combine(root, "src"), "*.cs", SearchOption.AllDirectories))
        {
            string rel = Path.GetRelativePath(root, f).Replace('\\', '/');
            if (rel.Contains("/obj/") || rel.Contains("/bin/")) continue;
            yield return (rel, File.ReadAllText(f));
        }
    }

    [Fact]
    public void No_stage_compares_the_design_file_words_of_a_closed_set()
    {
        var found = new List<string>();
        foreach (var (rel, text) in Sources())
        {
            if (Allowed.Any(a => rel.StartsWith(a, StringComparison.Ordinal))) continue;
            var lines = text.Split('\n');
            for (int i = 0; i < lines.Length; i++)
                if (Comparison.IsMatch(lines[i])) found.Add($"{rel}:{i + 1}: {lines[i].Trim()}");
        }
        Assert.True(found.Count == 0, "closed-set words compared outside the loader and the name writers:\n" + string.Join("\n", found));
    }

    [Fact]
    public void The_comparison_pattern_finds_what_it_is_meant_to_find()
    {
        // The test above is only as good as its pattern: it must catch the forms the code used to have.
        Assert.Matches(Comparison, "if (d.Machine.Layout == \"dual-stator\") x();");
        Assert.Matches(Comparison, "bool r = name.StartsWith(\"rotor\", StringComparison.Ordinal);");
        Assert.Matches(Comparison, "\"disc\" => 1,");
        Assert.Matches(Comparison, "case \"keystone\":");
        Assert.DoesNotMatch(Comparison, "string label = \"rotor\";");
    }

    [Fact]
    public void There_is_one_material_table()
    {
        // Every material property lives in the one table; the design model only lists the names it accepts.
        var holders = Sources().Where(s => s.Text.Contains("\"plywood\"", StringComparison.Ordinal)).Select(s => s.Rel).ToArray();
        Assert.All(holders, h => Assert.True(h == "src/PartForge.Design/Materials/MaterialTable.cs" || h.StartsWith("src/PartForge.Design/Model/", StringComparison.Ordinal), h));
        Assert.Contains("src/PartForge.Design/Materials/MaterialTable.cs", holders);
        // And the names the design file accepts are exactly the table's.
        var accepted = PartForge.Design.Keys.SectionSpec.For(typeof(PartForge.Design.Model.Rotor)).Find("material")!.OneOf!;
        Assert.Equal(PartForge.Design.Materials.MaterialTable.All.Select(m => m.Name), accepted);
    }
}
