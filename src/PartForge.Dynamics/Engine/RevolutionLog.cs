namespace PartForge.Dynamics.Engine;

/// <summary>
/// The times at which the rotor passes whole turns (theta = 2 pi k) in one direction, with the torque impulse
/// there: the basis of cycle means, "steady" and the spin-up times. A change of direction restarts the log.
/// </summary>
internal sealed class RevolutionLog
{
    private readonly List<(double T, long K, double Impulse)> _marks = new();
    private int _dir;
    private bool _fromStart = true;

    public int Count => _marks.Count;

    public void Add(double t, long k, int dir, double impulse)
    {
        if (_marks.Count > 0 && (dir != _dir || k != _marks[^1].K + dir))
        {
            _marks.Clear();
            _fromStart = false;
        }
        _marks.Add((t, k, impulse));
        _dir = dir;
    }

    /// <summary>Signed mean speed (rad/s) and mean torque (N m) over the last n whole revolutions, or null.</summary>
    public (double Omega, double Torque)? CycleMean(int n)
    {
        if (_marks.Count < n + 1) return null;
        int l = _marks.Count - 1;
        double dt = _marks[l].T - _marks[l - n].T;
        return (_dir * 2 * Math.PI * n / dt, (_marks[l].Impulse - _marks[l - n].Impulse) / dt);
    }

    /// <summary>True when the mean speeds over the last n revolutions and the n before differ by at most tol (relative).</summary>
    public bool IsSteady(int n, double tol)
    {
        if (_marks.Count < 2 * n + 1) return false;
        int l = _marks.Count - 1;
        double wa = n / (_marks[l].T - _marks[l - n].T), wb = n / (_marks[l - n].T - _marks[l - 2 * n].T);
        return Math.Abs(wa - wb) <= tol * wa;
    }

    /// <summary>
    /// First time the revolution-mean speed reaches fraction x |steady|: the revolution means are placed at
    /// each revolution's middle time (the part-turn before the first mark included, and the start speed at t = 0,
    /// when the log covers the whole run) and interpolated linearly. Null if never reached.
    /// </summary>
    public double? SpinUp(double fraction, double steadyOmega, double theta0, double omega0)
    {
        var pts = new List<(double T, double W)>();
        if (_fromStart)
        {
            pts.Add((0, Math.Abs(omega0)));
            if (_marks.Count > 0 && _marks[0].T > 0)
                pts.Add((_marks[0].T / 2, Math.Abs(2 * Math.PI * _marks[0].K - theta0) / _marks[0].T));
        }
        for (int j = 1; j < _marks.Count; j++)
            pts.Add(((_marks[j - 1].T + _marks[j].T) / 2, 2 * Math.PI / (_marks[j].T - _marks[j - 1].T)));
        double target = fraction * Math.Abs(steadyOmega);
        for (int j = 0; j < pts.Count; j++)
        {
            if (pts[j].W < target) continue;
            if (j == 0) return pts[0].T;
            var (t0, w0) = pts[j - 1];
            var (t1, w1) = pts[j];
            return t0 + (target - w0) / (w1 - w0) * (t1 - t0);
        }
        return null;
    }
}
