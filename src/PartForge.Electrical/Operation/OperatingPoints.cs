namespace PartForge.Electrical.Operation;

/// <summary>Computes <see cref="GeneratorPoint"/> and <see cref="MotorPoint"/> (see their notes for the models).</summary>
public static class OperatingPoints
{
    /// <summary>
    /// Generator into a resistive load. <paramref name="emfRmsV"/>, <paramref name="rOhm"/>, <paramref name="lUh"/>:
    /// the star-equivalent phase (3-phase) or the winding (1-phase). <paramref name="coilCurrentRatio"/>: coil
    /// wire current per unit of <see cref="GeneratorPoint.CurrentA"/>.
    /// </summary>
    public static GeneratorPoint Generator(int phases, double emfRmsV, double rOhm, double lUh, double loadOhm, double rpm, int polePairs,
        double coilCurrentRatio, double wireAreaMm2)
    {
        double we = 2 * Math.PI * polePairs * rpm / 60;
        double x = we * lUh * 1e-6;
        double z = Math.Sqrt(Math.Pow(rOhm + loadOhm, 2) + x * x);
        double i = z > 0 ? emfRmsV / z : 0;
        int m = phases == 3 ? 3 : 1;
        double pout = m * i * i * loadOhm, pcu = m * i * i * rOhm;
        double wm = 2 * Math.PI * rpm / 60;
        double vt = phases == 3 ? Math.Sqrt(3) * i * loadOhm : i * loadOhm;
        double ic = i * coilCurrentRatio;
        return new GeneratorPoint
        {
            Rpm = rpm, LoadResistanceOhm = loadOhm, CurrentA = i, CoilCurrentA = ic, TerminalVoltageV = vt,
            OutputPowerW = pout, CopperLossW = pcu, Efficiency = pout + pcu > 0 ? pout / (pout + pcu) : 0,
            ShaftTorqueNm = wm > 0 ? (pout + pcu) / wm : 0, CurrentDensityAPerMm2 = ic / wireAreaMm2,
            SourceEmfRmsV = emfRmsV, SourceResistanceOhm = rOhm, SourceReactanceOhm = x, SourcePhases = m,
        };
    }

    /// <summary>
    /// Motor on a DC supply. <paramref name="conductingEmfPerRadS"/>: the EMF of the conducting path per unit
    /// shaft speed (V per rad/s) at equally spaced angles over one electrical period, NaN-free, 0 where the
    /// switch is open (pulse drive); <paramref name="conducting"/> marks where current may flow.
    /// </summary>
    public static MotorPoint Motor(string drive, double supplyV, double dropsV, double pathOhm, IReadOnlyList<double> conductingEmfPerRadS,
        IReadOnlyList<bool> conducting, double ratedRpm, double coilCurrentRatio, double wireAreaMm2)
    {
        double v = Math.Max(0, supplyV - dropsV);
        int n = conductingEmfPerRadS.Count;
        double kMean = 0;
        int on = 0;
        for (int i = 0; i < n; i++) if (conducting[i]) { kMean += conductingEmfPerRadS[i]; on++; }
        kMean = on > 0 ? kMean / on : 0;
        (double iAvg, double tAvg, double iRms) At(double w)
        {
            double si = 0, st = 0, si2 = 0;
            for (int i = 0; i < n; i++)
            {
                if (!conducting[i]) continue;
                double k = conductingEmfPerRadS[i];
                double cur = pathOhm > 0 ? Math.Max(0, (v - k * w) / pathOhm) : 0;
                si += cur; si2 += cur * cur; st += cur * k;
            }
            return (si / n, st / n, Math.Sqrt(si2 / n));
        }
        var stall = At(0);
        // No-load speed: where this model's mean torque falls to zero. The current of each sample is clamped at 0
        // (no reverse current through the switch), so the torque is not zero at v / mean(k) but later: found by
        // bisection between 0 and v / (smallest positive k), beyond which no sample drives a positive current into a
        // positive k. A conduction window that ends where the EMF crosses zero has samples with k close to 0, which
        // would put that bound (and the zero) at an absurd speed while their torque is negligible: samples with k
        // below 0.1 % of the largest are left out of the bound, so the speed found is where the mean torque is zero
        // or below about 0.1 % of the largest sample's share of the stall torque.
        double kMax = 0;
        for (int i = 0; i < n; i++) if (conducting[i]) kMax = Math.Max(kMax, conductingEmfPerRadS[i]);
        double kMinPos = double.PositiveInfinity;
        for (int i = 0; i < n; i++) if (conducting[i] && conductingEmfPerRadS[i] > 1e-3 * kMax) kMinPos = Math.Min(kMinPos, conductingEmfPerRadS[i]);
        double w0 = 0;
        if (stall.tAvg > 0 && double.IsFinite(kMinPos) && pathOhm > 0)
        {
            double lo = 0, hi = v / kMinPos;
            for (int it = 0; it < 80 && hi - lo > 1e-12 * hi; it++)
            {
                double mid = (lo + hi) / 2;
                if (At(mid).tAvg > 0) lo = mid; else hi = mid;
            }
            w0 = (lo + hi) / 2;
        }
        else if (stall.tAvg > 0 && kMean > 0) w0 = v / kMean; // no resistance: the ideal speed of the mean EMF
        double wr = 2 * Math.PI * ratedRpm / 60;
        var rated = At(wr);
        double pin = supplyV * rated.iAvg;
        double pout = rated.tAvg * wr;
        double stallCur = pathOhm > 0 ? v / pathOhm : 0;
        return new MotorPoint
        {
            Drive = drive, SupplyVoltageV = supplyV, SwitchDropV = dropsV, PathResistanceOhm = pathOhm,
            NoLoadRpm = w0 * 60 / (2 * Math.PI), StallTorqueNm = stall.tAvg, StallCurrentA = stallCur,
            RatedRpm = ratedRpm, CurrentAtRatedA = rated.iAvg, TorqueAtRatedNm = rated.tAvg,
            OutputPowerAtRatedW = pout, InputPowerAtRatedW = pin, EfficiencyAtRated = pin > 0 ? pout / pin : 0,
            CopperLossAtRatedW = rated.iRms * rated.iRms * pathOhm,
            CurrentDensityAtRatedAPerMm2 = rated.iRms * coilCurrentRatio / wireAreaMm2,
            CurrentDensityAtStallAPerMm2 = stallCur * coilCurrentRatio / wireAreaMm2,
        };
    }
}
