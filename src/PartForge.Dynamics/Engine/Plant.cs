namespace PartForge.Dynamics.Engine;

/// <summary>
/// The compiled machine: state layout, parameters and the equations (Plant.Equations.cs), the event functions
/// and the mode resolution at events (Plant.Resolve.cs). One instance per run; not shared between threads.
/// State: [theta, omega, (capacitor voltage), (currents of the circuits with L > 0), 11 integrals].
/// </summary>
internal sealed partial class Plant : IRightHandSide
{
    public const int Theta = 0, Omega = 1;
    public const int QSource = 0, QSeries = 1, QCopper = 2, QSwitch = 3, QDiode = 4, QLoad = 5, QFriction = 6,
        QViscous = 7, QInput = 8, QImpulse = 9, QCharge = 10, QCount = 11;

    public readonly int N, Vc, Q, Size;
    public readonly int[] Idx;
    public readonly WindowTable Windows;
    public readonly Mode Mode;
    public readonly Solution Main, Aux;
    public readonly double[] Atol;
    public readonly bool[] AbsoluteOnly;

    private readonly double _j, _tf, _b;
    private readonly double[] _r, _l;
    private readonly PortTable[] _ports;
    private readonly bool[] _alg, _open, _isLeg;
    private readonly int[] _legs;
    private readonly FluxTable _flux;
    private readonly double _rs, _cap, _vFixed, _strayF;

    /// <summary>Imposed speed (Fixed rotor mode), rad/s.</summary>
    public double FixedOmega;

    /// <summary>Speed below which a run-down ends, rad/s (0: none).</summary>
    public double StopOmega;

    /// <summary>Capacitor voltage limits that end a run (null: none).</summary>
    public double? CutoffV, TargetV;

    public Plant(MachineSetup m, double rtol, double omegaScale, double voltScale, double quasiStaticRatio)
    {
        N = m.Circuits.Count;
        _j = m.Rotor.InertiaKgM2;
        _tf = m.Rotor.FrictionNm;
        _b = m.Rotor.ViscousNmsPerRad;
        _r = m.Circuits.Select(c => c.ResistanceOhm).ToArray();
        _l = m.Circuits.Select(c => c.InductanceH).ToArray();
        _ports = m.Circuits.Select(c => c.Connection.Table(m.Drive)).ToArray();
        _open = _ports.Select(p => p.IsOpen).ToArray();
        _isLeg = _ports.Select(p => p.IsStarLeg).ToArray();
        _legs = Enumerable.Range(0, N).Where(k => _isLeg[k]).ToArray();
        _flux = new FluxTable(m.Circuits.Select(c => c.Flux).ToArray());
        double tauLimit = quasiStaticRatio * 2 * Math.PI / (Math.Max(1, omegaScale) * Math.Max(1, _flux.MaxOrder));
        _alg = Enumerable.Range(0, N).Select(k => !_open[k] && (_l[k] == 0 || !_isLeg[k] && _l[k] / _r[k] < tauLimit)).ToArray();
        QuasiStatic = Enumerable.Range(0, N).Where(k => _alg[k] && _l[k] > 0).ToArray();
        Windows = new WindowTable(m.Circuits);
        _rs = m.Storage.SeriesOhm;
        _cap = m.Storage.FaradsOrZero;
        _vFixed = m.Storage.InitialV;
        _strayF = m.Drive?.StrayCapacitanceF ?? 100e-12;

        int next = 2;
        Vc = _cap > 0 ? next++ : -1;
        Idx = new int[N];
        for (int k = 0; k < N; k++) Idx[k] = !_open[k] && !_alg[k] ? next++ : -1;
        Q = next;
        Size = Q + QCount;
        Mode = new Mode(N);
        Main = new Solution(N);
        Aux = new Solution(N);

        // Absolute tolerances: the relative tolerance times a scale for each state.
        double vb = Math.Max(1, voltScale);
        double w = Math.Max(1, omegaScale);
        Atol = new double[Size];
        AbsoluteOnly = new bool[Size];
        Atol[Theta] = rtol;
        AbsoluteOnly[Theta] = true; // only the angle within a revolution matters, not how many turns
        Atol[Omega] = rtol * w;
        if (Vc >= 0) Atol[Vc] = rtol * vb;
        // The integrals (energies, torque impulse, charge) are scaled by their rates over a reference time
        // (1 ms, or one period of the highest flux order at the speed scale if shorter), so that their per-step
        // error is small against what they gain in a step, whatever the rotor's inertia.
        double iSum = 0, pScale = 0, tScale = 0;
        for (int k = 0; k < N; k++)
        {
            double slope = m.Circuits[k].Flux.SlopeBoundWbPerRad();
            double ik = (vb + slope * w) / (_r[k] + _ports[k].MinOhm);
            iSum += ik;
            pScale += (vb + slope * w) * ik;
            tScale += slope * ik;
            if (Idx[k] >= 0) Atol[Idx[k]] = rtol * ik;
        }
        pScale += (_tf + _b * w) * w;
        tScale = Math.Max(tScale, _tf + _b * w);
        double tRef = Math.Min(1e-3, 2 * Math.PI / (w * Math.Max(1, _flux.MaxOrder)));
        for (int q = 0; q < QCount; q++) Atol[Q + q] = rtol * Math.Max(pScale * tRef, 1e-15);
        Atol[Q + QImpulse] = rtol * Math.Max(tScale * tRef, 1e-15);
        Atol[Q + QCharge] = rtol * Math.Max(iSum * tRef, 1e-15);
        MaxTau = Enumerable.Range(0, N).Where(k => Idx[k] >= 0).Select(k => _l[k] / _r[k]).DefaultIfEmpty(0).Max();
    }

    /// <summary>Circuits with L > 0 solved as L = 0 (see SimulationOptions.QuasiStaticRatio).</summary>
    public int[] QuasiStatic { get; }

    /// <summary>Highest mechanical order of any flux term.</summary>
    public int MaxOrder => _flux.MaxOrder;

    /// <summary>Longest L/R time constant among the circuits with a current state, s.</summary>
    public double MaxTau { get; }

    public double InertiaKgM2 => _j;

    public double FrictionNm => _tf;

    /// <summary>The store's internal voltage in state y.</summary>
    public double SourceV(ReadOnlySpan<double> y) => Vc >= 0 ? y[Vc] : _vFixed;

    /// <summary>Energy in the inductances, J.</summary>
    public double MagneticEnergy(ReadOnlySpan<double> y)
    {
        double e = 0;
        for (int k = 0; k < N; k++) if (Idx[k] >= 0) e += 0.5 * _l[k] * y[Idx[k]] * y[Idx[k]];
        return e;
    }

    /// <summary>Upper bound of the number of event functions.</summary>
    public int MaxEvents => 2 * N + 16;

    private Branch PathOf(int k, Mode m) => m.Path[k] switch
    {
        1 => _ports[k].Positive(m.Cmd[k])!.Value,
        -1 => _ports[k].Negative(m.Cmd[k])!.Value,
        _ => _ports[k].Load!.Value,
    };
}
