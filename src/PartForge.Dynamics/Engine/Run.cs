using System.Globalization;

namespace PartForge.Dynamics.Engine;

/// <summary>
/// One simulation: the Dormand-Prince steps, the location of every event on the continuous extension (the step
/// is cut at the earliest one and restarted from there, never stepped across), the mode changes, the trace, the
/// revolution log, the end conditions and the result.
/// </summary>
internal sealed class Run
{
    private const int Samples = 2; // sub-intervals per step in which the event functions are checked

    private readonly MachineSetup _setup;
    private readonly Scenario _scenario;
    private readonly SimulationOptions _o;
    private readonly IProgress<double>? _progress;
    private readonly CancellationToken _ct;
    private readonly Plant _p;
    private readonly DormandPrince _dp;
    private readonly double _rtol, _omega0, _theta0, _timeLimit, _stallS;
    private readonly double[] _y, _yTmp, _yMid, _yEv;
    private readonly double[] _gA, _gB, _gM, _gT;
    private int _nA;
    private readonly RevolutionLog _revs = new();
    private readonly SeriesRecorder _series;
    private readonly Mode _before;

    private double _t, _arcJ, _kickV = double.NaN, _stuckSince = double.NaN, _lastEventT = double.NaN, _lastProgress = -1;
    private long _accepted, _rejected, _events, _sameTime;
    private double? _steadyOmega, _runTime, _timeToV;

    private Run(MachineSetup setup, Scenario scenario, SimulationOptions o, IProgress<double>? progress, CancellationToken ct)
    {
        _setup = setup;
        _scenario = scenario;
        _o = o;
        _progress = progress;
        _ct = ct;
        _rtol = o.RelativeTolerance;
        _timeLimit = scenario.TimeLimitS;
        double rpm0 = scenario switch
        {
            StartScenario s => s.InitialRpm,
            RunDownScenario r => r.InitialRpm,
            ChargeScenario c => c.DrivenRpm,
            _ => 0,
        };
        _omega0 = rpm0 * Math.PI / 30;
        _theta0 = WindowTable.Rad(setup.InitialAngleDeg);
        double target = scenario is ChargeScenario { TargetV: double tv } ? tv : 0;
        double vScale = Math.Max(Math.Abs(setup.Storage.InitialV), Math.Abs(target));
        double slope = setup.Circuits.Select(c => c.Flux.SlopeBoundWbPerRad()).DefaultIfEmpty(0).Max();
        double wScale = Math.Abs(_omega0);
        if (slope > 0) wScale = Math.Max(wScale, Math.Min(Math.Max(vScale, 1) / slope, 1e5));
        _p = new Plant(setup, _rtol, wScale, vScale, o.QuasiStaticRatio);
        _dp = new DormandPrince(_p.Size);
        _y = new double[_p.Size];
        _yTmp = new double[_p.Size];
        _yMid = new double[_p.Size];
        _yEv = new double[_p.Size];
        _gA = new double[_p.MaxEvents];
        _gB = new double[_p.MaxEvents];
        _gM = new double[_p.MaxEvents];
        _gT = new double[_p.MaxEvents];
        _series = new SeriesRecorder(o.SeriesMaxPoints, _timeLimit, _p.N);
        _before = new Mode(_p.N);
        _stallS = 20 * _p.MaxTau;
    }

    public static SimulationResult Execute(MachineSetup setup, Scenario scenario, SimulationOptions o, IProgress<double>? progress, CancellationToken ct) =>
        new Run(setup, scenario, o, progress, ct).Go();

    private SimulationResult Go()
    {
        var p = _p;
        var m = p.Mode;
        _y[Plant.Theta] = _theta0;
        _y[Plant.Omega] = _omega0;
        if (p.Vc >= 0) _y[p.Vc] = _setup.Storage.InitialV;
        if (_scenario is ChargeScenario)
        {
            m.Rotor = RotorMode.Fixed;
            p.FixedOmega = _omega0;
        }
        else if (p.FrictionNm == 0) m.Rotor = RotorMode.Free;
        else if (_omega0 != 0) { m.Rotor = RotorMode.Moving; m.Dir = Math.Sign(_omega0); }
        else m.Rotor = RotorMode.Stuck;
        if (_scenario is RunDownScenario rd)
        {
            p.StopOmega = rd.StopRpm * Math.PI / 30;
            p.CutoffV = rd.CutoffV;
        }
        if (_scenario is ChargeScenario cs) p.TargetV = cs.TargetV;
        double phi0 = WindowTable.Wrap(_theta0);
        for (int k = 0; k < p.N; k++) m.Cmd[k] = p.Windows.Command(k, phi0);
        p.Resolve(_y);
        TrackStuck();

        p.Solve(_y, m, p.Aux);
        _series.Add(0, p.Aux, _y[Plant.Theta]);
        _dp.SetDerivative(p, _y);
        _nA = EventsAt(_y, _gA);
        double h = InitialStep();
        bool lastRejected = false;
        var outcome = EndCheck();
        string? failure = null;

        while (outcome is null)
        {
            if (_ct.IsCancellationRequested) { outcome = SimulationOutcome.Cancelled; break; }
            if (_accepted + _rejected >= _o.MaxSteps) { outcome = SimulationOutcome.StepLimit; break; }
            double tEnd = _timeLimit;
            if (m.Rotor == RotorMode.Stuck && _scenario is not ChargeScenario) tEnd = Math.Min(tEnd, _stuckSince + _stallS);
            h = Math.Min(h, MaxStep());
            bool landing = _t + h >= tEnd;
            if (landing) h = tEnd - _t;
            if (!(h > 1e-15 * Math.Max(1, _t)))
            {
                if (landing) { _t = tEnd; outcome = EndCheck(); if (outcome is not null) break; }
                failure = string.Create(CultureInfo.InvariantCulture, $"step size underflow at t = {_t:G9} s");
                outcome = SimulationOutcome.NumericalFailure;
                break;
            }

            double err = _dp.Attempt(p, _y, h, p.Atol, _rtol, p.AbsoluteOnly);
            if (!(err <= 1))
            {
                _rejected++;
                h *= _dp.Factor(err, false);
                lastRejected = true;
                continue;
            }
            double hNext = h * _dp.Factor(err, true);
            if (lastRejected) hNext = Math.Min(hNext, h);
            lastRejected = false;
            _dp.PrepareDense(_y, h);
            int nB = p.Events(_dp.YNew, m, p.Main, _gB);
            _dp.Dense(0.5, _yMid);
            p.Solve(_yMid, m, p.Aux);
            p.Events(_yMid, m, p.Aux, _gM);
            if (nB != _nA)
            {
                failure = "event list changed within a mode";
                outcome = SimulationOutcome.NumericalFailure;
                break;
            }

            var ev = FindEvent(h);
            _accepted++;
            if (ev is null)
            {
                Record(_t, h, 1);
                _t = landing ? tEnd : _t + h;
                _dp.Accept(_y);
                Array.Copy(_gB, _gA, _nA);
                h = hNext;
            }
            else
            {
                var (s, edge, dir, edgeAt) = ev.Value;
                double tEv = _t + s * h;
                _dp.Dense(s, _yEv);
                Record(_t, h, s);
                if (tEv - _lastEventT <= 1e-12 * Math.Max(1, tEv))
                {
                    if (++_sameTime > 2000)
                    {
                        failure = string.Create(CultureInfo.InvariantCulture, $"events do not advance at t = {tEv:G9} s");
                        outcome = SimulationOutcome.NumericalFailure;
                        break;
                    }
                }
                else _sameTime = 0;
                _lastEventT = tEv;
                _t = tEv;
                Array.Copy(_yEv, _y, _y.Length);
                _events++;
                _before.CopyFrom(m);
                if (edge >= 0)
                {
                    double side = p.Windows.SideOf(edge, dir);
                    for (int k = 0; k < p.N; k++) m.Cmd[k] = p.Windows.Command(k, side);
                    if (edge == 0) _revs.Add(_t, (long)Math.Round(edgeAt / (2 * Math.PI)), dir, _y[p.Q + Plant.QImpulse]);
                }
                var (arc, kick) = p.Resolve(_y);
                _arcJ += arc;
                if (!double.IsNaN(kick)) _kickV = double.IsNaN(_kickV) ? kick : Math.Max(_kickV, kick);
                TrackStuck();
                _dp.SetDerivative(p, _y);
                _nA = EventsAt(_y, _gA);
                h = m.SameAs(_before) && arc == 0 ? hNext : Math.Min(hNext, InitialStep());
                if (edge == 0 && _scenario is StartScenario { StopWhenSteady: true } && _revs.IsSteady(_o.SteadyRevolutions, _o.SteadyTolerance))
                {
                    _steadyOmega = _revs.CycleMean(_o.SteadyRevolutions)!.Value.Omega;
                    outcome = SimulationOutcome.SteadySpeed;
                    break;
                }
            }
            outcome = EndCheck();
            Report();
        }

        return Result(outcome!.Value, failure);
    }

    /// <summary>End conditions that hold at the current state (scenario limits, stall, time limit).</summary>
    private SimulationOutcome? EndCheck()
    {
        var p = _p;
        var m = p.Mode;
        if (_scenario is RunDownScenario)
        {
            if (p.StopOmega > 0 && m.Rotor is RotorMode.Moving or RotorMode.Free && Math.Abs(_y[Plant.Omega]) < p.StopOmega)
            {
                _runTime = _t;
                return SimulationOutcome.RotorStopped;
            }
            if (p.CutoffV is double vc && _y[p.Vc] < vc) return SimulationOutcome.StoreExhausted;
        }
        if (p.TargetV is double vt && _y[p.Vc] > vt)
        {
            _timeToV = _t;
            return SimulationOutcome.VoltageReached;
        }
        if (m.Rotor == RotorMode.Stuck && _scenario is not ChargeScenario && _t >= _stuckSince + _stallS)
        {
            if (_scenario is RunDownScenario)
            {
                _runTime = _stuckSince;
                return SimulationOutcome.RotorStopped;
            }
            return SimulationOutcome.Stalled;
        }
        return _t >= _timeLimit ? SimulationOutcome.TimeLimit : null;
    }

    private void TrackStuck()
    {
        if (_p.Mode.Rotor != RotorMode.Stuck) _stuckSince = double.NaN;
        else if (double.IsNaN(_stuckSince)) _stuckSince = _t;
    }

    private int EventsAt(double[] y, double[] g)
    {
        _p.Solve(y, _p.Mode, _p.Aux);
        return _p.Events(y, _p.Mode, _p.Aux, g);
    }

    /// <summary>
    /// The earliest event in the accepted step: the event functions at the start, middle and end, and the window
    /// edges between the angles there; each crossing is refined on the continuous extension. Returns the step
    /// fraction (on the far side of the crossing), the edge index (-1 for a function) and direction.
    /// </summary>
    private (double S, int Edge, int Dir, double EdgeAt)? FindEvent(double h)
    {
        var p = _p;
        ReadOnlySpan<double> sPts = [0, 0.5, 1];
        double th0 = _y[Plant.Theta], thM = _yMid[Plant.Theta], th1 = _dp.YNew[Plant.Theta];
        for (int sub = 0; sub < Samples; sub++)
        {
            double sa = sPts[sub], sb = sPts[sub + 1];
            double[] ga = sub == 0 ? _gA : _gM, gb = sub == 0 ? _gM : _gB;
            double tha = sub == 0 ? th0 : thM, thb = sub == 0 ? thM : th1;
            double best = double.PositiveInfinity;
            int bestEdge = -1, bestDir = 0;
            double bestAt = 0;
            for (int j = 0; j < _nA; j++)
            {
                if (!(ga[j] >= 0)) continue;
                double a = sa, fa = ga[j], b = sb, fb = gb[j];
                if (!(fb < 0))
                {
                    // No sign change at the samples: look for a dip between them (a diode's margin that peaks
                    // just above zero for a moment, a current that touches zero and recovers).
                    var dip = Dip(j, sub);
                    if (dip is null) continue;
                    (a, fa, b, fb) = dip.Value;
                }
                int jj = j;
                double s = RootFinder.Locate(x => EventValue(jj, x), false, a, fa, b, fb);
                if (s < best) { best = s; bestEdge = -1; }
            }
            int dir = Math.Sign(thb - tha);
            if (dir != 0)
            {
                var (e, je) = p.Windows.Next(tha, dir);
                bool crossed = dir > 0 ? e <= thb : e > thb;
                if (crossed)
                {
                    double fa = dir * (e - tha), fb = dir * (e - thb);
                    double s = RootFinder.Locate(x => dir * (e - _dp.Dense(Plant.Theta, x)), dir > 0, sa, fa, sb, fb);
                    if (s < best) { best = s; bestEdge = je; bestDir = dir; bestAt = e; }
                }
            }
            if (best < double.PositiveInfinity) return (best, bestEdge, bestDir, bestAt);
        }
        return null;
    }

    /// <summary>
    /// Dip search for function j in sub-interval sub: the parabola through its three samples (start, middle and
    /// end of the step) is convex with its vertex inside this sub-interval and dips below half the smallest
    /// sample; then a golden-section search for the minimum on the sub-interval stops at the first negative
    /// value. Returns a bracket (a with g at or above zero, b with g below zero) or null.
    /// </summary>
    private (double A, double Ga, double B, double Gb)? Dip(int j, int sub)
    {
        double g0 = _gA[j], gm = _gM[j], g1 = _gB[j];
        double c2 = 2 * (g0 - 2 * gm + g1); // p(s) = g0 + c1 s + c2 s^2 through s = 0, 0.5, 1
        if (!(c2 > 0)) return null;
        double c1 = 4 * gm - 3 * g0 - g1;
        double sv = -c1 / (2 * c2);
        double lo = sub * 0.5, hi = lo + 0.5;
        if (!(sv > lo && sv < hi)) return null;
        double pv = g0 + c1 * sv + c2 * sv * sv;
        if (!(pv < 0.5 * Math.Min(g0, Math.Min(gm, g1)))) return null;
        double a = lo, fa = sub == 0 ? g0 : gm, b = hi;
        const double phi = 0.6180339887498949;
        double x1 = b - phi * (b - a), x2 = a + phi * (b - a);
        double f1 = EventValue(j, x1), f2 = EventValue(j, x2);
        for (int it = 0; it < 40; it++)
        {
            if (f1 < 0) return (a, fa, x1, f1);
            if (f2 < 0) return (x1, f1, x2, f2);
            if (b - a < 1e-9) break;
            if (f1 < f2)
            {
                b = x2; x2 = x1; f2 = f1;
                x1 = b - phi * (b - a);
                f1 = EventValue(j, x1);
            }
            else
            {
                a = x1; fa = f1; x1 = x2; f1 = f2;
                x2 = a + phi * (b - a);
                f2 = EventValue(j, x2);
            }
        }
        return null;
    }

    private double EventValue(int j, double s)
    {
        _dp.Dense(s, _yTmp);
        _p.Solve(_yTmp, _p.Mode, _p.Aux);
        _p.Events(_yTmp, _p.Mode, _p.Aux, _gT);
        return _gT[j];
    }

    /// <summary>Grid samples of the trace inside the step from _t over fraction sEnd of step h.</summary>
    private void Record(double t0, double h, double sEnd)
    {
        double t1 = t0 + sEnd * h;
        while (_series.NextTime <= t1)
        {
            double tt = _series.NextTime;
            double s = Math.Clamp((tt - t0) / h, 0, 1);
            _dp.Dense(s, _yTmp);
            _p.Solve(_yTmp, _p.Mode, _p.Aux);
            _series.Add(tt, _p.Aux, _yTmp[Plant.Theta]);
        }
    }

    /// <summary>The largest step: a tenth of the time limit, and (moving) 1/8 of a period of the highest flux order,
    /// so that the sampled event functions cannot step over a whole EMF wave.</summary>
    private double MaxStep()
    {
        double hm = _timeLimit / 10;
        double w = _p.Mode.Rotor switch { RotorMode.Stuck => 0, RotorMode.Fixed => _p.FixedOmega, _ => _y[Plant.Omega] };
        if (w != 0) hm = Math.Min(hm, 2 * Math.PI / (8.0 * Math.Max(1, _p.MaxOrder) * Math.Abs(w)));
        return hm;
    }

    /// <summary>Starting step size after Hairer, Norsett and Wanner (Solving ODEs I, II.4, "starting step size").</summary>
    private double InitialStep()
    {
        var p = _p;
        int n = p.Size;
        double hmax = MaxStep();
        double[] f0 = _dp.K1;
        double d0 = 0, d1 = 0;
        for (int i = 0; i < n; i++)
        {
            double sk = p.AbsoluteOnly[i] ? p.Atol[i] : p.Atol[i] + _rtol * Math.Abs(_y[i]);
            if (!p.AbsoluteOnly[i]) d0 += _y[i] / sk * (_y[i] / sk);
            d1 += f0[i] / sk * (f0[i] / sk);
        }
        d0 = Math.Sqrt(d0 / n);
        d1 = Math.Sqrt(d1 / n);
        double h0 = d0 < 1e-5 || d1 < 1e-5 ? 1e-6 : 0.01 * d0 / d1;
        h0 = Math.Min(h0, hmax);
        for (int i = 0; i < n; i++) _yTmp[i] = _y[i] + h0 * f0[i];
        var f1 = new double[n];
        p.Evaluate(_yTmp, f1);
        double d2 = 0;
        for (int i = 0; i < n; i++)
        {
            double sk = p.AbsoluteOnly[i] ? p.Atol[i] : p.Atol[i] + _rtol * Math.Abs(_y[i]);
            double q = (f1[i] - f0[i]) / sk;
            d2 += q * q;
        }
        d2 = Math.Sqrt(d2 / n) / h0;
        double dm = Math.Max(d1, d2);
        double h1 = dm <= 1e-15 ? Math.Max(1e-6, h0 * 1e-3) : Math.Pow(0.01 / dm, 0.2);
        return Math.Min(Math.Min(100 * h0, h1), hmax);
    }

    private void Report()
    {
        if (_progress is null) return;
        double f = _t / _timeLimit;
        if (_p.TargetV is double vt && _p.Vc >= 0)
        {
            double v0 = _setup.Storage.InitialV;
            if (vt > v0) f = Math.Max(f, (_y[_p.Vc] - v0) / (vt - v0));
        }
        f = Math.Clamp(f, 0, 1);
        if (f >= _lastProgress + 0.01)
        {
            _lastProgress = f;
            _progress.Report(f);
        }
    }

    private SimulationResult Result(SimulationOutcome outcome, string? failure)
    {
        var p = _p;
        var m = p.Mode;
        p.Solve(_y, m, p.Aux);
        var series = _series.Finish(_t, p.Aux, _y[Plant.Theta]);
        double wEnd = p.Aux.Omega;
        int n = _o.SteadyRevolutions;
        if (_steadyOmega is null && _scenario is StartScenario && _revs.IsSteady(n, _o.SteadyTolerance))
            _steadyOmega = _revs.CycleMean(n)!.Value.Omega;
        var cycle = _revs.CycleMean(n);
        double q(int i) => _y[p.Q + i];
        double keStart = m.Rotor == RotorMode.Fixed ? 0 : 0.5 * p.InertiaKgM2 * _omega0 * _omega0;
        double keEnd = m.Rotor == RotorMode.Fixed ? 0 : 0.5 * p.InertiaKgM2 * wEnd * wEnd;
        var energy = new EnergyAccount
        {
            StoreDeliveredJ = q(Plant.QSource),
            MechanicalInputJ = q(Plant.QInput),
            KineticChangeJ = keEnd - keStart,
            MagneticChangeJ = p.MagneticEnergy(_y),
            CopperLossJ = q(Plant.QCopper),
            SwitchConductionLossJ = q(Plant.QSwitch),
            SwitchTurnOffLossJ = _arcJ,
            DiodeLossJ = q(Plant.QDiode),
            StoreResistanceLossJ = q(Plant.QSeries),
            LoadJ = q(Plant.QLoad),
            FrictionLossJ = q(Plant.QFriction),
            ViscousLossJ = q(Plant.QViscous),
        };
        _progress?.Report(1.0);
        return new SimulationResult
        {
            Outcome = outcome,
            Problems = failure is null ? [] : [failure],
            EndTimeS = _t,
            FinalRpm = wEnd * 30 / Math.PI,
            FinalStoreV = p.Aux.SourceV,
            SteadyRpm = _steadyOmega * 30 / Math.PI,
            SpinUp90S = _steadyOmega is double ws ? _revs.SpinUp(0.9, ws, _theta0, _omega0) : null,
            SpinUp99S = _steadyOmega is double ws2 ? _revs.SpinUp(0.99, ws2, _theta0, _omega0) : null,
            CycleMeanRpm = cycle?.Omega * 30 / Math.PI,
            CycleMeanTorqueNm = cycle?.Torque,
            RunTimeS = _runTime,
            TimeToVoltageS = _timeToV,
            StoreChargeDrawnC = q(Plant.QCharge),
            PeakTurnOffKickV = double.IsNaN(_kickV) ? null : _kickV,
            Energy = energy,
            Series = series,
            AcceptedSteps = _accepted,
            RejectedSteps = _rejected,
            Events = _events,
            QuasiStaticCircuits = p.QuasiStatic,
        };
    }
}
