using System.Text.Json;
using PartForge.Hardening.Tests.Support;

namespace PartForge.Hardening.Tests.Pipeline;

/// <summary>
/// Golden comparison against the committed samples (out-samples/, regenerated on purpose by
/// scripts/make-samples.sh): every preset, built now, gives byte-identical STL, 3MF, DXF, SVG and PNG files,
/// and a results document that keeps every key and value of the stored one (it may only gain keys). A
/// change that alters a part's bytes on purpose regenerates the samples in the same commit and says why.
/// </summary>
public sealed class GoldenOutputTests
{
    private static readonly string[] ByteExact = [".stl", ".3mf", ".dxf", ".svg", ".png"];

    public static TheoryData<string> Presets()
    {
        var data = new TheoryData<string>();
        foreach (var p in Repo.PresetNames) data.Add(p);
        return data;
    }

    [Theory]
    [MemberData(nameof(Presets))]
    public void A_preset_builds_the_stored_sample_files_byte_for_byte(string preset)
    {
        string samples = Path.Combine(Path.GetDirectoryName(Repo.PresetsFolder)!, "out-samples", preset);
        if (!Directory.Exists(samples))
        {
            // A preset added in this change has no stored sample yet: make-samples.sh writes it.
            Assert.Fail($"out-samples/{preset} is missing; run scripts/make-samples.sh and commit it");
        }
        using var tmp = new TempFolder("golden");
        string o = tmp.Sub(preset);
        var r = Pf.Run("build", Repo.PresetPath(preset), "-o", o, "--quiet");
        Assert.True(r.ExitCode == 0, preset + ": " + Pf.Describe(r));

        foreach (var stored in Directory.GetFiles(samples).Order(StringComparer.Ordinal))
        {
            string name = Path.GetFileName(stored);
            string ext = Path.GetExtension(name);
            string built = Path.Combine(o, name);
            if (ByteExact.Contains(ext))
            {
                Assert.True(File.Exists(built), $"{preset}: the build no longer writes {name}");
                Assert.True(File.ReadAllBytes(stored).AsSpan().SequenceEqual(File.ReadAllBytes(built)),
                    $"{preset}: {name} differs from out-samples/{preset}/{name}");
            }
            else if (name.EndsWith("-results.json", StringComparison.Ordinal))
            {
                using var before = JsonDocument.Parse(File.ReadAllBytes(stored));
                using var after = JsonDocument.Parse(File.ReadAllBytes(built));
                var lost = new List<string>();
                Keeps(before.RootElement, after.RootElement, "$", lost);
                Assert.True(lost.Count == 0, $"{preset}: the results document lost or changed {lost.Count} stored values: {string.Join("; ", lost.Take(12))}");
            }
        }
    }

    /// <summary>Every member and value of <paramref name="a"/> is in <paramref name="b"/> (b may have more members).</summary>
    private static void Keeps(JsonElement a, JsonElement b, string path, List<string> lost)
    {
        if (a.ValueKind != b.ValueKind)
        {
            lost.Add($"{path}: {a.ValueKind} became {b.ValueKind}");
            return;
        }
        switch (a.ValueKind)
        {
            case JsonValueKind.Object:
                foreach (var m in a.EnumerateObject())
                {
                    if (b.TryGetProperty(m.Name, out var bm)) Keeps(m.Value, bm, path + "." + m.Name, lost);
                    else lost.Add($"{path}.{m.Name}: missing");
                }
                break;
            case JsonValueKind.Array:
                if (a.GetArrayLength() != b.GetArrayLength()) lost.Add($"{path}: {a.GetArrayLength()} items became {b.GetArrayLength()}");
                else for (int i = 0; i < a.GetArrayLength(); i++) Keeps(a[i], b[i], $"{path}[{i}]", lost);
                break;
            default:
                if (a.GetRawText() != b.GetRawText()) lost.Add($"{path}: {a.GetRawText()} became {b.GetRawText()}");
                break;
        }
    }
}
