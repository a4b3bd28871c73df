namespace PartForge.Dynamics.Engine;

/// <summary>
/// The Dormand-Prince 5(4) embedded Runge-Kutta pair (7 stages, first same as last) with its 4th-order
/// continuous extension and a PI step-size controller, after Hairer, Norsett and Wanner, "Solving Ordinary
/// Differential Equations I" (2nd ed.), section II.4-II.6. One instance holds the work arrays for one system size.
/// </summary>
internal sealed class DormandPrince
{
    // Nodes and coefficients (Dormand and Prince 1980).
    public const double C2 = 1.0 / 5, C3 = 3.0 / 10, C4 = 4.0 / 5, C5 = 8.0 / 9;
    public const double A21 = 1.0 / 5;
    public const double A31 = 3.0 / 40, A32 = 9.0 / 40;
    public const double A41 = 44.0 / 45, A42 = -56.0 / 15, A43 = 32.0 / 9;
    public const double A51 = 19372.0 / 6561, A52 = -25360.0 / 2187, A53 = 64448.0 / 6561, A54 = -212.0 / 729;
    public const double A61 = 9017.0 / 3168, A62 = -355.0 / 33, A63 = 46732.0 / 5247, A64 = 49.0 / 176, A65 = -5103.0 / 18656;
    public const double A71 = 35.0 / 384, A73 = 500.0 / 1113, A74 = 125.0 / 192, A75 = -2187.0 / 6784, A76 = 11.0 / 84;
    // Error coefficients: 5th-order weights minus 4th-order weights.
    public const double E1 = 71.0 / 57600, E3 = -71.0 / 16695, E4 = 71.0 / 1920, E5 = -17253.0 / 339200, E6 = 22.0 / 525, E7 = -1.0 / 40;
    // Dense output (Hairer's continuous extension of order 4).
    public const double D1 = -12715105075.0 / 11282082432, D3 = 87487479700.0 / 32700410799, D4 = -10690763975.0 / 1880347072,
        D5 = 701980252875.0 / 199316789632, D6 = -1453857185.0 / 822651844, D7 = 69997945.0 / 29380423;

    private readonly int _n;
    private double[] _k1, _k7;
    private readonly double[] _k2, _k3, _k4, _k5, _k6, _tmp, _ynew, _err;
    private readonly double[] _r1, _r2, _r3, _r4, _r5;
    private double _hDense;
    private double _errOld = 1e-4;

    public DormandPrince(int n)
    {
        _n = n;
        _k1 = new double[n]; _k2 = new double[n]; _k3 = new double[n]; _k4 = new double[n];
        _k5 = new double[n]; _k6 = new double[n]; _k7 = new double[n];
        _tmp = new double[n]; _ynew = new double[n]; _err = new double[n];
        _r1 = new double[n]; _r2 = new double[n]; _r3 = new double[n]; _r4 = new double[n]; _r5 = new double[n];
    }

    /// <summary>f at the current state (set by <see cref="SetDerivative"/> or carried over by <see cref="Accept"/>).</summary>
    public double[] K1 => _k1;

    /// <summary>The proposed state of the last attempt.</summary>
    public double[] YNew => _ynew;

    /// <summary>Right-hand-side evaluations so far.</summary>
    public long Evaluations { get; private set; }

    /// <summary>Evaluates f at y into K1 (after a start or an event).</summary>
    public void SetDerivative(IRightHandSide f, double[] y)
    {
        f.Evaluate(y, _k1);
        Evaluations++;
    }

    /// <summary>
    /// One attempt of size h from y (f(y) in K1). Returns the scaled RMS error estimate: each component's local
    /// error over atol_i + rtol max(|y_i|, |ynew_i|), or over atol_i alone where absoluteOnly[i].
    /// </summary>
    public double Attempt(IRightHandSide f, double[] y, double h, double[] atol, double rtol, bool[] absoluteOnly)
    {
        int n = _n;
        for (int i = 0; i < n; i++) _tmp[i] = y[i] + h * A21 * _k1[i];
        f.Evaluate(_tmp, _k2);
        for (int i = 0; i < n; i++) _tmp[i] = y[i] + h * (A31 * _k1[i] + A32 * _k2[i]);
        f.Evaluate(_tmp, _k3);
        for (int i = 0; i < n; i++) _tmp[i] = y[i] + h * (A41 * _k1[i] + A42 * _k2[i] + A43 * _k3[i]);
        f.Evaluate(_tmp, _k4);
        for (int i = 0; i < n; i++) _tmp[i] = y[i] + h * (A51 * _k1[i] + A52 * _k2[i] + A53 * _k3[i] + A54 * _k4[i]);
        f.Evaluate(_tmp, _k5);
        for (int i = 0; i < n; i++) _tmp[i] = y[i] + h * (A61 * _k1[i] + A62 * _k2[i] + A63 * _k3[i] + A64 * _k4[i] + A65 * _k5[i]);
        f.Evaluate(_tmp, _k6);
        for (int i = 0; i < n; i++) _ynew[i] = y[i] + h * (A71 * _k1[i] + A73 * _k3[i] + A74 * _k4[i] + A75 * _k5[i] + A76 * _k6[i]);
        f.Evaluate(_ynew, _k7);
        Evaluations += 6;
        double sum = 0;
        for (int i = 0; i < n; i++)
        {
            double e = h * (E1 * _k1[i] + E3 * _k3[i] + E4 * _k4[i] + E5 * _k5[i] + E6 * _k6[i] + E7 * _k7[i]);
            double sc = absoluteOnly[i] ? atol[i] : atol[i] + rtol * Math.Max(Math.Abs(y[i]), Math.Abs(_ynew[i]));
            double q = e / sc;
            sum += q * q;
        }
        double err = Math.Sqrt(sum / n);
        return double.IsFinite(err) ? err : double.PositiveInfinity;
    }

    /// <summary>
    /// The step-size factor after an attempt with scaled error err (PI control, beta 0.04, safety 0.9, factor
    /// limited to [0.2, 10]; after a rejection never more than 1).
    /// </summary>
    public double Factor(double err, bool accepted)
    {
        const double beta = 0.04, safety = 0.9, expo = 0.2 - beta * 0.75;
        if (!double.IsFinite(err)) return 0.1;
        if (accepted)
        {
            double fac = Math.Pow(Math.Max(err, 1e-10), expo) / Math.Pow(_errOld, beta);
            fac = Math.Clamp(fac / safety, 0.1, 5.0);
            _errOld = Math.Max(err, 1e-4);
            return 1.0 / fac;
        }
        return 1.0 / Math.Min(5.0, Math.Pow(err, expo) / safety);
    }

    /// <summary>Builds the continuous extension of the attempt just made (y to YNew over h).</summary>
    public void PrepareDense(double[] y, double h)
    {
        for (int i = 0; i < _n; i++)
        {
            double ydiff = _ynew[i] - y[i];
            double bspl = h * _k1[i] - ydiff;
            _r1[i] = y[i];
            _r2[i] = ydiff;
            _r3[i] = bspl;
            _r4[i] = ydiff - h * _k7[i] - bspl;
            _r5[i] = h * (D1 * _k1[i] + D3 * _k3[i] + D4 * _k4[i] + D5 * _k5[i] + D6 * _k6[i] + D7 * _k7[i]);
        }
        _hDense = h;
    }

    /// <summary>Step size of the prepared continuous extension.</summary>
    public double DenseStep => _hDense;

    /// <summary>Component i of the continuous extension at fraction s in [0, 1] of the step.</summary>
    public double Dense(int i, double s)
    {
        double s1 = 1 - s;
        return _r1[i] + s * (_r2[i] + s1 * (_r3[i] + s * (_r4[i] + s1 * _r5[i])));
    }

    /// <summary>The whole state of the continuous extension at fraction s.</summary>
    public void Dense(double s, double[] into)
    {
        double s1 = 1 - s;
        for (int i = 0; i < _n; i++) into[i] = _r1[i] + s * (_r2[i] + s1 * (_r3[i] + s * (_r4[i] + s1 * _r5[i])));
    }

    /// <summary>Accepts the attempt: y becomes YNew and f(YNew) becomes K1 (first same as last).</summary>
    public void Accept(double[] y)
    {
        Array.Copy(_ynew, y, _n);
        (_k1, _k7) = (_k7, _k1);
    }
}
