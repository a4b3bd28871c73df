namespace PartForge.Dynamics.Engine;

/// <summary>
/// Every circuit's d lambda/d theta evaluated together: one sine and cosine per distinct order, shared by all
/// circuits, then a dot product per circuit.
/// </summary>
internal sealed class FluxTable
{
    private readonly int[] _orders;
    private readonly double[] _cosCoef; // [circuit * m + j]: n b, multiplies cos(n phi)
    private readonly double[] _sinCoef; // [circuit * m + j]: -n a, multiplies sin(n phi)
    private readonly double[] _sin, _cos;
    private readonly int _m, _n;

    public FluxTable(IReadOnlyList<FluxSeries> series)
    {
        _orders = series.SelectMany(s => s.Terms).Select(t => t.Order).Where(o => o > 0).Distinct().Order().ToArray();
        _m = _orders.Length;
        _n = series.Count;
        _cosCoef = new double[_n * _m];
        _sinCoef = new double[_n * _m];
        for (int k = 0; k < _n; k++)
            foreach (var t in series[k].Terms)
            {
                if (t.Order <= 0) continue;
                int j = Array.BinarySearch(_orders, t.Order);
                _cosCoef[k * _m + j] += t.Order * t.SinWb;
                _sinCoef[k * _m + j] -= t.Order * t.CosWb;
            }
        _sin = new double[_m];
        _cos = new double[_m];
        MaxOrder = _m > 0 ? _orders[^1] : 0;
    }

    /// <summary>Highest mechanical order present (0 if none).</summary>
    public int MaxOrder { get; }

    /// <summary>Fills slope[k] = d lambda_k / d theta at the wrapped angle phi.</summary>
    public void Slopes(double phi, Span<double> slope)
    {
        for (int j = 0; j < _m; j++) (_sin[j], _cos[j]) = Math.SinCos(_orders[j] * phi);
        for (int k = 0; k < _n; k++)
        {
            double s = 0;
            int b = k * _m;
            for (int j = 0; j < _m; j++) s += _cosCoef[b + j] * _cos[j] + _sinCoef[b + j] * _sin[j];
            slope[k] = s;
        }
    }
}
