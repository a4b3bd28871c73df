using System.Numerics;
using PartForge.Design.Machines;
using PartForge.Design.Materials;
using PartForge.Electrical.Coils;
using PartForge.Electrical.Field;
using PartForge.Electrical.Flux;
using PartForge.Electrical.Operation;
using PartForge.Electrical.Thermal;
using PartForge.Electrical.Winding;
using PartForge.Electrical.Wire;

namespace PartForge.Electrical;

public static partial class ElectricalEngine
{
    /// <summary>Field passes at most, when steel behind the magnets saturates (the field is then not linear in Br).</summary>
    private const int MaxFieldPasses = 4;

    /// <summary>Magnet temperatures of two field passes closer than this end the passes, K.</summary>
    private const double FieldPassToleranceK = 0.1;

    /// <summary>The flux-linkage series at the operating temperature, the heat balance, and the magnets' Br there.</summary>
    private sealed record HeatOutcome(FluxLinkageSeries Series, ThermalResult Thermal, double BrOperatingTesla);

    /// <summary>
    /// The hook between the operating point and the heat: the coils' steady temperature T solves
    /// T = T_air + R_th P(T), where P is one coil's copper loss at the governing operating point with the winding at
    /// R20 (1 + 0.00393 (T - 20)) and the magnets at T (their Br by the reversible coefficient, up to the grade's maximum
    /// working temperature). The field is linear in
    /// Br while no steel saturates, so the EMF at T is the EMF at the air's temperature times Br(T) / Br(T_air): one
    /// field evaluation. When a steel face saturates (image strength below 1) the field is evaluated again at the last
    /// magnet temperature until two passes agree within 0.1 K (at most 4 passes); the last small step is scaled.
    /// </summary>
    private static HeatOutcome Heat(MachineModel d, FluxQuadrature q, CoilWinding coil, FluxLinkageSeries seriesAmbient, double brAmbient,
        IReadOnlyList<BackIronFluxResult> ironAmbient, WindingLayout layout, char[] phaseNames, double mult, bool parallel,
        Func<double, double> ohmPhAt, double lPh, WireSpec wire, int p, Switching.SwitchingPlan? plan, double planOhm)
    {
        double br20 = d.Magnets.BrTesla, ambient = d.Operation.AmbientC;
        // The reversible coefficient holds up to the grade's maximum working temperature; beyond it the loss is not
        // reversible and the model does not follow it (the magnet-temperature check fails there): Br is taken at that limit.
        double tMax = Math.Max(ambient, d.Magnets.MaxWorkingTemperatureC);
        double BrAt(double t) => MagnetGrades.BrAt(br20, Math.Min(t, tMax));
        var cooling = CoilCooling.Of(d, coil.Outline);
        var mode = OperatingChoice.For(d);
        int coilsInMachine = Math.Max(1, d.CoilsInMachine);
        bool linear = ironAmbient.All(f => f.ImageStrength >= 1);
        double brField = brAmbient, tm = ambient, tc = ambient, lossCoil = 0;
        var series = seriesAmbient;
        int passes = 0;
        while (true)
        {
            passes++;
            var k = phaseNames.Select(x => PhaseHarmonics(series, layout, x, mult)).ToArray();
            var model = OperatingModel.Of(d, k, series.Orders, parallel, lPh, wire, p, plan, planOhm);
            double brBase = brField;
            double Loss(double t)
            {
                var (g, m) = model.At(BrAt(t) / brBase, ohmPhAt(t));
                double w = mode switch
                {
                    OperatingMode.Motor => m.CopperLossAtRatedW,
                    OperatingMode.Generator => g.CopperLossW,
                    _ => Math.Max(double.IsFinite(m.CopperLossAtRatedW) ? m.CopperLossAtRatedW : 0, double.IsFinite(g.CopperLossW) ? g.CopperLossW : 0),
                };
                return double.IsFinite(w) ? w / coilsInMachine : 0;
            }
            (tc, lossCoil, _) = HeatBalance.Solve(ambient, cooling.ResistanceKPerW, Loss);
            if (linear || passes >= MaxFieldPasses || Math.Abs(tc - tm) < FieldPassToleranceK) break;
            tm = tc;
            brField = BrAt(tm);
            var iron = BackIronFlux.Compute(d, q.FarFactor, brField);
            var field = RotorField.From(d, q.FarFactor, iron, brField);
            series = CoilFlux.Compute(field, coil.Outline, coil.Turns, q);
        }
        double brOp = BrAt(tc);
        var thermal = new ThermalResult
        {
            Point = mode, AmbientC = ambient, CoilTemperatureC = tc, CopperLossPerCoilW = lossCoil, CopperLossW = lossCoil * coilsInMachine,
            Cooling = cooling, MagnetTemperatureC = tc, FieldPasses = passes,
        };
        return new HeatOutcome(series.Scaled(brOp / brField), thermal, brOp);
    }
}
