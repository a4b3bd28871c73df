namespace PartForge.Dynamics.Engine;

/// <summary>
/// Samples the run on a uniform grid i x dt. When the buffer holds twice the allowed points every second sample
/// is dropped and dt doubles (the grid stays aligned), so memory is bounded and the spacing uniform whatever the
/// run's length; the final state is appended at the end.
/// </summary>
internal sealed class SeriesRecorder
{
    private readonly int _max;
    private double _dt;
    private long _next;
    private readonly List<double> _t = new(), _th = new(), _rpm = new(), _v = new(), _tq = new();
    private readonly List<double>[] _cur;

    public SeriesRecorder(int maxPoints, double timeLimitS, int circuits)
    {
        _max = Math.Max(2, maxPoints);
        _dt = timeLimitS / (4.0 * (_max - 1));
        _cur = Enumerable.Range(0, circuits).Select(_ => new List<double>()).ToArray();
    }

    /// <summary>Time of the next grid sample, s.</summary>
    public double NextTime => _next * _dt;

    public void Add(double t, Solution s, double theta)
    {
        Append(t, s, theta);
        _next++;
        if (_t.Count >= 2 * _max)
        {
            KeepEven();
            _dt *= 2;
            _next = _t.Count;
        }
    }

    private void Append(double t, Solution s, double theta)
    {
        _t.Add(t);
        _th.Add(theta);
        _rpm.Add(s.Omega * 30 / Math.PI);
        _v.Add(s.SourceV);
        _tq.Add(s.Torque);
        for (int k = 0; k < _cur.Length; k++) _cur[k].Add(s.Current[k]);
    }

    private void KeepEven()
    {
        foreach (var l in new[] { _t, _th, _rpm, _v, _tq }.Concat(_cur))
        {
            int j = 0;
            for (int i = 0; i < l.Count; i += 2) l[j++] = l[i];
            l.RemoveRange(j, l.Count - j);
        }
    }

    /// <summary>The trace with the final state appended (at most maxPoints samples).</summary>
    public TimeSeries Finish(double t, Solution s, double theta)
    {
        if (_t.Count > 0 && _t[^1] >= t)
        {
            foreach (var l in new[] { _t, _th, _rpm, _v, _tq }.Concat(_cur)) l.RemoveAt(l.Count - 1);
        }
        while (_t.Count + 1 > _max) KeepEven();
        Append(t, s, theta);
        return new TimeSeries(_t.ToArray(), _th.ToArray(), _rpm.ToArray(), _v.ToArray(), _tq.ToArray(),
            _cur.Select(c => c.ToArray()).ToArray());
    }
}
