using System.Globalization;
using PartForge.Design.Materials;
using PartForge.Design.Parts;
using static PartForge.Checks.Judge;

namespace PartForge.Checks.Rules;

/// <summary>
/// coil-temperature and magnet-temperature: the steady temperatures the electrical engine's heat balance computed
/// (docs/physics.md §13) against what the coil's neighbours and the magnets stand.
/// </summary>
internal static class HeatRules
{
    public static IEnumerable<CheckResult> Run(CheckContext c)
    {
        yield return Coil(c);
        yield return Magnets(c);
    }

    private static string I(int v) => v.ToString(CultureInfo.InvariantCulture);

    /// <summary>
    /// The winding's steady temperature against the lowest of coils.max_temperature (what the user accepts) and the
    /// softening points of the former and the stator (the material table): the plastic the coil presses on must not
    /// creep. Warn within 10 C.
    /// </summary>
    private static CheckResult Coil(CheckContext c)
    {
        double t = c.E.CoilTemperatureC, amb = c.E.AmbientC;
        var former = c.MaterialOf(PartId.Former);
        var stator = c.MaterialOf(c.FirstStator);
        var weak = former.SofteningC <= stator.SofteningC ? former : stator;
        bool formerWeak = weak == former;
        string which = formerWeak ? "former" : "stator";
        double user = c.D.Coils.MaxTemperatureC;
        bool userGoverns = user < weak.SofteningC;
        double limit = userGoverns ? user : weak.SofteningC;
        var weakPart = userGoverns || formerWeak ? PartId.Former : c.FirstStator;
        var (status, margin) = AtMost(t, limit, TemperatureBandC);
        string point = c.E.MotorGoverns ? "motor" : "generator";
        string msg = $"steady winding temperature {F(t)} C at the {point} operating point ({F(c.E.CopperLossPerCoilW)} W per coil, "
                     + $"{F(c.E.CoilThermalResistanceKPerW)} K/W to still air at {F(amb)} C) against "
                     + (userGoverns
                         ? $"coils.max_temperature {F(user)} C (the {which} material {weak.Name} softens at about {F(weak.SofteningC)} C)"
                         : $"the {which} material {weak.Name}, which softens at about {F(weak.SofteningC)} C"
                           + (user > weak.SofteningC ? $" (below coils.max_temperature {F(user)} C, so it bounds it)" : ""));
        if (status != CheckStatus.Pass) msg += "; " + CoilFix(c, t, limit, weak, formerWeak, userGoverns);
        return new CheckResult
        {
            Id = CheckIds.CoilTemperature, Part = weakPart,
            Status = status, Value = t, Limit = limit, Unit = "C", Margin = margin, Message = msg, Where = new CheckLocation("coil former and seat"),
            Basis = "steady heat balance of one coil: copper loss with the resistance at its temperature (IEC 60028, 0.00393/K), two flange faces "
                    + "to still air at h = 10 W/(m^2 K) (natural convection, common practice); limit coils.max_temperature, bounded by the "
                    + "softening point of the former/stator plastic (PLA 55-60 C, resin makers' datasheets)",
        };
    }

    /// <summary>The generator's offers aim at this share of the rise the warning band allows: their estimate holds the EMF per
    /// turn and the reactance of a resized coil fixed, which the whole engine then recomputes (our choice; wind-duo's offers
    /// pass with it, tested).</summary>
    public const double AimRise = 0.75;

    /// <summary>What lowers the temperature, in the design's own keys and inside their ranges (docs/physics.md §13).</summary>
    private static string CoilFix(CheckContext c, double t, double limit, Material weak, bool formerWeak, bool userGoverns)
    {
        var fixes = new List<string>();
        double amb = c.E.AmbientC, rth = c.E.CoilThermalResistanceKPerW, p = c.E.CopperLossPerCoilW;
        double target = limit - TemperatureBandC;                  // a pass without a warning
        double allowed = rth > 0 ? (target - amb) / rth : 0;       // loss per coil that reaches it
        if (allowed > 0 && p > allowed)
        {
            fixes.Add($"one coil may shed {F(allowed)} W to stay {F(TemperatureBandC)} C below the limit");
            if (c.E.MotorGoverns)
            {
                // Motor at rated speed: i = (V - e) / R, so thicker wire would raise the current; less voltage or more
                // back-EMF (more turns) lowers it.
                fixes.Add($"less current: a lower operation.supply_voltage, or more coils.turns (more back-EMF at rated speed)");
            }
            else if (c.E.GeneratorSource is { } src)
                fixes.AddRange(GeneratorFixes(c, src, amb + AimRise * (target - amb)));
        }
        else if (!(allowed > 0))
            fixes.Add($"the air at {F(amb)} C is already within {F(TemperatureBandC)} C of the limit: lower operation.ambient_temperature if the machine runs cooler");
        double need = t + TemperatureBandC;
        var better = MaterialTable.All.Where(m => m.IsFilament && m.SofteningC >= need).OrderBy(m => m.SofteningC).FirstOrDefault();
        if (!userGoverns && better is not null)
            fixes.Add($"a former material that stands more heat: {(formerWeak ? "parts.former.material" : "stator.material")}: {better.Name} (softens at about {F(better.SofteningC)} C)");
        if (userGoverns && need <= Math.Min(weak.SofteningC, 250))
            fixes.Add($"or, if the coil may run hotter, coils.max_temperature {Up(need)} (at most the {(formerWeak ? "former" : "stator")}'s softening point, {F(weak.SofteningC)} C)");
        return string.Join("; ", fixes);
    }

    /// <summary>
    /// The generator's fixes, each the smallest change that brings the steady temperature to <paramref name="target"/>
    /// within the model of docs/physics.md §13: a steady temperature at or below the target exists when
    /// T_air + R_th P(target) &lt;= target (the balance g(T) = T - T_air - R_th P(T) is at most 0 at T_air). P is one coil's
    /// share of m I^2 R with I = E / sqrt((R + R_load)^2 + X^2), the resistance at the target (IEC 60028) and the magnets'
    /// Br there; a change of turns scales E and the turn count by N'/N, X by (N'/N)^2 and the build, mean turn and face
    /// area with the build; a change of wire scales the build by the copper area and the resistance by the mean turn over
    /// the copper area (the EMF and the reactance taken as unchanged). Estimates the next check recomputes.
    /// </summary>
    private static IEnumerable<string> GeneratorFixes(CheckContext c, (double EmfV, double ROhm, double XOhm, int Phases, int Coils) src, double target)
    {
        const double alpha = PartForge.Electrical.Wire.Copper.TemperatureCoefficientPerK;
        double t = c.E.CoilTemperatureC, amb = c.E.AmbientC, rth = c.E.CoilThermalResistanceKPerW;
        double rl = c.D.Operation.LoadResistanceOhm;
        var o = c.E.Outline;
        double pw = o.WindowPerimeterMm, b = o.RadialBuildMm, a0 = o.WindingPlanAreaMm2, mt0 = pw + Math.PI * b;
        double rHot = (1 + alpha * (target - 20)) / (1 + alpha * (t - 20));
        double br20 = c.D.Magnets.BrTesla;
        double eCool = MagnetGrades.BrAt(br20, Math.Min(target, c.D.Magnets.MaxWorkingTemperatureC))
                       / MagnetGrades.BrAt(br20, Math.Min(c.E.MagnetTemperatureC, c.D.Magnets.MaxWorkingTemperatureC));
        bool Cool(double eF, double rF, double xF, double load, double buildF)
        {
            double ry = src.ROhm * rF * rHot, e = src.EmfV * eF * eCool, x = src.XOhm * xF;
            double p = src.Phases * e * e * ry / ((ry + load) * (ry + load) + x * x) / Math.Max(1, src.Coils);
            double bb = b * buildF, area = pw * bb + Math.PI * bb * bb;
            return amb + rth * a0 / area * p <= target;
        }
        double Mt(double buildF) => (pw + Math.PI * b * buildF) / mt0;

        // Thicker wire: the first AWG (ASTM B258) thicker than the present wire that reaches the target.
        double d0 = c.E.WireBareMm;
        for (int awg = Math.Min(50, WindingRules.AwgAtLeast(d0)); awg >= 0; awg--)
        {
            double d = 0.127 * Math.Pow(92, (36 - awg) / 39.0);
            if (d <= d0 * (1 + 1e-9) || d > 5) continue;
            double fa = d * d / (d0 * d0);
            if (Cool(1, Mt(fa) / fa, 1, rl, fa))
            {
                yield return $"thicker wire: coils.wire.awg {I(awg)} ({F(d)} mm bare; the coils grow, check they still fit)";
                break;
            }
        }
        // Fewer turns: the most turns that reach the target.
        int n0 = c.E.Turns;
        for (int n = n0 - 1; n >= 1; n--)
        {
            double f = (double)n / n0;
            if (Cool(f, f * Mt(f), f * f, rl, f))
            {
                yield return $"fewer turns: coils.turns {I(n)} (less EMF, less resistance)";
                break;
            }
        }
        // A larger load: the least load resistance that reaches the target (the loss falls as the load rises).
        if (Cool(1, 1, 1, 1e9, 1))
        {
            double lo = rl, hi = Math.Max(2 * rl, 1e-6);
            while (!Cool(1, 1, 1, hi, 1) && hi < 1e9) hi = Math.Min(1e9, hi * 2);
            for (int i = 0; i < 60; i++)
            {
                double mid = 0.5 * (lo + hi);
                if (Cool(1, 1, 1, mid, 1)) hi = mid; else lo = mid;
            }
            yield return $"less current: operation.load_resistance {Up(hi)} ohm or more";
        }
    }

    /// <summary>
    /// The magnets' estimated temperature (the coils' steady temperature bounds it) against the maximum working
    /// temperature of the grade's suffix (N 80, M 100, H 120, SH 150, UH 180, EH 200 C; common practice). Warn within 10 C.
    /// </summary>
    private static CheckResult Magnets(CheckContext c)
    {
        double t = c.E.MagnetTemperatureC;
        string grade = c.D.Magnets.Grade;
        double limit = c.D.Magnets.MaxWorkingTemperatureC;
        var (status, margin) = AtMost(t, limit, TemperatureBandC);
        string msg = $"magnets at about {F(t)} C (taken as the coils' steady temperature, an upper estimate) against {F(limit)} C, the maximum working temperature of magnets.grade {grade}";
        if (status != CheckStatus.Pass)
        {
            double need = t + TemperatureBandC;
            var next = MagnetGrades.Suffixes.FirstOrDefault(s => s.MaxC >= need);
            int? number = MagnetGrades.Number(grade);
            var fixes = new List<string>();
            if (next.Suffix is { Length: > 0 } sfx && number is { } nb)
                fixes.Add($"a grade for higher temperatures: magnets.grade N{I(nb)}{sfx} (works to about {F(next.MaxC)} C)");
            fixes.Add(c.E.MotorGoverns
                ? "or cooler coils (see coil-temperature: a lower operation.supply_voltage or more coils.turns)"
                : "or cooler coils (see coil-temperature: thicker wire, fewer turns, a larger operation.load_resistance)");
            msg += "; " + string.Join(" ", fixes);
        }
        return new CheckResult
        {
            Id = CheckIds.MagnetTemperature, Part = c.D.Layout.Rotors[0],
            Status = status, Value = t, Limit = limit, Unit = "C", Margin = margin, Message = msg, Where = new CheckLocation("rotor magnets"),
            Basis = "maximum working temperature by grade suffix (makers' grade tables, common practice, from memory); magnet temperature bounded by the coils' steady temperature (no loss in the magnets)",
        };
    }
}
