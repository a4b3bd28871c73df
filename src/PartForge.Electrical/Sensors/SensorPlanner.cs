using PartForge.Design.Machines;
using PartForge.Electrical.Coils;

namespace PartForge.Electrical.Sensors;

/// <summary>
/// Timing-sensor angles. Conventions: machine frame with coil 0 centred at 0 degrees on +x; the rotor turns
/// counter-clockwise seen from +z (the front); at rotor angle 0 magnet 0 is centred at 0 and its field in the
/// stator is +z. A sensor at mechanical angle phi sees the rotor field's fundamental cos(p (phi - theta)).
/// Advance shifts a sensor against the rotation by advance_elec / p mechanical degrees so it fires earlier.
///
/// 3 halls (3-phase, ideal six-step): hall X is placed so its output is in phase with the line EMF
/// e_X - e_(X-1) (A-C, B-A, C-B), i.e. it switches 30 electrical degrees after phase X's EMF zero crossing —
/// the commutation instants of six-step drive: p phi = eps_X + 120 - advance, eps_X the electrical angle of
/// phase X's positive-going EMF zero crossing. Each sensor may move by any whole pole pair (360/p) or, with
/// its output inverted, by a pole pitch (180/p); among these the position with the most room between the
/// coils is chosen (ties: nearest to hall A, then not inverted).
///
/// Single sensor (1-phase pulse drive): the coil is switched on when its EMF crosses zero going positive
/// (the magnet over it has just been aligned: the coil now pushes the leaving magnet and pulls the coming
/// one), minus the advance, and stays on for half an electrical period. A hall switches where the field it
/// sees changes sign, so p phi = p theta_on + 90 (+ multiples of 180 with inversion). A reed switch closes on
/// either pole at a field-strength threshold: the same angle is reported, but the edge then depends on the
/// reed's pull-in distance (not modelled) and it fires once per magnet, i.e. twice per electrical period.
///
/// Same-pole magnets: one electrical period is one magnet pitch (the caller passes twice the magnet count as
/// poles). The field a sensor sees peaks over each magnet (the same pole every time), so the sensor is centred on a passing
/// magnet at the middle of the conduction half-period (p phi = theta_on + 90, the same angle); a threshold sensor
/// (reed, unipolar Hall) closes once per magnet, every closure in the driving half.
/// </summary>
public static class SensorPlanner
{
    /// <summary>Plans the sensors. <paramref name="phaseZeroCrossElecDeg"/>: per phase, the electrical angle of its positive-going EMF zero crossing (fundamental).</summary>
    public static SensorLayout Plan(SensorSpec sensor, int poles, int phases, CoilOutline outline, int coils,
        IReadOnlyList<double> phaseZeroCrossElecDeg, List<Diagnostic> diagnostics, bool fieldReverses = true)
    {
        // Same-pole magnets (fieldReverses false): the field a sensor sees never changes sign, so a sensor cannot be
        // moved half an electrical period with its output inverted; only whole periods (step 2 in j below).
        int step = fieldReverses ? 1 : 2;
        int p = poles / 2;
        double r = outline.PitchRadiusMm;
        if (sensor.Kind == SensorKind.None)
            return new SensorLayout { Kind = SensorKind.None, Sensors = Array.Empty<SensorPlacement>(), Rule = "no sensor (sensor.kind: none)." };
        double adv = sensor.AdvanceElecDeg;
        if (phases == 3)
        {
            if (sensor.Count != 3 || sensor.Kind != SensorKind.Hall)
                diagnostics.Add(new Diagnostic("sensor-count-3phase", DiagnosticSeverity.Warning, "sensor.count",
                    "a 3-phase six-step drive needs 3 hall sensors; set sensor.kind: hall and sensor.count: 3 (3 halls are reported)."));
            var placed = new List<SensorPlacement>();
            string[] labels = { "H-A", "H-B", "H-C" };
            for (int x = 0; x < 3; x++)
            {
                double nominalElec = phaseZeroCrossElecDeg[x] + 120 - adv;
                SensorPlacement? best = null;
                for (int j = 0; j < 2 * p; j += step)
                {
                    double ang = Norm((nominalElec + 180.0 * j) / p);
                    if (placed.Any(s => AngleDist(s.AngleDeg, ang) < 1e-6)) continue;
                    var cand = Make(labels[x], ang, r, p, j % 2 == 1, outline, coils, sensor.Body);
                    if (best is null || Better(cand, best, placed.Count > 0 ? placed[0].AngleDeg : ang)) best = cand;
                }
                placed.Add(best!);
            }
            foreach (var s in placed.Where(s => !s.Fits))
                diagnostics.Add(new Diagnostic("sensor-no-room", DiagnosticSeverity.Warning, "sensor.body.width",
                    FormattableString.Invariant($"hall sensor {s.Label} at {s.AngleDeg:0.##} deg does not fit between the coils ({-s.ClearanceMm:0.###} mm short); use a narrower sensor body, fewer turns or a larger coils.pitch_radius.")));
            return new SensorLayout
            {
                Kind = sensor.Kind, Sensors = placed,
                Rule = "3 halls 120 electrical degrees apart (or inverted a pole pitch away), each switching at a six-step commutation instant (30 electrical degrees after its phase EMF zero crossing), minus the advance.",
            };
        }
        // 1-phase pulse drive.
        double on = phaseZeroCrossElecDeg[0] - adv;
        double nominal = on + 90;
        SensorPlacement? b1 = null;
        int count = Math.Max(1, sensor.Count);
        if (count != 1)
            diagnostics.Add(new Diagnostic("sensor-count-1phase", DiagnosticSeverity.Warning, "sensor.count",
                "a 1-phase pulse drive needs one timing sensor; set sensor.count: 1 (one sensor is reported)."));
        for (int j = 0; j < 2 * p; j += step)
        {
            double ang = Norm((nominal + 180.0 * j) / p);
            var cand = Make("S", ang, r, p, j % 2 == 1, outline, coils, sensor.Body);
            if (b1 is null || Better(cand, b1, 0)) b1 = cand;
        }
        if (!b1!.Fits)
            diagnostics.Add(new Diagnostic("sensor-no-room", DiagnosticSeverity.Warning, "sensor.body.width",
                FormattableString.Invariant($"the timing sensor at {b1.AngleDeg:0.##} deg does not fit between the coils ({-b1.ClearanceMm:0.###} mm short); use a narrower sensor body, fewer turns or a larger coils.pitch_radius.")));
        return new SensorLayout
        {
            Kind = sensor.Kind, Sensors = new[] { b1 }, SwitchOnElecDeg = NormSigned(on),
            Rule = !fieldReverses
                ? "sensor centred on a passing magnet at mid-conduction (same-pole magnets: the field it sees peaks once per magnet, one closure per magnet, so every pulse drives; EMF zero crossing going positive, minus the advance, to half a period later)."
                : sensor.Kind == SensorKind.Reed
                ? "reed centred where the field changes sign when the coil must switch on (EMF zero crossing going positive, minus the advance); the real edge depends on the reed's pull-in distance."
                : "hall where the field it sees changes sign at the instant the coil must switch on (EMF zero crossing going positive, minus the advance).",
        };
    }

    private static bool Better(SensorPlacement a, SensorPlacement b, double refDeg)
    {
        if (Math.Abs(a.ClearanceMm - b.ClearanceMm) > 1e-9) return a.ClearanceMm > b.ClearanceMm;
        double da = AngleDist(a.AngleDeg, refDeg), db = AngleDist(b.AngleDeg, refDeg);
        if (Math.Abs(da - db) > 1e-9) return da < db;
        if (a.Inverted != b.Inverted) return !a.Inverted;
        return a.AngleDeg < b.AngleDeg;
    }

    private static SensorPlacement Make(string label, double angDeg, double r, int p, bool inverted, CoilOutline outline, int coils,
        SensorBody body)
    {
        double clearance = double.MaxValue;
        foreach (double rr in new[] { r - body.LengthMm / 2, r, r + body.LengthMm / 2 })
        {
            double? h = HalfAngle(outline, rr);
            if (h is null || rr <= 0) continue;
            for (int k = 0; k < coils; k++)
            {
                double d = AngleDist(angDeg, 360.0 * k / coils) - h.Value; // free angle to this coil's edge
                double tangential = 2 * rr * Math.Sin(d * Math.PI / 360); // chord, negative when inside the coil
                clearance = Math.Min(clearance, tangential - body.WidthMm / 2);
            }
        }
        if (clearance == double.MaxValue) clearance = Math.Max(0, r); // the circle misses every coil
        return new SensorPlacement(label, angDeg, r, Norm(p * angDeg), inverted, clearance, clearance >= 0);
    }

    [ThreadStatic] private static Dictionary<(CoilOutline, double), double?>? _halfAngles;

    /// <summary>The outline's half-angle at a radius, memoised (the same few radii are asked for every candidate).</summary>
    private static double? HalfAngle(CoilOutline o, double r)
    {
        _halfAngles ??= new Dictionary<(CoilOutline, double), double?>(ReferenceEqualityComparerForKey.Instance);
        if (_halfAngles.Count > 64) _halfAngles.Clear();
        if (!_halfAngles.TryGetValue((o, r), out var h)) _halfAngles[(o, r)] = h = o.OuterHalfAngleDegAt(r);
        return h;
    }

    private sealed class ReferenceEqualityComparerForKey : IEqualityComparer<(CoilOutline, double)>
    {
        public static readonly ReferenceEqualityComparerForKey Instance = new();
        public bool Equals((CoilOutline, double) a, (CoilOutline, double) b) => ReferenceEquals(a.Item1, b.Item1) && a.Item2.Equals(b.Item2);
        public int GetHashCode((CoilOutline, double) k) => HashCode.Combine(System.Runtime.CompilerServices.RuntimeHelpers.GetHashCode(k.Item1), k.Item2);
    }

    private static double Norm(double deg)
    {
        double x = deg % 360;
        if (x < 0) x += 360;
        return Math.Abs(x - 360) < 1e-9 ? 0 : x;
    }

    private static double NormSigned(double deg)
    {
        double x = Norm(deg);
        return x > 180 ? x - 360 : x;
    }

    private static double AngleDist(double a, double b)
    {
        double d = Math.Abs(Norm(a) - Norm(b));
        return Math.Min(d, 360 - d);
    }
}
