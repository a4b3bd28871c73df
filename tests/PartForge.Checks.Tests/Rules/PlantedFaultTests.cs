namespace PartForge.Checks.Tests.Rules;

/// <summary>
/// For each check, a design with one planted fault that fails exactly that check, and a near miss that does
/// not fail. The expected values are computed here from the closed forms, independently of the checker.
/// </summary>
public class PlantedFaultTests
{
    private static readonly TestMachine Base = new();

    /// <summary>A large thin rotor (invented) for the pull checks: OD 200, magnets on r 80, t 4.</summary>
    private static readonly TestMachine BigThin = Base.With(m =>
    {
        m.RotorOd = 200; m.MagnetPitch = 80; m.RotorT = 4; m.PocketFloor = 1.2; m.MagnetT = 2.5;
        m.StatorOd = 220; m.AirGap = 2.5; m.PullN = 50;
    });

    private static void AssertOnlyFailure(CheckReport report, string id)
    {
        var fails = report.Checks.Where(c => c.Status == CheckStatus.Fail).Select(c => $"{c.Id}: {c.Message}").ToList();
        Assert.True(fails.Count > 0 && report.Checks.Where(c => c.Status == CheckStatus.Fail).All(c => c.Id == id),
            $"expected only {id} to fail, got: {string.Join(" | ", fails)}");
        Assert.True(report.HasFailures);
    }

    private static void AssertNoFailure(CheckReport report)
    {
        var fails = report.Checks.Where(c => c.Status == CheckStatus.Fail).Select(c => $"{c.Id}: {c.Message}").ToList();
        Assert.True(fails.Count == 0, string.Join(" | ", fails));
    }

    private static CheckResult One(CheckReport r, string id) => r.Checks.First(c => c.Id == id);

    // Roark Table 11.2 case 1j written out again here (independent of the checker's code), for the tests' own
    // expected deflections and stresses. Source: Roark's Formulas for Stress and Strain, 7th ed., Table 11.2.
    private static (double Y, double Sigma) Roark(double force, double r0, double a, double b, double e, double nu, double t)
    {
        static (double C2, double C3, double C8, double C9) K(double a, double b, double nu)
        {
            double q = b / a, l = Math.Log(a / b);
            return (0.25 * (1 - q * q * (1 + 2 * l)), b / (4 * a) * ((q * q + 1) * l + q * q - 1), 0.5 * (1 + nu + (1 - nu) * q * q), q * ((1 + nu) / 2 * l + (1 - nu) / 4 * (1 - q * q)));
        }
        var (c2, c3, c8, c9) = K(a, b, nu);
        var (_, l3, _, l9) = K(a, r0, nu);
        double w = force / (2 * Math.PI * r0), d = e * t * t * t / (12 * (1 - nu * nu));
        double y = w * a * a * a / d * (c2 / c8 * (r0 / b * c9 - l9) - r0 / b * c3 + l3);
        double m = w * a / c8 * (r0 / b * c9 - l9);
        return (y, 6 * m / (t * t));
    }

    [Fact]
    public void Running_gap()
    {
        var bad = Base.With(m => m.AirGap = 0.5);
        var r = bad.Check();
        var c = One(r, CheckIds.RunningGap);
        // worst = air_gap - print_z (rotor) - print_z (stator pack) - runout - axial_play - rim deflection
        double defl = Roark(20, 40, 55, 12, 3500, 0.35, 7).Y;
        Assert.Equal(0.5 - 0.1 - 0.1 - 0.1 - 0.05 - defl, c.Value, 6);
        Assert.Equal(CheckStatus.Fail, c.Status);
        Assert.Contains("raise gap.air_gap to at least", c.Message);
        // The fix is computed: air_gap + (limit + band - worst), band = max(0.1, 25% of 0.3) = 0.1.
        double fix = 0.5 + (0.3 + 0.1 - c.Value);
        Assert.Contains($"at least {Judge.Up(fix)}", c.Message);
        Assert.NotEqual(CheckStatus.Fail, One(r, CheckIds.RotationClearance).Status); // the nominal 0.5 mm is still clear
        AssertOnlyFailure(r, CheckIds.RunningGap);
        // Near miss: the fix itself passes.
        AssertNoFailure(Base.With(m => m.AirGap = fix).Check());
        Assert.Equal(CheckStatus.Pass, One(Base.With(m => m.AirGap = fix + 0.005).Check(), CheckIds.RunningGap).Status);
    }

    [Fact]
    public void Magnet_pull_deflection()
    {
        var bad = BigThin.With(m => m.RotorMaterial = "PA");
        var r = bad.Check();
        var c = One(r, CheckIds.MagnetPullDeflection);
        // Nylon (E 1.5 GPa, nu 0.4), a 100, clamped at the 12 mm bolt circle radius, ring load at r 80.
        Assert.Equal(Roark(50, 80, 100, 12, 1500, 0.4, 4).Y, c.Value, 6);
        Assert.Equal(0.5 * 2.5, c.Limit, 9);
        Assert.Contains("thicken rotor.thickness to", c.Message);
        AssertOnlyFailure(r, CheckIds.MagnetPullDeflection);
        AssertNoFailure(BigThin.With(m => m.RotorMaterial = "PA").With(m => m.RotorT = 4.3).Check());
    }

    [Fact]
    public void Magnet_pull_stress()
    {
        var bad = BigThin.With(m => { m.RotorT = 3; m.AirGap = 5; m.MagnetT = 1.5; });
        var r = bad.Check();
        var c = One(r, CheckIds.MagnetPullStress);
        Assert.Equal(Roark(50, 80, 100, 12, 3500, 0.35, 3).Sigma, c.Value, 6);
        Assert.Equal(30.0 / 3, c.Limit, 9);
        AssertOnlyFailure(r, CheckIds.MagnetPullStress);
        AssertNoFailure(bad.With(m => m.PullN = 40).Check());
    }

    private static double Omega(double rpm) => rpm * 2 * Math.PI / 60;
    private static double MagnetMassKg(double d, double t) => Math.PI * d * d / 4 * t * 1e-9 * 7500;

    [Fact]
    public void Rotor_hoop_stress()
    {
        var bad = Base.With(m => m.MaxRpm = 15000);
        var r = bad.Check();
        var c = One(r, CheckIds.RotorHoopStress);
        // Timoshenko & Goodier disc term plus the magnets as a Lame ring traction at the pitch radius.
        double w = Omega(15000), a = 4e-3, b = 55e-3, nu = 0.35;
        double own = (3 + nu) / 4 * 1240 * w * w * (b * b + (1 - nu) / (3 + nu) * a * a) * 1e-6;
        double p = 12 * MagnetMassKg(12, 4) * 0.040 * w * w / (2 * Math.PI * 40 * 7);
        double expected = own + 2 * p * 1600 / (1600 - 16);
        Assert.Equal(expected, c.Value, 6);
        Assert.Contains("lower machine.max_rpm to", c.Message);
        AssertOnlyFailure(r, CheckIds.RotorHoopStress);
        AssertNoFailure(Base.With(m => m.MaxRpm = 12000).Check());
    }

    [Fact]
    public void Magnet_retention()
    {
        // Rim wall of 2 mm: OD = 2 (40 + 6.075 + 2).
        var thinRim = Base.With(m => m.RotorOd = 2 * (40 + 6.075 + 2));
        var r = thinRim.With(m => m.MaxRpm = 8000).Check();
        var c = One(r, CheckIds.MagnetRetention);
        Assert.Equal(MagnetMassKg(12, 4) * 0.040 * Omega(8000) * Omega(8000), c.Value, 6);
        // Two shear planes of 2 mm x 4 mm (magnet thickness < pocket depth) at half of 30 MPa / 3.
        Assert.Equal(2 * 2.0 * 4 * (0.5 * 30 / 3), c.Limit, 6);
        AssertOnlyFailure(r, CheckIds.MagnetRetention);
        AssertNoFailure(thinRim.With(m => m.MaxRpm = 6500).Check());
    }

    [Fact]
    public void Magnet_pull_out()
    {
        var alu = Base.With(m => m.RotorMaterial = "aluminium");
        var r = alu.With(m => m.PullN = 1700).Check();
        var c = One(r, CheckIds.MagnetPullOut);
        Assert.Equal(1700.0 / 12, c.Value, 9);
        // Glue at 1 MPa over the side wall (pi 12 x 4) and the floor (pi 6^2), safety factor 2.
        Assert.Equal((Math.PI * 12 * 4 + Math.PI * 36) / 2, c.Limit, 9);
        AssertOnlyFailure(r, CheckIds.MagnetPullOut);
        AssertNoFailure(alu.With(m => m.PullN = 1200).Check());
    }

    [Fact]
    public void Winding_fill()
    {
        var r = Base.With(m => m.Fill = 0.75).Check();
        var c = One(r, CheckIds.WindingFill);
        // Hexagonal packing of the insulated wire: 0.9069 (0.321 / 0.357)^2.
        Assert.Equal(0.9069 * Math.Pow(0.321 / 0.357, 2), c.Limit, 9);
        Assert.Equal(0.75, c.Value, 12);
        AssertOnlyFailure(r, CheckIds.WindingFill);
        var near = Base.With(m => m.Fill = 0.70).Check();
        AssertNoFailure(near);
        Assert.Equal(CheckStatus.Warn, One(near, CheckIds.WindingFill).Status); // above the 0.30-0.50 random-wound practice
    }

    [Fact]
    public void Current_density()
    {
        var r = Base.With(m => m.CurrentDensity = 7).Check();
        var c = One(r, CheckIds.CurrentDensity);
        Assert.Equal(7, c.Value, 12);
        // Fix: the bare diameter that brings 7 A/mm^2 down to 4.5: 0.321 sqrt(7 / 4.5); AWG from ASTM B258.
        double d = 0.321 * Math.Sqrt(7 / 4.5);
        Assert.Contains($"{Judge.F(d)} mm bare", c.Message);
        int awg = (int)Math.Floor(36 - 39 * Math.Log(d / 0.127) / Math.Log(92));
        Assert.True(0.127 * Math.Pow(92, (36 - awg) / 39.0) >= d);
        Assert.Contains($"awg {awg} ", c.Message);
        AssertOnlyFailure(r, CheckIds.CurrentDensity);
        AssertNoFailure(Base.With(m => m.CurrentDensity = 4.4).Check());
    }

    [Fact]
    public void Coil_temperature()
    {
        // The computed steady temperature against coils.max_temperature (60, the model's default) bounded by the PLA
        // former's softening point: PLA glass transition 55-60 C (docs/physics.md §8), lower end.
        var r = Base.With(m => m.CoilTemp = 56).Check();
        var c = One(r, CheckIds.CoilTemperature);
        Assert.Equal(55, c.Limit, 12);
        Assert.Equal(56, c.Value, 12);
        AssertOnlyFailure(r, CheckIds.CoilTemperature);
        Assert.Contains("parts.former.material", c.Message);   // the fix names the former's material
        AssertNoFailure(Base.With(m => m.CoilTemp = 44).Check());
        // PETG former and stator (softening about 75 C, from memory), a user limit above it: 64 C passes, 76 C fails.
        var petg = Base.With(m => { m.StatorMaterial = "PETG"; m.FormerMaterial = "PETG"; m.MaxTemp = 90; });
        AssertNoFailure(petg.With(m => m.CoilTemp = 64).Check());
        Assert.Equal(CheckStatus.Fail, One(petg.With(m => m.CoilTemp = 76).Check(), CheckIds.CoilTemperature).Status);
    }

    [Fact]
    public void Coil_temperature_limit_is_the_users_when_lower()
    {
        var c = One(Base.With(m => { m.MaxTemp = 45; m.CoilTemp = 46; }).Check(), CheckIds.CoilTemperature);
        Assert.Equal(CheckStatus.Fail, c.Status);
        Assert.Equal(45, c.Limit, 12);
        Assert.Contains("coils.max_temperature 45", c.Message);
        Assert.Equal(CheckStatus.Pass, One(Base.With(m => { m.MaxTemp = 45; m.CoilTemp = 34; }).Check(), CheckIds.CoilTemperature).Status);
    }

    // The fix gives the loss allowed, (limit - 10 - air) / R_th (the 10 C warning band), and the former material that
    // stands the heat; the generator's wire, turns and load are recomputed from the engine's source figures (tested
    // against the real pipeline in Export.Tests/Results/HeatResultsTests).
    [Fact]
    public void Coil_temperature_fix_gives_the_allowed_loss()
    {
        var m = Base.With(x => { x.CoilTemp = 60; x.CoilLossW = 0.175; x.CoilRthKPerW = 200; });
        var c = One(m.Check(), CheckIds.CoilTemperature);
        double allowed = (55 - 10 - 25) / 200.0;                  // 0.1 W
        Assert.Contains($"one coil may shed {allowed.ToString(System.Globalization.CultureInfo.InvariantCulture)} W", c.Message);
        Assert.Contains("parts.former.material: PETG", c.Message);
        Assert.DoesNotContain("supply_voltage", c.Message);
    }

    // A motor at rated speed draws (V - e) / R: thicker wire would raise its current, so the fix names the supply and the turns.
    [Fact]
    public void Coil_temperature_fix_for_a_motor()
    {
        var c = One(Base.With(x => { x.CoilTemp = 60; x.CoilLossW = 0.175; x.Motor = true; }).Check(), CheckIds.CoilTemperature);
        Assert.Contains("operation.supply_voltage", c.Message);
        Assert.Contains("more coils.turns", c.Message);
        Assert.DoesNotContain("coils.wire.awg", c.Message);
    }

    // Grade suffix working temperatures (makers' grade tables, common practice, from memory): N 80 C, H 120 C.
    [Fact]
    public void Magnet_temperature()
    {
        var r = Base.With(m => { m.MagnetTemp = 85; m.CoilTemp = 40; }).Check();
        var c = One(r, CheckIds.MagnetTemperature);
        Assert.Equal(80, c.Limit, 12);
        Assert.Equal(CheckStatus.Fail, c.Status);
        Assert.Contains("magnets.grade N42M", c.Message);   // the first suffix rated for 85 + 10 C (M, 100 C)
        Assert.Contains("thicker wire", c.Message);           // a generator's coils cool with thicker wire
        Assert.Contains("operation.supply_voltage", One(Base.With(m => { m.MagnetTemp = 85; m.Motor = true; }).Check(), CheckIds.MagnetTemperature).Message);
        Assert.Equal(CheckStatus.Warn, One(Base.With(m => m.MagnetTemp = 75).Check(), CheckIds.MagnetTemperature).Status);
        var h = Base.With(m => { m.MagnetTemp = 85; m.Grade = "N42H"; }).Check();
        Assert.Equal(120, One(h, CheckIds.MagnetTemperature).Limit, 12);
        Assert.Equal(CheckStatus.Pass, One(h, CheckIds.MagnetTemperature).Status);
    }

    [Fact]
    public void Coil_coil_clearance()
    {
        var r = Base.With(m => m.Turns = 240).Check();
        var c = One(r, CheckIds.CoilCoilClearance);
        // Round coils on r 40, 9 of them: centre distance 2 r sin(20 deg); winding radius core/2 + build;
        // minus the two 1 mm flange margins.
        double build = 240 * Math.PI * 0.321 * 0.321 / 4 / (0.45 * 5);
        double expected = 2 * 40 * Math.Sin(Math.PI / 9) - 2 * (4 + build) - 2 * 1.0;
        Assert.Equal(expected, c.Value, 9);
        Assert.Equal(0.8 + 2 * 0.1, c.Limit, 12);
        AssertOnlyFailure(r, CheckIds.CoilCoilClearance);
        AssertNoFailure(Base.With(m => m.Turns = 220).Check());
    }

    [Fact]
    public void Rotation_clearance_reports_the_nominal_minimum_and_where()
    {
        // With zero tolerances the sweep and the stack-up see the same nominal gap: 0.25 mm between the rotor
        // face and the stationary face (the magnets are recessed 1.8 mm in their pockets).
        var bad = Base.With(m => { m.AirGap = 0.25; m.PrintZ = 0; m.Runout = 0; m.AxialPlay = 0; m.PullN = 0; });
        var r = bad.Check();
        var c = One(r, CheckIds.RotationClearance);
        Assert.Equal(0.25, c.Value, 3);
        Assert.Equal(CheckStatus.Fail, c.Status);
        Assert.NotNull(c.Where?.AngleDeg);
        Assert.Equal(CheckStatus.Fail, One(r, CheckIds.RunningGap).Status);
        AssertNoFailure(bad.With(m => m.AirGap = 0.45).Check());
    }
}
