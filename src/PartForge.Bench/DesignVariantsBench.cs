using PartForge.Design.Loading;
using PartForge.Design.Presets;

namespace PartForge.Bench;

/// <summary>
/// The loader's share of a sweep: the largest preset parsed once, then 1,000 variants (two keys each)
/// mapped and fully validated in parallel. Target: a small fraction of the sweep's 30 s (under 0.5 s).
/// </summary>
public sealed class DesignVariantsBench : IBenchCase
{
    private DesignSource? _source;
    private DesignOverride[][] _variants = [];

    public string Name => "design-variants";

    public string Description => "load and validate 1,000 override variants of the largest preset, parsed once (target < 0.5 s)";

    public void Setup()
    {
        var largest = PresetLibrary.All.OrderByDescending(p => p.Text.Length).First();
        _source = DesignLoader.Parse(largest.Text, largest.Name + ".yaml");
        _variants = Enumerable.Range(0, 1000).Select(i => new[]
        {
            new DesignOverride("coils.turns", (40 + i % 100).ToString(System.Globalization.CultureInfo.InvariantCulture)),
            new DesignOverride("gap.air_gap", (1.0 + i / 100 * 0.1).ToString("0.0", System.Globalization.CultureInfo.InvariantCulture)),
        }).ToArray();
    }

    public IReadOnlyDictionary<string, double> Run()
    {
        int ok = 0;
        Parallel.For(0, _variants.Length, () => 0, (i, _, n) => _source!.Load(_variants[i]).Success ? n + 1 : n, n => Interlocked.Add(ref ok, n));
        return new Dictionary<string, double> { ["variants"] = _variants.Length, ["valid"] = ok };
    }
}
