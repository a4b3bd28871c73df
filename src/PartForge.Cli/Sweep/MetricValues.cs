using System.Collections;
using System.Diagnostics.CodeAnalysis;

namespace PartForge.Cli.Sweep;

/// <summary>
/// A variant's numeric results in the fixed order of <see cref="SweepMetrics.All"/>, one double each (NaN where
/// absent): what a sweep keeps per row, about 100 bytes instead of a dictionary's kilobyte, so a 100,000-row sweep
/// stays small. Read it as the dictionary it was made from.
/// </summary>
public sealed class MetricValues : IReadOnlyDictionary<string, double>
{
    private static readonly Dictionary<string, int> Slot =
        SweepMetrics.All.Select((k, i) => (k, i)).ToDictionary(x => x.k, x => x.i, StringComparer.Ordinal);

    private readonly double[] _v;

    private MetricValues(double[] v) => _v = v;

    /// <summary>Empty results (an invalid variant).</summary>
    public static readonly MetricValues None = new(Enumerable.Repeat(double.NaN, SweepMetrics.All.Count).ToArray());

    /// <summary>The compact copy of <paramref name="metrics"/>; a name that is not a sweep metric is a bug.</summary>
    public static MetricValues Of(IReadOnlyDictionary<string, double> metrics)
    {
        if (metrics is MetricValues mv) return mv;
        if (metrics.Count == 0) return None;
        var v = Enumerable.Repeat(double.NaN, SweepMetrics.All.Count).ToArray();
        foreach (var (k, x) in metrics)
        {
            if (!Slot.TryGetValue(k, out int i)) throw new ArgumentException($"'{k}' is not a sweep metric", nameof(metrics));
            v[i] = x;
        }
        return new MetricValues(v);
    }

    public double this[string key] => TryGetValue(key, out double v) ? v : throw new KeyNotFoundException(key);

    public IEnumerable<string> Keys => SweepMetrics.All.Where((_, i) => !double.IsNaN(_v[i]));

    public IEnumerable<double> Values => _v.Where(x => !double.IsNaN(x));

    public int Count => _v.Count(x => !double.IsNaN(x));

    public bool ContainsKey(string key) => TryGetValue(key, out _);

    public bool TryGetValue(string key, [MaybeNullWhen(false)] out double value)
    {
        value = Slot.TryGetValue(key, out int i) ? _v[i] : double.NaN;
        return !double.IsNaN(value);
    }

    public IEnumerator<KeyValuePair<string, double>> GetEnumerator()
    {
        for (int i = 0; i < _v.Length; i++)
            if (!double.IsNaN(_v[i])) yield return new KeyValuePair<string, double>(SweepMetrics.All[i], _v[i]);
    }

    IEnumerator IEnumerable.GetEnumerator() => GetEnumerator();
}
