using PartForge.Design.Machines;
using PartForge.Design.Materials;
using PartForge.Electrical.Field;
using PartForge.Electrical.Flux;
using PartForge.Electrical.Thermal;
using M = PartForge.Design.Model;

namespace PartForge.Electrical.Tests.Thermal;

/// <summary>The coils' heat balance and the magnets' temperature (docs/physics.md §13).</summary>
public class CoilHeatTests
{
    // Published and common-practice figures, typed here from their sources (not read from the code under test):
    private const double CopperAlpha = 0.00393;   // Source: IEC 60028, temperature coefficient of annealed copper at 20 C, 1/K.
    private const double BrAlpha = -0.0012;       // Source: makers' NdFeB grade tables, -0.11 to -0.12 %/K reversible (from memory; the steeper end).
    private const double H = 10;                  // Common practice (from memory): natural convection from small surfaces in still air, W/(m^2 K).
    private const double PlaK = 0.13;             // From memory: thermal conductivity of unfilled PLA, W/(m K).

    /// <summary>Invented: a 1-phase single-rotor generator (no sensor) into a small load, so its coils warm up by tens of kelvin.</summary>
    private static M.Design Warm(double loadOhm = 1.5, double rpm = 1500) => new()
    {
        Name = "test-warm",
        Machine = new M.Machine { Layout = "single-rotor", Poles = 8, Coils = 8, Phases = 1, Connection = "series", RatedRpm = rpm, MaxRpm = 2000 },
        Magnets = new M.Magnets { Shape = "disc", Diameter = 12, Thickness = 4, Grade = "N42", PitchRadius = 32 },
        Rotor = new M.Rotor { OuterDiameter = 90, Thickness = 6, PocketFloor = 1.2 },
        Coils = new M.Coils { Shape = "round", Wire = new M.Wire { Awg = 27 }, Turns = 90, FillFactor = 0.45, Height = 5, Core = new M.Core { Diameter = 8 } },
        Stator = new M.Stator { InnerDiameter = 20, OuterDiameter = 110, Thickness = 6 },
        Sensor = new M.Sensor { Kind = "none" },
        Operation = new M.Operation { LoadResistance = loadOhm },
    };

    private static (MachineModel M, ElectricalResult R) Run(M.Design d)
    {
        var m = MachineModel.From(d);
        return (m, ElectricalEngine.Evaluate(m));
    }

    // Hand calculation of one coil: its face area from its own diameters (annulus), the two-face heat path with the
    // flange's conduction and the convection coefficient, the series circuit's current at the hot resistance, and the
    // balance T = T_air + R_th I^2 R_coil(T). Sources: IEC 60028 (copper), Fourier's law across a slab and Newton's law of
    // cooling (textbook), Ohm's law for the series circuit; h and k as above.
    [Fact]
    public void Single_coil_matches_a_hand_calculation()
    {
        var (m, r) = Run(Warm());
        var c = r.Coil!;
        var t = r.Thermal!;
        double area = Math.PI / 4 * (c.OuterDiameterMm!.Value * c.OuterDiameterMm.Value - c.InnerDiameterMm!.Value * c.InnerDiameterMm.Value) * 1e-6; // m^2
        double perFace = 0.8e-3 / (PlaK * area) + 1 / (H * area);
        double rth = perFace / 2;
        Assert.Equal(rth, t.Cooling.ResistanceKPerW, 9);

        double tc = t.CoilTemperatureC;
        double rCoil = c.Resistance20COhm * (1 + CopperAlpha * (tc - 20));
        double rPhase = 8 * rCoil;
        double x = 2 * Math.PI * 4 * 1500 / 60 * r.Phase!.InductanceUh * 1e-6;
        double i = r.Phase.EmfRmsV / Math.Sqrt(Math.Pow(rPhase + 1.5, 2) + x * x);
        double handT = 25 + rth * i * i * rCoil;
        Assert.Equal(handT, tc, 6);
        Assert.InRange(tc - 25, 10, 200);   // the case is meant to heat up: the check is not vacuous
        Assert.Equal(i * i * rCoil, t.CopperLossPerCoilW, 9);
        Assert.Equal(t.CopperLossPerCoilW * 8, t.CopperLossW, 9);
    }

    // An independent integration of the same balance: plain fixed-point iteration from the air's temperature with the EMF
    // scaled by the magnets' Br (their coefficient above) and the resistance by copper's, against the engine's bracketing root.
    [Fact]
    public void Fixed_point_iteration_from_cold_reaches_the_same_temperature()
    {
        var (m, r) = Run(Warm());
        var c = r.Coil!;
        double rth = (0.8e-3 / (PlaK * c.Outline!.WindingPlanAreaMm2 * 1e-6) + 1 / (H * c.Outline.WindingPlanAreaMm2 * 1e-6)) / 2;
        double br20 = 1.30; // N42 mid-range (makers' tables)
        double Br(double tc) => br20 * (1 + BrAlpha * (tc - 20));
        double eAt25 = r.Phase!.EmfRmsV * Br(25) / Br(r.Thermal!.MagnetTemperatureC);
        double x = 2 * Math.PI * 4 * 1500 / 60 * r.Phase.InductanceUh * 1e-6;
        double temp = 25;
        for (int it = 0; it < 500; it++)
        {
            double rc = c.Resistance20COhm * (1 + CopperAlpha * (temp - 20));
            double e = eAt25 * Br(temp) / Br(25);
            double i = e / Math.Sqrt(Math.Pow(8 * rc + 1.5, 2) + x * x);
            temp = 25 + rth * i * i * rc;
        }
        Assert.Equal(temp, r.Thermal.CoilTemperatureC, 4);
        Assert.Equal(Br(temp), r.Magnet.BrOperatingTesla, 6);
        Assert.Equal(Br(25), r.Magnet.BrAmbientTesla, 12);
    }

    // Cold and hot resistances agree with the iterated temperature (IEC 60028), for the coil and the phase, every kind of machine.
    [Theory]
    [InlineData("crank")]
    [InlineData("large")]
    [InlineData("pulse")]
    [InlineData("arc")]
    [InlineData("dual-stator")]
    public void Hot_resistance_is_at_the_steady_temperature(string which)
    {
        var r = ElectricalEngine.Evaluate(MachineModel.From(Flux.CoilFluxTests.Pick(which)));
        var t = r.Thermal!;
        Assert.Equal(t.CoilTemperatureC, r.Coil!.TemperatureC, 12);
        Assert.Equal(r.Coil.Resistance20COhm * (1 + CopperAlpha * (t.CoilTemperatureC - 20)), r.Coil.ResistanceHotOhm, 10);
        Assert.Equal(r.Phase!.Resistance20COhm * (1 + CopperAlpha * (t.CoilTemperatureC - 20)), r.Phase.ResistanceHotOhm, 10);
        Assert.True(t.CoilTemperatureC >= t.AmbientC);
        // The heat balance holds at the reported point: rise = R_th x loss.
        Assert.Equal(t.CoilTemperatureC - t.AmbientC, t.Cooling.ResistanceKPerW * t.CopperLossPerCoilW, 6);
    }

    // The motor's copper loss is its path current's mean square times the path resistance, and it heats the coils when the
    // machine has a sensor (driven as a motor).
    [Fact]
    public void A_motor_generator_heats_at_the_harder_of_its_two_points()
    {
        // machine.role decides (never the sensor): a motor-generator is judged at the larger copper loss.
        var r = ElectricalEngine.Evaluate(MachineModel.From(TestDesigns.Pulse()));
        var t = r.Thermal!;
        Assert.Equal(PartForge.Electrical.Operation.OperatingMode.Both, t.Point);
        Assert.Equal(Math.Max(r.Motor!.CopperLossAtRatedW, r.Generator!.CopperLossW), t.CopperLossW, 9);
        Assert.True(t.CopperLossW > 0);
    }

    // The EMF at the operating temperature: the engine scales the field it computed at the air's temperature by the Br ratio;
    // a direct evaluation of the field at the operating Br gives the same flux linkage (the field is linear in the sources).
    [Theory]
    [InlineData("large")]   // back iron, not saturated
    [InlineData("crank")]
    public void Flux_at_the_operating_temperature_equals_a_direct_evaluation(string which)
    {
        var m = MachineModel.From(Flux.CoilFluxTests.Pick(which));
        var r = ElectricalEngine.Evaluate(m);
        double br = r.Magnet.BrOperatingTesla;
        var iron = BackIronFlux.Compute(m, RotorField.DefaultFarFactor, br);
        var direct = CoilFlux.Compute(RotorField.From(m, RotorField.DefaultFarFactor, iron, br), r.Coil!.Outline!, r.Coil.Turns, FluxQuadrature.Default);
        Assert.Equal(direct.PeakWb(), r.CoilFluxLinkagePeakWb, 12);
        Assert.True(r.Magnet.BrOperatingTesla < r.Magnet.BrAmbientTesla || r.Thermal!.CoilTemperatureC == r.Thermal.AmbientC);
    }

    // Thin back iron saturates: the field is no longer linear in Br, so the engine evaluates it again at the magnets'
    // temperature; the result must agree with a direct evaluation there within the passes' tolerance (0.1 K, 0.012 % of Br).
    [Fact]
    public void Saturated_iron_takes_more_field_passes_and_agrees_with_a_direct_evaluation()
    {
        var d = Warm(loadOhm: 0.8, rpm: 2000);
        d = new M.Design
        {
            Name = d.Name, Machine = d.Machine, Magnets = d.Magnets, Coils = d.Coils, Stator = d.Stator, Sensor = d.Sensor, Operation = d.Operation,
            Rotor = new M.Rotor { OuterDiameter = 90, Thickness = 6, PocketFloor = 1.2, BackIron = new M.BackIron { Thickness = 0.2 } },
        };
        var m = MachineModel.From(d);
        var r = ElectricalEngine.Evaluate(m);
        Assert.Contains(r.BackIron, f => f.ImageStrength < 1);
        var t = r.Thermal!;
        Assert.True(t.CoilTemperatureC - t.AmbientC > 1, $"rise {t.CoilTemperatureC - t.AmbientC}");
        Assert.InRange(t.FieldPasses, 2, 4);
        double br = r.Magnet.BrOperatingTesla;
        var iron = BackIronFlux.Compute(m, RotorField.DefaultFarFactor, br);
        var direct = CoilFlux.Compute(RotorField.From(m, RotorField.DefaultFarFactor, iron, br), r.Coil!.Outline!, r.Coil.Turns, FluxQuadrature.Default);
        Assert.Equal(1, r.CoilFluxLinkagePeakWb / direct.PeakWb(), 3);
    }

    // Heat that grows linearly with the temperature (a constant current in a copper winding) has a closed-form balance:
    // T = (T_air + R_th P20 (1 - 20 alpha)) / (1 - R_th P20 alpha) (algebra on the IEC 60028 linear rule).
    [Theory]
    [InlineData(25, 100, 0.2)]
    [InlineData(-10, 300, 0.5)]
    [InlineData(40, 50, 0.01)]
    public void Heat_balance_solves_the_linear_case_exactly(double air, double rth, double p20)
    {
        double expected = (air + rth * p20 * (1 - 20 * CopperAlpha)) / (1 - rth * p20 * CopperAlpha);
        var (t, heat, n) = HeatBalance.Solve(air, rth, tc => p20 * (1 + CopperAlpha * (tc - 20)));
        Assert.Equal(expected, t, 5);
        Assert.Equal(p20 * (1 + CopperAlpha * (t - 20)), heat, 9);
        Assert.InRange(n, 1, 200);
    }

    // Reversible Br coefficient and the grade suffixes (makers' tables, from memory: N 80, M 100, H 120, SH 150, UH 180, EH 200 C).
    [Theory]
    [InlineData("N42", 80)]
    [InlineData("N42M", 100)]
    [InlineData("N38H", 120)]
    [InlineData("N35SH", 150)]
    [InlineData("N35UH", 180)]
    [InlineData("N35EH", 200)]
    public void Grade_suffix_sets_the_working_temperature(string grade, double maxC) =>
        Assert.Equal(maxC, MagnetGrades.MaxWorkingTemperatureC(grade));

    [Fact]
    public void Remanence_falls_by_the_reversible_coefficient()
    {
        Assert.Equal(1.30, MagnetGrades.BrAt(1.30, 20), 12);
        Assert.Equal(1.30 * (1 - 0.0012 * 60), MagnetGrades.BrAt(1.30, 80), 12);
        Assert.InRange(-MagnetGrades.BrTemperatureCoefficientPerK * 100, 0.11, 0.12); // within the published -0.11 to -0.12 %/K
    }
}
