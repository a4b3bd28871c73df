using System.Numerics;
using PartForge.Design.Machines;
using PartForge.Electrical.Flux;
using PartForge.Electrical.Switching;
using PartForge.Electrical.Wire;

namespace PartForge.Electrical.Operation;

/// <summary>
/// The machine's operating points as a function of two numbers: a factor on every EMF (the magnets' Br against the Br
/// the harmonics were computed with) and the hot phase resistance. Built once from the phase EMF harmonics (per rad/s
/// of shaft speed); <see cref="At"/> is cheap, so the heat balance can ask for the points at many temperatures.
/// Models: <see cref="GeneratorPoint"/> and <see cref="MotorPoint"/>.
/// </summary>
internal sealed class OperatingModel
{
    private const int Fine = 720;
    private readonly MachineModel _d;
    private readonly bool _parallel;
    private readonly double _lPh, _lineRmsPerW, _phaseRmsPerW, _areaMm2;
    private readonly int _p;
    private readonly double[] _kc;
    private readonly bool[] _cond;
    private readonly SwitchingPlan? _plan;
    private readonly double _planOhm;

    private OperatingModel(MachineModel d, bool parallel, double lPh, double lineRmsPerW, double phaseRmsPerW, double areaMm2, int p, double[] kc, bool[] cond,
        SwitchingPlan? plan, double planOhm)
    {
        (_d, _parallel, _lPh, _lineRmsPerW, _phaseRmsPerW, _areaMm2, _p, _kc, _cond) = (d, parallel, lPh, lineRmsPerW, phaseRmsPerW, areaMm2, p, kc, cond);
        (_plan, _planOhm) = (plan, planOhm);
    }

    /// <summary>The model from the phase harmonics <paramref name="k"/> (one array per phase, V per rad/s). With a
    /// switching <paramref name="plan"/> (made with the phase resistance <paramref name="planOhm"/>), a one-phase pulse
    /// drive conducts in the windows its sensor really gives, each with the drive's sign, on the plan's supply and
    /// drops; without one, from the fundamental's positive-going zero crossing for half a period (an estimate).</summary>
    public static OperatingModel Of(MachineModel d, Complex[][] k, IReadOnlyList<int> orders, bool parallel, double lPhUh, WireSpec wire, int polePairs,
        SwitchingPlan? plan = null, double planOhm = 0)
    {
        double phaseRmsPerW = Rms(k[0]);
        double[] kc;
        bool[] cond;
        double lineRmsPerW;
        if (d.Phases == 3)
        {
            bool star = d.Connection == Connection.Star;
            Complex[] line = star ? Sub(k[0], k[1]) : NoTriplen(k[0], orders);
            lineRmsPerW = Rms(line);
            Complex[][] pairs = star
                ? new[] { Sub(k[0], k[1]), Sub(k[1], k[2]), Sub(k[2], k[0]) }
                : new[] { NoTriplen(k[0], orders), NoTriplen(k[1], orders), NoTriplen(k[2], orders) };
            var pw = pairs.Select(pp => HarmonicSynth.Sample(pp, orders, Fine)).ToArray();
            kc = new double[Fine];
            for (int i = 0; i < Fine; i++) kc[i] = Math.Max(Math.Abs(pw[0][i]), Math.Max(Math.Abs(pw[1][i]), Math.Abs(pw[2][i])));
            cond = Enumerable.Repeat(true, Fine).ToArray();
        }
        else
        {
            lineRmsPerW = phaseRmsPerW;
            // The switch conducts from the positive-going zero crossing of the fundamental, less the advance.
            double on = Norm(-90 - k[0][0].Phase * 180 / Math.PI) - d.Sensor.AdvanceElecDeg;
            kc = HarmonicSynth.Sample(k[0], orders, Fine);
            cond = new bool[Fine];
            if (plan is not null)
            {
                // The windows the sensor really gives (SwitchingPlanner): the conducting path's EMF carries the drive's sign.
                for (int i = 0; i < Fine; i++)
                {
                    int sg = plan.SignAt(0, 360.0 * i / Fine / polePairs);
                    cond[i] = sg != 0;
                    kc[i] *= sg;
                }
            }
            else
            {
                for (int i = 0; i < Fine; i++) cond[i] = Norm(360.0 * i / Fine - on) < 180;
            }
        }
        return new OperatingModel(d, parallel, lPhUh, lineRmsPerW, phaseRmsPerW, wire.CopperAreaMm2, polePairs, kc, cond, d.Phases == 3 ? null : plan, planOhm);
    }

    /// <summary>The generator and motor points with every EMF times <paramref name="emfFactor"/> and the phase at <paramref name="ohmPhHot"/>.</summary>
    public (GeneratorPoint Generator, MotorPoint Motor) At(double emfFactor, double ohmPhHot)
    {
        var d = _d;
        var op = d.Operation;
        double w = 2 * Math.PI * d.RatedRpm / 60;
        if (d.Phases == 3)
        {
            bool star = d.Connection == Connection.Star;
            double ry = star ? ohmPhHot : ohmPhHot / 3, ly = star ? _lPh : _lPh / 3;
            var gen = OperatingPoints.Generator(3, emfFactor * w * _lineRmsPerW / Math.Sqrt(3), ry, ly, op.LoadResistanceOhm, d.RatedRpm, _p,
                star ? 1 : 1 / Math.Sqrt(3), _areaMm2);
            var mot = OperatingPoints.Motor("six-step", op.SupplyVoltageV, 2 * op.SwitchDropV, star ? 2 * ohmPhHot : 2 * ohmPhHot / 3,
                Scale(_kc, emfFactor), _cond, d.RatedRpm, star ? 1 : 2.0 / 3, _areaMm2);
            return (gen, mot);
        }
        double ratio = _parallel ? 1.0 / d.CoilsPerStator : 1;
        var g1 = OperatingPoints.Generator(1, emfFactor * w * _phaseRmsPerW, ohmPhHot, _lPh, op.LoadResistanceOhm, d.RatedRpm, _p, ratio, _areaMm2);
        // With a plan, its path resistance holds the phase at the plan's resistance: the phase's change is carried over.
        var m1 = _plan is { } pl
            ? OperatingPoints.Motor("pulse", pl.SupplyV, pl.SwitchDropsV, pl.PathResistanceOhm - _planOhm + ohmPhHot, Scale(_kc, emfFactor), _cond, d.RatedRpm, ratio, _areaMm2)
            : OperatingPoints.Motor("pulse", op.SupplyVoltageV, op.SwitchDropV, ohmPhHot, Scale(_kc, emfFactor), _cond, d.RatedRpm, ratio, _areaMm2);
        return (g1, m1);
    }

    private static double[] Scale(double[] a, double f)
    {
        if (f == 1) return a;
        var r = new double[a.Length];
        for (int i = 0; i < a.Length; i++) r[i] = a[i] * f;
        return r;
    }

    private static Complex[] Sub(Complex[] a, Complex[] b) => a.Select((x, i) => x - b[i]).ToArray();

    private static Complex[] NoTriplen(Complex[] a, IReadOnlyList<int> orders) => a.Select((x, i) => orders[i] % 3 == 0 ? Complex.Zero : x).ToArray();

    private static double Rms(Complex[] k) => Math.Sqrt(k.Sum(c => c.Magnitude * c.Magnitude) / 2);

    private static double Norm(double deg)
    {
        double x = deg % 360;
        return x < 0 ? x + 360 : x;
    }
}
