using PartForge.Design.Machines;

namespace PartForge.Electrical.Operation;

/// <summary>The charging calculations behind <see cref="ChargingPoint"/> (see its notes for the model).</summary>
public static class Charging
{
    /// <summary>Mean charging current, A: the mean over equally spaced angles of max(0, w k_i - V - drops) / R, where
    /// <paramref name="rectifiedEmfPerRadS"/> holds the rectified EMF per unit speed (V per rad/s) over one period.</summary>
    public static double MeanCurrent(IReadOnlyList<double> rectifiedEmfPerRadS, double omega, double storeV, double dropsV, double pathOhm)
    {
        if (!(pathOhm > 0)) return 0;
        double s = 0;
        for (int i = 0; i < rectifiedEmfPerRadS.Count; i++) s += Math.Max(0, omega * rectifiedEmfPerRadS[i] - storeV - dropsV);
        return s / rectifiedEmfPerRadS.Count / pathOhm;
    }

    /// <summary>
    /// Time for a capacitor C to charge from v0 to v1 with the charging current i(V): t = Int C dV / i(V), by
    /// composite Simpson's rule on n intervals (even). Infinite when i falls to zero on the way.
    /// </summary>
    public static double TimeToCharge(Func<double, double> current, double capacitanceF, double v0, double v1, int n = 400)
    {
        if (v1 <= v0) return 0;
        if (n % 2 == 1) n++;
        double h = (v1 - v0) / n, s = 0;
        for (int i = 0; i <= n; i++)
        {
            double iv = current(v0 + i * h);
            if (!(iv > 0)) return double.PositiveInfinity;
            s += (i == 0 || i == n ? 1 : i % 2 == 1 ? 4 : 2) / iv;
        }
        return capacitanceF * s * h / 3;
    }

    /// <summary>The charging point of a machine, or null without a store and rectifier.
    /// <paramref name="rectifiedEmfPerRadS"/>: the rectified EMF per unit speed over one electrical period (magnets at their
    /// operating temperature); <paramref name="coldFactor"/>: the EMF of cool magnets (at the air's temperature) over
    /// that, for the open-circuit peak at max_rpm: a machine just started has cool magnets and the higher voltage.</summary>
    public static ChargingPoint? Point(MachineModel d, IReadOnlyList<double> rectifiedEmfPerRadS, double pathWindingOhm, double coldFactor = 1)
    {
        if (d.Load.Rectifier == RectifierKind.None || d.Storage is NoStorage) return null;
        double drops = d.Load.DropsInPath * DriveSpec.DropOf(d.Load.Diode);
        if (d.Phases == 3 && d.Load.Rectifier == RectifierKind.HalfWave) drops = DriveSpec.DropOf(d.Load.Diode);
        var (v, storeOhm) = d.Storage switch
        {
            BatteryStorage b => (b.VoltageV, b.InternalResistanceOhm),
            CapacitorStorage c => (c.RatedVoltageV, c.EsrOhm),
            _ => (0.0, 0.0),
        };
        double r = pathWindingOhm + storeOhm;
        double kPeak = rectifiedEmfPerRadS.Count == 0 ? 0 : rectifiedEmfPerRadS.Max();
        double W(double rpm) => 2 * Math.PI * rpm / 60;
        double cutIn = kPeak > 0 ? (v + drops) / kPeak * 60 / (2 * Math.PI) : double.PositiveInfinity;
        var curve = Enumerable.Range(0, 21).Select(i =>
        {
            double rpm = d.MaxRpm * i / 20;
            double cur = MeanCurrent(rectifiedEmfPerRadS, W(rpm), v, drops, r);
            return new ChargingSample(rpm, cur, cur * v);
        }).ToArray();
        double iRated = MeanCurrent(rectifiedEmfPerRadS, W(d.RatedRpm), v, drops, r);
        double reachable = Math.Max(0, kPeak * W(d.RatedRpm) - drops);
        double? target = null, time = null, energy = null;
        if (d.Storage is CapacitorStorage cap)
        {
            energy = cap.EnergyAtJ(cap.RatedVoltageV);
            double v0 = cap.StartVoltageV;
            target = reachable > cap.RatedVoltageV ? cap.RatedVoltageV : reachable > v0 ? v0 + 0.9 * (reachable - v0) : null;
            if (target is null) time = null; // at rated speed the rectifier cannot lift it above its start voltage
            else if (target > v0)
            {
                double t = TimeToCharge(x => MeanCurrent(rectifiedEmfPerRadS, W(d.RatedRpm), x, drops, r), cap.CapacitanceF, v0, target.Value);
                time = double.IsFinite(t) ? t : null;
            }
            else time = 0;
        }
        return new ChargingPoint
        {
            Rectifier = d.Load.Rectifier, StoreVoltageV = v, DropsV = drops, PathResistanceOhm = r,
            CutInRpm = double.IsFinite(cutIn) ? cutIn : 0, CurrentAtRatedA = iRated, PowerAtRatedW = iRated * v, Curve = curve,
            OpenCircuitPeakAtMaxRpmV = Math.Max(0, kPeak * coldFactor * W(d.MaxRpm) - drops), ReachableAtRatedV = reachable,
            ChargeTargetV = target, TimeToChargeS = time, StoredEnergyAtRatedJ = energy,
        };
    }
}
