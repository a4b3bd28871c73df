namespace PartForge.Dynamics.Engine;

internal sealed partial class Plant
{
    public void Evaluate(ReadOnlySpan<double> y, Span<double> dydt)
    {
        Solve(y, Mode, Main);
        Derivatives(y, Mode, Main, dydt);
    }

    /// <summary>
    /// The circuits at state y in mode m: EMFs, currents (states, or algebraic where L = 0), the bus (store
    /// terminal) voltage V_bus = V_source - R_series I_bus, port voltages, the star point, torque and powers.
    /// </summary>
    public void Solve(ReadOnlySpan<double> y, Mode m, Solution s)
    {
        _flux.Slopes(WindowTable.Wrap(y[Theta]), s.Slope);
        double w = m.Rotor switch { RotorMode.Stuck => 0, RotorMode.Fixed => FixedOmega, _ => y[Omega] };
        s.Omega = w;
        for (int k = 0; k < N; k++) s.Emf[k] = s.Slope[k] * w;
        double vs = Vc >= 0 ? y[Vc] : _vFixed;
        s.SourceV = vs;

        // Bus current from the current states, and the algebraic circuits' share of V_bus (a scalar equation:
        // V_bus (1 + Rs sum sigma^2/r) = V_source - Rs (I_states + sum sigma (c - e)/r)).
        double iState = 0, a = 0, bs = 0;
        for (int k = 0; k < N; k++)
        {
            int p = m.Path[k];
            if (_open[k] || _alg[k])
            {
                s.Current[k] = 0;
                if (_alg[k] && p != 0)
                {
                    var br = PathOf(k, m);
                    double r = _r[k] + br.Ohm;
                    a += br.Sigma * br.Sigma / r;
                    bs += br.Sigma * (br.OpenV(0) - s.Emf[k]) / r;
                }
                continue;
            }
            double i = y[Idx[k]];
            s.Current[k] = i;
            if (p != 0) iState += PathOf(k, m).Sigma * i;
        }
        double vt = (vs - _rs * (iState + bs)) / (1 + _rs * a);
        double ibus = iState;
        for (int k = 0; k < N; k++)
        {
            if (!_alg[k] || m.Path[k] == 0) continue;
            var br = PathOf(k, m);
            double i = (br.OpenV(vt) - s.Emf[k]) / (_r[k] + br.Ohm);
            s.Current[k] = i;
            ibus += br.Sigma * i;
        }
        s.BusV = vt;
        s.BusI = ibus;

        double torque = 0, pcu = 0, psw = 0, pdi = 0, pl = 0;
        for (int k = 0; k < N; k++)
        {
            double i = s.Current[k];
            torque += i * s.Slope[k];
            pcu += _r[k] * i * i;
            if (m.Path[k] == 0 || _open[k]) { s.PortV[k] = 0; continue; }
            var br = PathOf(k, m);
            s.PortV[k] = br.OpenV(vt) - br.Ohm * i;
            double ai = br.Rho * i; // |i| on the path's own sign, smooth through the located zero
            psw += br.SwitchDropV * ai + br.SwitchOhm * i * i;
            pdi += br.DiodeDropV * ai + br.DiodeOhm * i * i;
            pl += br.LoadOhm * i * i;
        }

        s.StarActive = 0;
        s.StarV = 0;
        if (_legs.Length == 3)
        {
            double su = 0, sw = 0;
            foreach (int x in _legs)
            {
                if (m.Path[x] == 0) continue;
                s.U[x] = s.PortV[x] - _r[x] * s.Current[x] - s.Emf[x];
                su += s.U[x] / _l[x];
                sw += 1 / _l[x];
                s.StarActive++;
            }
            if (s.StarActive >= 2) s.StarV = su / sw;
        }

        s.Torque = torque;
        s.PCopper = pcu;
        s.PSwitch = psw;
        s.PDiode = pdi;
        s.PLoad = pl;
        s.PSource = vs * ibus;
        s.PSeries = _rs * ibus * ibus;
    }

    /// <summary>y' from a solved state: rotor, capacitor, currents and the integrals of the energy account.</summary>
    public void Derivatives(ReadOnlySpan<double> y, Mode m, Solution s, Span<double> dy)
    {
        double w = s.Omega, pf = 0, pv = 0, pin = 0;
        switch (m.Rotor)
        {
            case RotorMode.Fixed:
                dy[Theta] = w;
                dy[Omega] = 0;
                pf = _tf * Math.Abs(w);
                pv = _b * w * w;
                pin = (-s.Torque + _tf * Math.Sign(w) + _b * w) * w;
                break;
            case RotorMode.Stuck:
                dy[Theta] = 0;
                dy[Omega] = 0;
                break;
            case RotorMode.Moving:
                dy[Theta] = w;
                dy[Omega] = (s.Torque - _tf * m.Dir - _b * w) / _j;
                pf = _tf * m.Dir * w;
                pv = _b * w * w;
                break;
            default:
                dy[Theta] = w;
                dy[Omega] = (s.Torque - _b * w) / _j;
                pv = _b * w * w;
                break;
        }
        if (Vc >= 0) dy[Vc] = -s.BusI / _cap;
        for (int k = 0; k < N; k++)
        {
            int ix = Idx[k];
            if (ix < 0) continue;
            if (m.Path[k] == 0) dy[ix] = 0;
            else if (_isLeg[k]) dy[ix] = s.StarActive >= 2 ? (s.U[k] - s.StarV) / _l[k] : 0;
            else dy[ix] = (s.PortV[k] - _r[k] * s.Current[k] - s.Emf[k]) / _l[k];
        }
        dy[Q + QSource] = s.PSource;
        dy[Q + QSeries] = s.PSeries;
        dy[Q + QCopper] = s.PCopper;
        dy[Q + QSwitch] = s.PSwitch;
        dy[Q + QDiode] = s.PDiode;
        dy[Q + QLoad] = s.PLoad;
        dy[Q + QFriction] = pf;
        dy[Q + QViscous] = pv;
        dy[Q + QInput] = pin;
        dy[Q + QImpulse] = s.Torque;
        dy[Q + QCharge] = s.BusI;
    }
}
