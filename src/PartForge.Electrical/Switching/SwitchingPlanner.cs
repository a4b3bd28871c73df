using PartForge.Design.Machines;
using PartForge.Design.Stack;
using PartForge.Electrical.Field;
using PartForge.Electrical.Sensors;

namespace PartForge.Electrical.Switching;

/// <summary>
/// When the drive really conducts. Each sensor reads the axial field of the magnets (and their back-iron images)
/// at its sensing point: the centre of its body, in the pocket of the first stator ring on the face toward the
/// rotor, at the sensor's radius and angle. The field counts positive along the machine's +z axis (toward the
/// front), the direction magnet 0 makes in the stator and the one the sensor planner times on; a Hall is fitted
/// to switch on that direction. Turning the rotor counter-clockwise (increasing angle) through one electrical period
/// twice, a reed closes when |B| reaches its pull-in and opens when |B| falls below its release (either pole);
/// a Hall turns on when B reaches its operate point and off when B falls below its release point (a latch has a
/// negative release). A sensor the planner placed a pole pitch away with its output inverted reads -B.
///
/// Windows: unipolar, the switch is closed while the sensor is on (sign +1); bipolar, +V while on and -V while
/// off; six-step from three Halls, phase X's high side while H_X is on and H_(X+1) off, its low side while H_X
/// is off and H_(X+1) on (120-degree conduction). Each pulse's torque integral at a constant current is
/// sign x (lambda(off) - lambda(on)) (the integral of T = i d lambda / d theta over the window), so a pulse
/// brakes exactly when the linkage falls over its window. At standstill the current is (V - drops) / R
/// (no inductance), the torque i x sign x d lambda / d theta (six-step: i (k_high - k_low)).
/// </summary>
public static class SwitchingPlanner
{
    /// <summary>Samples per electrical period for the sensor field and the windows.</summary>
    public const int SamplesPerPeriod = 1440;

    /// <summary>A pulse brakes when its torque integral is below minus this share of the largest pulse's.</summary>
    public const double BrakingShare = 1e-3;

    /// <summary>The plan, or null when the drive has no sensor (sensor.kind: none) or the machine is not a motor.</summary>
    public static SwitchingPlan? Plan(MachineModel d, RotorField field, SensorLayout sensors, IReadOnlyList<PhaseFlux> phases,
        double phaseOhmHot, double phaseHenry)
    {
        if (!d.RunsAsMotor || sensors.Kind == SensorKind.None || sensors.Sensors.Count == 0) return null;
        var sw = d.Drive.Switching;
        if (sw == SwitchingKind.SixStep && (phases.Count != 3 || sensors.Sensors.Count != 3)) return null;
        if (sw != SwitchingKind.SixStep && phases.Count != 1) return null;

        int p = Math.Max(1, d.FieldPeriods);
        double period = 360.0 / p;
        var (zMm, zSign) = SensingPoint(d);
        double r = sensors.Sensors[0].RadiusMm;
        var g = FieldAround(field, r, zMm, zSign, period); // G(psi), psi = j period / M
        bool reed = d.Sensor.Kind == SensorKind.Reed;
        double op = d.Sensor.OperateTesla, rel = d.Sensor.ReleaseTesla;

        double supply = SupplyOf(d);
        int switches = sw == SwitchingKind.Unipolar ? 1 : 2;
        double drops = switches * d.Operation.SwitchDropV;
        double storeOhm = d.Storage switch { CapacitorStorage c => c.EsrOhm, BatteryStorage b => b.InternalResistanceOhm, _ => 0 };
        double pathOhm = (sw == SwitchingKind.SixStep ? 2 * phaseOhmHot : phaseOhmHot) + storeOhm;
        double current = pathOhm > 0 ? Math.Max(0, supply - drops) / pathOhm : 0;
        double friction = d.Mechanics.FrictionTorqueNm;

        var sensorAngles = sensors.Sensors.Select(s => (s.AngleDeg, s.Inverted)).ToArray();
        var main = Evaluate(sensorAngles, 0, g, period, p, reed, op, rel, sw, phases, current, friction, full: true);

        // The advance with the largest mean torque (single-sensor drives): the sensor moves by -delta / p.
        double? bestAdv = null;
        bool bestRuns = false;
        if (sw != SwitchingKind.SixStep)
        {
            double bestT = 0;
            for (int a = -180; a <= 180; a++)
            {
                double delta = a - d.Sensor.AdvanceElecDeg;
                var e = Evaluate(sensorAngles, -delta / p, g, period, p, reed, op, rel, sw, phases, current, friction);
                if (!(e.MeanTorque > 0)) continue;
                bool runs = e.Braking == 0;
                if ((runs && !bestRuns) || (runs == bestRuns && e.MeanTorque > bestT * (1 + 1e-9)))
                {
                    bestT = e.MeanTorque; bestAdv = a; bestRuns = runs;
                }
            }
        }

        // The smallest operate field (release in the same ratio) at which every pulse drives, at the design's advance.
        double? runsAt = null;
        double top = Math.Max(Math.Abs(g.Min()), g.Max());
        if (main.Braking > 0 && sw != SwitchingKind.SixStep && op > 0)
        {
            double ratio = rel / op;
            for (int i = 1; i <= 200 && runsAt is null; i++)
            {
                double o = op + (top - op) * i / 200.0;
                var e = Evaluate(sensorAngles, 0, g, period, p, reed, o, o * ratio, sw, phases, current, friction);
                if (e.Braking == 0 && e.MeanTorque > 0) runsAt = o;
            }
        }

        double kick = d.Drive.HasFreewheel
            ? supply + DriveSpec.DropOf(d.Drive.Diode)
            : supply + current * Math.Sqrt(Math.Max(0, phaseHenry) / SwitchingPlan.StrayCapacitanceF);
        var first = Enumerable.Range(0, SamplesPerPeriod).Select(i => Sample(g, sensorAngles[0].AngleDeg - i * period / SamplesPerPeriod, period) * (sensorAngles[0].Inverted ? -1 : 1)).ToArray();
        return new SwitchingPlan
        {
            Switching = sw, Sensor = d.Sensor.Kind, OperateTesla = op, ReleaseTesla = rel, SensorZMm = zMm, SensorRadiusMm = r,
            FieldMaxTesla = first.Max(), FieldMinTesla = first.Min(),
            FieldTesla = first, FieldAngleDeg = Enumerable.Range(0, SamplesPerPeriod).Select(i => i * period / SamplesPerPeriod).ToArray(),
            Circuits = main.Circuits, SupplyV = supply, SwitchDropsV = drops, PathResistanceOhm = pathOhm, PeakCurrentA = current,
            MeanStallTorqueNm = main.MeanTorque, SelfStartShare = main.StartShare, BestStartAngleDeg = main.BestStartDeg,
            TurnOffVoltageV = kick, BestAdvanceElecDeg = bestAdv, BestAdvanceRuns = bestRuns, RunsFromOperateTesla = runsAt,
        };
    }

    /// <summary>The supply the drive switches: a capacitor's start voltage, a battery's voltage, else operation.supply_voltage, V.</summary>
    public static double SupplyOf(MachineModel d) => d.Storage switch
    {
        CapacitorStorage c => c.StartVoltageV,
        BatteryStorage b => b.VoltageV,
        _ => d.Operation.SupplyVoltageV,
    };

    /// <summary>The sensing point's z (machine frame, mm) and the sign of the field it reads: +1, the field along the machine's +z axis
    /// (a Hall is fitted so that it switches on that direction, the one the sensor planner times on).</summary>
    public static (double ZMm, double Sign) SensingPoint(MachineModel d)
    {
        var stack = d.Stack;
        var ring = stack.Slab(SlabKind.Stator, d.Layout.Stators[0]);
        var rotors = stack.OfKind(SlabKind.Rotor).ToList();
        bool above = rotors.Any(x => x.ZMin >= ring.ZMax);
        double h = Math.Min(d.Sensor.Body.HeightMm, ring.Thickness);
        // The pocket is in the face toward the rotor (the +z one when rotors are on both sides), as the stator builder cuts it.
        return above ? (ring.ZMax - h / 2, 1) : (ring.ZMin + h / 2, 1);
    }

    private static double[] FieldAround(RotorField field, double r, double z, double sign, double period)
    {
        var g = new double[SamplesPerPeriod];
        for (int j = 0; j < SamplesPerPeriod; j++)
        {
            double psi = j * period / SamplesPerPeriod * Math.PI / 180;
            g[j] = sign * field.Bz(r * Math.Cos(psi), r * Math.Sin(psi), z);
        }
        return g;
    }

    /// <summary>G at any rotor-frame angle (periodic, linear between samples).</summary>
    private static double Sample(double[] g, double psiDeg, double period)
    {
        double u = psiDeg / period * SamplesPerPeriod;
        u -= Math.Floor(u / SamplesPerPeriod) * SamplesPerPeriod;
        int j = (int)Math.Floor(u);
        double f = u - j;
        return g[j % SamplesPerPeriod] * (1 - f) + g[(j + 1) % SamplesPerPeriod] * f;
    }

    private sealed record Outcome(IReadOnlyList<CircuitPulses> Circuits, int Braking, double MeanTorque, double StartShare, double BestStartDeg);

    private static Outcome Evaluate((double AngleDeg, bool Inverted)[] sensors, double shiftDeg, double[] g, double period, int p, bool reed,
        double op, double rel, SwitchingKind sw, IReadOnlyList<PhaseFlux> phases, double current, double friction, bool full = false)
    {
        int m = SamplesPerPeriod;
        double step = period / m;
        // Each sensor's state and its edge angles, over one period after one period of settling.
        var on = new bool[sensors.Length][];
        var edge = new double[sensors.Length][];
        for (int s = 0; s < sensors.Length; s++)
        {
            double phi = sensors[s].AngleDeg + shiftDeg, inv = sensors[s].Inverted ? -1 : 1;
            double Read(int i) { double b = inv * Sample(g, phi - i * step, period); return reed ? Math.Abs(b) : b; }
            on[s] = new bool[m];
            edge[s] = new double[m];
            bool state = false;
            double prev = Read(-1);
            for (int i = -m; i < m; i++)
            {
                double x = Read(i);
                bool next = state ? x >= rel : x >= op;
                if (i >= 0)
                {
                    double th = state ? rel : op;
                    double f = next != state && x != prev ? Math.Clamp((th - prev) / (x - prev), 0, 1) : 1;
                    edge[s][i] = (i - 1 + f) * step; // the crossing between sample i-1 and i
                    on[s][i] = next;
                }
                state = next;
                prev = x;
            }
        }

        // Signs per circuit per sample.
        int nc = phases.Count;
        var sign = new int[nc][];
        for (int c = 0; c < nc; c++)
        {
            sign[c] = new int[m];
            for (int i = 0; i < m; i++)
            {
                sign[c][i] = sw switch
                {
                    SwitchingKind.Unipolar => on[0][i] ? 1 : 0,
                    SwitchingKind.Bipolar => on[0][i] ? 1 : -1,
                    _ => on[c][i] && !on[(c + 1) % 3][i] ? 1 : !on[c][i] && on[(c + 1) % 3][i] ? -1 : 0,
                };
            }
        }

        // Windows within the period (edges interpolated), then repeated over the revolution.
        var circuits = new List<CircuitPulses>();
        double maxChange = 0;
        var perCircuit = new List<List<(double On, double Off, int Sign)>>();
        for (int c = 0; c < nc; c++)
        {
            var s = sign[c];
            var list = new List<(double, double, int)>();
            int start = -1;
            for (int i = 0; i < m; i++) if (s[i] != s[(i - 1 + m) % m]) { start = i; break; }
            if (start < 0)
            {
                if (s[0] != 0) list.Add((0, period, s[0])); // always on: one window over the whole period
            }
            else
            {
                for (int k = 0; k < m; k++)
                {
                    int i = (start + k) % m;
                    if (s[i] == 0 || s[i] == s[(i - 1 + m) % m]) continue;
                    int j = 1;
                    while (j < m && s[(i + j) % m] == s[i]) j++;
                    double a0 = EdgeAt(edge, on, i, step), a1 = EdgeAt(edge, on, (i + j) % m, step);
                    if ((i + j) % m < i || i + j >= m) a1 += period;
                    list.Add((a0, a1, s[i]));
                }
            }
            perCircuit.Add(list);
        }
        var windows = new List<List<PulseWindow>>();
        for (int c = 0; c < nc; c++)
        {
            var ws = new List<PulseWindow>();
            foreach (var (a0, a1, sg) in perCircuit[c])
            {
                double change = sg * (phases[c].At(a1 * Math.PI / 180) - phases[c].At(a0 * Math.PI / 180));
                maxChange = Math.Max(maxChange, Math.Abs(change));
                for (int k = 0; k < p; k++)
                    ws.Add(new PulseWindow(Wrap(a0 + k * period), Wrap(a1 + k * period), sg, change));
            }
            windows.Add(ws);
        }
        int braking = 0;
        for (int c = 0; c < nc; c++)
        {
            var ws = windows[c].Select(w => w with { Brakes = w.FluxChangeWb < -BrakingShare * maxChange }).OrderBy(w => w.OnDeg).ToList();
            braking += ws.Count(w => w.Brakes);
            double cond = sign[c].Count(x => x != 0) * 360.0 / m;
            circuits.Add(new CircuitPulses(phases[c].Phase, ws, cond));
        }

        // Standstill torque over the period.
        var torque = new double[m];
        double sum = 0, best = double.NegativeInfinity, bestDeg = 0;
        for (int i = 0; i < m; i++)
        {
            double th = i * step * Math.PI / 180, t;
            if (sw == SwitchingKind.SixStep)
            {
                int hi = -1, lo = -1;
                for (int c = 0; c < nc; c++) { if (sign[c][i] == 1) hi = c; else if (sign[c][i] == -1) lo = c; }
                t = hi >= 0 && lo >= 0 ? current * (phases[hi].Derivative(th) - phases[lo].Derivative(th)) : 0;
            }
            else t = current * sign[0][i] * phases[0].Derivative(th);
            torque[i] = t;
            sum += t;
            if (t > best) { best = t; bestDeg = i * step; }
        }
        // Starting from rest (quasi-static, no inductance): from angle i the rotor keeps moving when the work of the drive
        // less the friction, summed along its path, stays above zero for a whole period (after that the pattern repeats
        // with more energy when the period's net work is positive). The best start keeps the largest least margin.
        int starts = 0;
        double bestMargin = double.NegativeInfinity;
        if (full && sum / m > friction)
        {
            double h = step * Math.PI / 180;
            for (int i = 0; i < m; i++)
            {
                if (!(torque[i] > friction)) continue;
                double e = 0, least = double.PositiveInfinity;
                for (int k = 0; k < m; k++)
                {
                    e += (torque[(i + k) % m] - friction) * h;
                    if (e < least) least = e;
                    if (least <= 0) break;
                }
                if (least <= 0) continue;
                starts++;
                if (least > bestMargin) { bestMargin = least; bestDeg = i * step; }
            }
        }
        return new Outcome(circuits, braking, sum / m, (double)starts / m, bestDeg);
    }

    /// <summary>The angle of the transition into sample i: the interpolated edge of the first sensor that changed there.</summary>
    private static double EdgeAt(double[][] edge, bool[][] on, int i, double step)
    {
        int m = on[0].Length;
        for (int s = 0; s < on.Length; s++)
            if (on[s][i] != on[s][(i - 1 + m) % m]) return edge[s][i];
        return i * step;
    }

    private static double Wrap(double deg)
    {
        double x = deg % 360;
        if (x < 0) x += 360;
        return x >= 360 - 1e-12 ? 0 : x;
    }
}
