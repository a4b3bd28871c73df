using PartForge.Geometry.Profiles;

namespace PartForge.Geometry.Solids;

/// <summary>
/// Builds the exact layers of a plate with cuts: a base outline (union of outers) of height
/// H, through cuts, and partial cuts each with its own z-range. The z-breakpoints of every cut split the
/// plate into layers; each layer removes exactly the cuts whose z-range covers it. Layers with the same
/// set of cuts next to each other are merged, so the stack has no needless levels.
/// </summary>
public sealed class PrismaticStack
{
    private readonly double _height;
    private readonly List<Contour> _outers = new();
    private readonly List<(Contour Contour, double Z0, double Z1)> _cuts = new();

    public PrismaticStack(double heightMm)
    {
        if (!(heightMm > 0) || !double.IsFinite(heightMm)) throw new ArgumentOutOfRangeException(nameof(heightMm), heightMm, "a prismatic stack needs a positive, finite height (mm)");
        _height = heightMm;
    }

    public double HeightMm => _height;

    public PrismaticStack Outer(Contour c) { _outers.Add(c); return this; }

    public PrismaticStack Through(Contour c) => Cut(c, 0, _height);

    /// <summary>A cut from z0 to z1 (clamped to the plate).</summary>
    public PrismaticStack Cut(Contour c, double z0, double z1)
    {
        z0 = Math.Clamp(z0, 0, _height);
        z1 = Math.Clamp(z1, 0, _height);
        if (z1 > z0) _cuts.Add((c, z0, z1));
        return this;
    }

    /// <summary>True when every cut goes through: the part is a single-thickness sheet.</summary>
    public bool IsSheet => _cuts.All(c => c.Z0 == 0 && c.Z1 == _height);

    public IReadOnlyList<ExactLayer> Build()
    {
        var levels = new SortedSet<double> { 0, _height };
        foreach (var c in _cuts) { levels.Add(c.Z0); levels.Add(c.Z1); }
        var z = levels.ToArray();
        var layers = new List<ExactLayer>();
        List<int>? prevSet = null;
        double prevZ0 = 0;
        for (int i = 0; i + 1 < z.Length; i++)
        {
            double mid = (z[i] + z[i + 1]) / 2;
            var set = Enumerable.Range(0, _cuts.Count).Where(j => _cuts[j].Z0 <= mid && _cuts[j].Z1 >= mid).ToList();
            if (prevSet is not null && !prevSet.SequenceEqual(set))
            {
                layers.Add(Make(prevZ0, z[i], prevSet));
                prevZ0 = z[i];
            }
            prevSet = set;
        }
        layers.Add(Make(prevZ0, _height, prevSet!));
        return layers;
    }

    private ExactLayer Make(double z0, double z1, List<int> set) =>
        new(z0, z1, _outers.ToArray(), set.Select(j => _cuts[j].Contour).ToArray());
}
