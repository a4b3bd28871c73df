using System.Collections;
using System.Reflection;
using CsCheck;
using PartForge.Electrical.Wire;
using M = PartForge.Design.Model;

namespace PartForge.Electrical.Tests;

public class ElectricalEngineTests
{
    /// <summary>Every double reachable from the result (properties and lists) is finite.</summary>
    internal static void AssertAllFinite(object? o, string path = "result", int depth = 0)
    {
        if (o is null || depth > 8) return;
        switch (o)
        {
            case double v: Assert.True(double.IsFinite(v), $"{path} = {v}"); return;
            case string or bool or int or char or Enum: return;
            case PartForge.Geometry.Profiles.Contour: return;
            case IEnumerable e:
                int i = 0;
                foreach (var x in e) AssertAllFinite(x, $"{path}[{i++}]", depth + 1);
                return;
        }
        var t = o.GetType();
        if (t.Namespace is null || !t.Namespace.StartsWith("PartForge", StringComparison.Ordinal)) return;
        foreach (var p in t.GetProperties(BindingFlags.Public | BindingFlags.Instance))
            if (p.GetIndexParameters().Length == 0) AssertAllFinite(p.GetValue(o), path + "." + p.Name, depth + 1);
    }

    // Results consistency: resistance = wire length x ohm per metre; phase = coils in series x coil; hot by IEC 60028 alpha.
    [Theory]
    [InlineData("crank")]
    [InlineData("large")]
    [InlineData("pulse")]
    [InlineData("arc")]
    [InlineData("dual-stator")]
    public void ContractValuesAreConsistent(string which)
    {
        var d = Flux.CoilFluxTests.Pick(which);
        var r = ElectricalEngine.Evaluate(PartForge.Design.Machines.MachineModel.From(d));
        Assert.DoesNotContain(r.Diagnostics, x => x.Severity == DiagnosticSeverity.Error);
        AssertAllFinite(r);
        var c = r.Coil!;
        Assert.Equal(c.WireLengthM * c.WireOhmPerM20C, c.Resistance20COhm, 12);
        Assert.Equal(Copper.AtTemperature(c.Resistance20COhm, c.MaxTemperatureC), c.ResistanceHotOhm, 12);
        Assert.Equal(c.Resistance20COhm * r.Phase!.CoilsInSeries / r.Phase.ParallelPaths / (r.Phase.ParallelPaths > 1 ? 1 : 1), r.Phase.Resistance20COhm, 9);
        Assert.Equal(d.Machine.Poles / 2, r.PolePairs);
        Assert.True(r.MagneticGapMm > 0);
        Assert.True(r.Phase.EmfRmsV > 0 && r.LineEmfRmsV > 0 && r.KeVPerKrpm > 0);
        Assert.True(r.Phase.EmfPeakV >= r.Phase.EmfRmsV);
        Assert.Equal(PartForge.Design.Machines.MachineModel.From(d).Stack.MagneticGapMm, r.MagneticGapMm, 12);
        Assert.Equal(d.Machine.Coils, r.Winding.Table.Count);
        Assert.NotNull(r.Coil!.Outline);
    }

    // Bad but loadable designs come back as diagnostics naming the key, never an exception or NaN. (A missing wire
    // or magnet size, an unknown grade, overlapping magnets or a connection that does not fit the phases cannot
    // reach the engine: the loader refuses them with located errors, see DesignRulesTests, and the machine model
    // cannot hold them.)
    [Theory]
    [InlineData("coils-not-multiple-of-3", "winding-invalid", "machine.coils")]
    [InlineData("unbalanced", "winding-invalid", "machine.coils")]
    [InlineData("turns-do-not-fit", "coil-overlap", "coils.turns")]
    [InlineData("wire-thicker-than-window", "wire-thicker-than-window", "coils.wire")]
    [InlineData("fill-impossible", "fill-unachievable", "coils.fill_factor")]
    [InlineData("no-turns", "coil-turns-missing", "coils.turns")]
    public void BadDesignsGiveDiagnostics(string fault, string id, string key)
    {
        var d = TestDesigns.Crank();
        d = fault switch
        {
            "coils-not-multiple-of-3" => Copy.With(d, machine: Copy.Machine(d.Machine, coils: 10)),
            "unbalanced" => Copy.With(d, machine: Copy.Machine(d.Machine, coils: 6, poles: 6)),
            "turns-do-not-fit" => Copy.With(d, coils: Copy.Coils(d.Coils, turns: 2000)),
            "wire-thicker-than-window" => Copy.With(d, coils: Copy.Coils(d.Coils, height: 0.5, wire: new M.Wire { Awg = 20 }, fill: 0.3)),
            "fill-impossible" => Copy.With(d, coils: Copy.Coils(d.Coils, fill: 0.85, wire: new M.Wire { Awg = 40 }, enamel: "grade-3")),
            "no-turns" => Copy.With(d, coils: Copy.Coils(d.Coils, clearTurns: true)),
            _ => throw new ArgumentException(fault),
        };
        var r = ElectricalEngine.Evaluate(PartForge.Design.Machines.MachineModel.From(d));
        Assert.True(r.HasErrors);
        var diag = Assert.Single(r.Diagnostics, x => x.Id == id);
        Assert.Equal(DiagnosticSeverity.Error, diag.Severity);
        Assert.Equal(key, diag.Key);
        Assert.Contains(key.Split('.')[0], diag.Message);
        AssertAllFinite(r);
    }

    // Solving the turns for a target phase EMF: the solved machine gives the target within one turn's worth.
    [Fact]
    public void TargetEmfIsReached()
    {
        var d = TestDesigns.Crank();
        d = Copy.With(d, coils: Copy.Coils(d.Coils, clearTurns: true, target: new M.TargetEmf { Rms = 3.0, Rpm = 400 }));
        var r = ElectricalEngine.Evaluate(PartForge.Design.Machines.MachineModel.From(d));
        Assert.False(r.HasErrors, string.Join("; ", r.Diagnostics));
        Assert.True(r.Coil!.TurnsSolved);
        double perTurn = r.Phase!.EmfRmsV / r.Coil.Turns;
        Assert.Equal(3.0, r.Phase.EmfRmsV, 1.5 * perTurn);
        Assert.NotNull(r.Coil.ThickestFittingAwg);
        // The thickest fitting wire really fits: its build at the solved turns stays within the neighbour gap.
        var w = WireSpec.OfAwg(r.Coil.ThickestFittingAwg!.Value, 2);
        Assert.True(r.Coil.Turns * w.CopperAreaMm2 / (0.45 * 5) <= (2 * 40 * Math.Sin(Math.PI / 9) - 8) / 2 + 1e-9);
    }

    // Extra-low-voltage warnings (IEC 61140: 50 V AC rms, 120 V DC), with the caution about local codes.
    [Fact]
    public void ExtraLowVoltageWarning()
    {
        var d = TestDesigns.Large();
        d = Copy.With(d, machine: Copy.Machine(d.Machine, max: 3000));
        var r = ElectricalEngine.Evaluate(PartForge.Design.Machines.MachineModel.From(d));
        var w = Assert.Single(r.Diagnostics, x => x.Id == "emf-above-elv-ac");
        Assert.Equal(DiagnosticSeverity.Warning, w.Severity);
        Assert.Contains("local electrical codes", w.Message);
        Assert.True(r.LineEmfRmsAtMaxRpmV > 50);
        Assert.DoesNotContain(ElectricalEngine.Evaluate(PartForge.Design.Machines.MachineModel.From(TestDesigns.Crank())).Diagnostics, x => x.Id.StartsWith("emf-above", StringComparison.Ordinal));
    }

    // Property: random loadable machines never throw and never produce a non-finite number.
    [Fact]
    public void RandomDesignsNeverThrowOrNaN()
    {
        var gen = Gen.Select(Gen.Int[1, 14], Gen.Int[1, 12], Gen.Int[0, 2], Gen.Int[0, 2], Gen.Int[1, 600], Gen.Double[0.1, 3], Gen.Int[0, 1], Gen.Int[20, 40]);
        gen.Sample(t =>
        {
            var (pp, q, layoutI, shapeI, turns, gap, ph, awg) = t;
            string layout = new[] { "single-rotor", "dual-rotor", "dual-stator" }[layoutI];
            string shape = new[] { "disc", "block", "arc" }[shapeI];
            var mag = shape switch
            {
                "disc" => new M.Magnets { Shape = "disc", Diameter = 8, Thickness = 3, PitchRadius = 35 },
                "block" => new M.Magnets { Shape = "block", Length = 12, Width = 6, Thickness = 3, PitchRadius = 35 },
                _ => new M.Magnets { Shape = "arc", InnerRadius = 28, OuterRadius = 42, Span = 360.0 / (2 * pp) * 0.8, Thickness = 3 },
            };
            var d = new M.Design
            {
                Machine = new M.Machine { Layout = layout, Poles = 2 * pp, Coils = q, Phases = ph == 0 ? 1 : 3, RatedRpm = 500, MaxRpm = 1000 },
                Magnets = mag,
                Coils = new M.Coils { Shape = turns % 2 == 0 ? "round" : "keystone", Wire = new M.Wire { Awg = awg }, Turns = turns, Core = new M.Core { Diameter = 5, Width = 5 } },
                Gap = new M.Gap { AirGap = gap },
                Sensor = new M.Sensor { Kind = "hall", Count = ph == 0 ? 1 : 3 },
            };
            var r = ElectricalEngine.Evaluate(PartForge.Design.Machines.MachineModel.From(d), PartForge.Electrical.Flux.FluxQuadrature.Default with { RadialOrder = 3, AxialOrder = 2, AngularOrder = 6 });
            AssertAllFinite(r);
        }, iter: 40, threads: 1);
    }
}
