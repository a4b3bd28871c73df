namespace PartForge.Dynamics.Engine;

internal sealed partial class Plant
{
    // Margins: how far a blocked path is from turning on (positive: its current would start to grow).
    // The event functions below are minus these, so "event" always means "a function goes below zero",
    // and Resolve uses the same formulas, so a resolved mode never starts with a function below zero.

    private static double PositiveMargin(Branch b, double vBus, double vOther) => b.OpenV(vBus) - vOther;

    private static double NegativeMargin(Branch b, double vBus, double vOther) => vOther - b.OpenV(vBus);

    /// <summary>
    /// Fills g with every event function of mode m at the solved state (a fixed list for a given mode) and
    /// returns how many: path currents (off when they reach zero), blocked paths' margins (on), the six-step
    /// star's floating legs, the rotor (stop, breakaway) and the scenario's limits.
    /// </summary>
    public int Events(ReadOnlySpan<double> y, Mode m, Solution s, Span<double> g)
    {
        int c = 0;
        for (int k = 0; k < N; k++)
        {
            var t = _ports[k];
            if (_open[k] || _isLeg[k] || t.Load is not null) continue;
            int p = m.Path[k];
            if (p != 0) { g[c++] = p * s.Current[k] + Band(k, m); continue; }
            if (t.Positive(m.Cmd[k]) is { } bp) g[c++] = -PositiveMargin(bp, s.BusV, s.Emf[k]);
            if (t.Negative(m.Cmd[k]) is { } bn) g[c++] = -NegativeMargin(bn, s.BusV, s.Emf[k]);
        }
        if (_legs.Length == 3)
        {
            foreach (int x in _legs)
                if (m.Path[x] != 0) g[c++] = m.Path[x] * s.Current[x] + Band(x, m);
            if (s.StarActive >= 2)
            {
                foreach (int x in _legs)
                {
                    if (m.Path[x] != 0) continue;
                    double vFloat = s.StarV + s.Emf[x];
                    g[c++] = -PositiveMargin(_ports[x].Positive(m.Cmd[x])!.Value, s.BusV, vFloat);
                    g[c++] = -NegativeMargin(_ports[x].Negative(m.Cmd[x])!.Value, s.BusV, vFloat);
                }
            }
            else
            {
                foreach (int x in _legs)
                    foreach (int z in _legs)
                        if (x != z) g[c++] = -PairMargin(x, z, m, s);
            }
        }
        if (m.Rotor == RotorMode.Moving) g[c++] = m.Dir * y[Omega] + (m.FromRest ? Atol[Omega] : 0);
        else if (m.Rotor == RotorMode.Stuck) g[c++] = _tf - Math.Abs(s.Torque);
        if (StopOmega > 0 && m.Rotor is RotorMode.Moving or RotorMode.Free) g[c++] = Math.Abs(y[Omega]) - StopOmega;
        if (Vc >= 0 && CutoffV is double vc) g[c++] = y[Vc] - vc;
        if (Vc >= 0 && TargetV is double vt) g[c++] = vt - y[Vc];
        return c;
    }

    /// <summary>
    /// A path entered at zero current (a turn-on) with a current state ends when its current falls below minus
    /// this band (the current's absolute tolerance), not at the first rounding below zero: right after a turn-on
    /// the true current is far smaller than the integration's error, and without the band the path would turn
    /// off and on again at once. (The rotor's stop after a breakaway has the same band on its speed.) A path
    /// entered with current flowing ends exactly at zero; the current is set to exactly zero either way.
    /// Algebraic currents (L = 0) follow their margin exactly and need no band.
    /// </summary>
    private double Band(int k, Mode m) => Idx[k] >= 0 && m.FromZero[k] ? Atol[Idx[k]] : 0;

    /// <summary>With no star current: how strongly a current would start out of leg x and back through leg z.</summary>
    private double PairMargin(int x, int z, Mode m, Solution s) =>
        (_ports[x].Positive(m.Cmd[x])!.Value.OpenV(s.BusV) - s.Emf[x]) - (_ports[z].Negative(m.Cmd[z])!.Value.OpenV(s.BusV) - s.Emf[z]);

    /// <summary>
    /// Makes mode and state consistent at an event (or the start), with the switch commands already set: a path
    /// current that reached zero is set to exactly zero; a current whose path no longer exists is cut (no
    /// freewheel: its 1/2 L i^2 is returned as turn-off loss, with the kick estimate); blocked paths whose
    /// margin is positive turn on; the star's legs are chosen as the first consistent assignment; the rotor
    /// sticks or breaks away. Returns the cut energy, J, and the largest kick estimate, V (NaN if no cut).
    /// </summary>
    public (double ArcJ, double KickV) Resolve(double[] y)
    {
        var m = Mode;
        Span<int> before = stackalloc int[N];
        m.Path.AsSpan().CopyTo(before);
        bool decideRotor = false;
        if (m.Rotor == RotorMode.Moving && m.Dir * y[Omega] <= 0) { y[Omega] = 0; decideRotor = true; }
        else if (m.Rotor == RotorMode.Stuck) decideRotor = true;

        double arc = 0, cutMax = 0;
        int cutK = -1;
        for (int k = 0; k < N; k++)
        {
            var t = _ports[k];
            if (_open[k]) { m.Path[k] = 0; continue; }
            if (t.Load is not null) { m.Path[k] = 2; continue; }
            if (_alg[k])
            {
                // No inductance: a path the new command removed just ends (no stored energy to cut).
                if (m.Path[k] == 1 && t.Positive(m.Cmd[k]) is null || m.Path[k] == -1 && t.Negative(m.Cmd[k]) is null) m.Path[k] = 0;
                continue;
            }
            int ix = Idx[k];
            double i = y[ix];
            if (m.Path[k] != 0 && m.Path[k] * i <= 0) { i = 0; y[ix] = 0; }
            if (_isLeg[k]) { m.Path[k] = Math.Sign(i); continue; }
            int want = Math.Sign(i);
            bool exists = want > 0 ? t.Positive(m.Cmd[k]) is not null : want < 0 && t.Negative(m.Cmd[k]) is not null;
            if (want != 0 && !exists)
            {
                arc += 0.5 * _l[k] * i * i;
                double kick = Math.Abs(i) * Math.Sqrt(_l[k] / _strayF);
                if (kick > cutMax) { cutMax = kick; cutK = k; }
                y[ix] = 0;
                want = 0;
            }
            m.Path[k] = want;
        }
        if (_legs.Length == 3) BalanceStar(y);

        // Algebraic circuits: flip one inconsistent path at a time until none is (they share V_bus).
        for (int it = 0; it < 4 * N + 8; it++)
        {
            Solve(y, m, Aux);
            bool changed = false;
            for (int k = 0; k < N && !changed; k++)
            {
                if (!_alg[k] || _ports[k].Load is not null) continue;
                int p = m.Path[k];
                if (p != 0)
                {
                    if (p * Aux.Current[k] <= 0) { m.Path[k] = 0; changed = true; }
                }
                else
                {
                    int on = TurnOn(k, m, Aux);
                    if (on != 0) { m.Path[k] = on; changed = true; }
                }
            }
            if (!changed) break;
        }

        // Circuits with L > 0 at zero current: their turn-on does not move V_bus at this instant.
        Solve(y, m, Aux);
        for (int k = 0; k < N; k++)
        {
            if (_open[k] || _alg[k] || _isLeg[k] || _ports[k].Load is not null || m.Path[k] != 0) continue;
            m.Path[k] = TurnOn(k, m, Aux);
        }
        if (_legs.Length == 3) ResolveStar(m);

        if (decideRotor)
        {
            Solve(y, m, Aux);
            if (Math.Abs(Aux.Torque) <= _tf) { m.Rotor = RotorMode.Stuck; y[Omega] = 0; }
            else { m.Rotor = RotorMode.Moving; m.Dir = Math.Sign(Aux.Torque); m.FromRest = true; }
        }
        // A conducting path at exactly zero current is starting from zero (a turn-on, also straight after a
        // zero crossing); one that changed with current flowing was entered with current; otherwise unchanged.
        for (int k = 0; k < N; k++)
        {
            if (m.Path[k] == 0 || Idx[k] < 0) m.FromZero[k] = false;
            else if (y[Idx[k]] == 0) m.FromZero[k] = true;
            else if (m.Path[k] != before[k]) m.FromZero[k] = false;
        }
        double kickV = double.NaN;
        if (cutK >= 0)
        {
            Solve(y, m, Aux);
            kickV = Math.Abs(Aux.BusV) + cutMax;
        }
        return (arc, kickV);
    }

    private int TurnOn(int k, Mode m, Solution s)
    {
        var t = _ports[k];
        if (t.Positive(m.Cmd[k]) is { } bp && PositiveMargin(bp, s.BusV, s.Emf[k]) > 0) return 1;
        if (t.Negative(m.Cmd[k]) is { } bn && NegativeMargin(bn, s.BusV, s.Emf[k]) > 0) return -1;
        return 0;
    }

    /// <summary>Keeps the star's currents summing to exactly zero after a leg was set to zero.</summary>
    private void BalanceStar(double[] y)
    {
        int count = 0, big = -1;
        double sum = 0;
        foreach (int x in _legs)
        {
            double i = y[Idx[x]];
            if (i == 0) continue;
            count++;
            sum += i;
            if (big < 0 || Math.Abs(i) > Math.Abs(y[Idx[big]])) big = x;
        }
        if (count == 1)
        {
            y[Idx[big]] = 0;
            Mode.Path[big] = 0;
        }
        else if (count >= 2) y[Idx[big]] -= sum;
    }

    /// <summary>
    /// Chooses the paths of the star legs at zero current: every assignment (off, positive, negative) of those
    /// legs, fewest new conducting legs first, is tested for consistency (new legs' currents grow on their own
    /// sign, floating legs' margins are not positive, never exactly one conducting leg); the first one wins.
    /// </summary>
    private void ResolveStar(Mode m)
    {
        var s = Aux;
        Span<int> zero = stackalloc int[3];
        int z = 0;
        foreach (int x in _legs) if (m.Path[x] == 0) zero[z++] = x;
        if (z == 0) return;
        int combos = z == 1 ? 3 : z == 2 ? 9 : 27;
        Span<int> pick = stackalloc int[3];
        for (int newCount = 0; newCount <= z; newCount++)
            for (int code = 0; code < combos; code++)
            {
                int c = code, nn = 0;
                for (int q = 0; q < z; q++) { pick[q] = (c % 3) switch { 0 => 0, 1 => 1, _ => -1 }; c /= 3; if (pick[q] != 0) nn++; }
                if (nn != newCount) continue;
                for (int q = 0; q < z; q++) m.Path[zero[q]] = pick[q];
                if (StarConsistent(m, s, zero[..z])) return;
            }
        for (int q = 0; q < z; q++) m.Path[zero[q]] = 0;
    }

    private bool StarConsistent(Mode m, Solution s, ReadOnlySpan<int> zero)
    {
        int active = 0;
        double su = 0, sw = 0;
        Span<double> u = stackalloc double[3];
        for (int q = 0; q < 3; q++)
        {
            int x = _legs[q];
            if (m.Path[x] == 0) continue;
            var br = PathOf(x, m);
            double i = s.Current[x];
            u[q] = br.OpenV(s.BusV) - br.Ohm * i - _r[x] * i - s.Emf[x];
            su += u[q] / _l[x];
            sw += 1 / _l[x];
            active++;
        }
        if (active == 1) return false;
        if (active == 0)
        {
            foreach (int x in _legs)
                foreach (int w in _legs)
                    if (x != w && PairMargin(x, w, m, s) > 0) return false;
            return true;
        }
        double vn = su / sw;
        for (int q = 0; q < 3; q++)
        {
            int x = _legs[q];
            if (!zero.Contains(x)) continue;
            if (m.Path[x] != 0)
            {
                if (m.Path[x] * (u[q] - vn) <= 0) return false;
            }
            else
            {
                double vFloat = vn + s.Emf[x];
                if (PositiveMargin(_ports[x].Positive(m.Cmd[x])!.Value, s.BusV, vFloat) > 0) return false;
                if (NegativeMargin(_ports[x].Negative(m.Cmd[x])!.Value, s.BusV, vFloat) > 0) return false;
            }
        }
        return true;
    }
}
