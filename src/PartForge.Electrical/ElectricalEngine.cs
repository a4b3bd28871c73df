using System.Globalization;
using System.Numerics;
using PartForge.Design.Machines;
using PartForge.Design.Materials;
using PartForge.Electrical.Coils;
using PartForge.Electrical.Field;
using PartForge.Electrical.Flux;
using PartForge.Electrical.Operation;
using PartForge.Electrical.Sensors;
using PartForge.Electrical.Thermal;
using PartForge.Electrical.Switching;
using PartForge.Electrical.Wire;
using PartForge.Electrical.Winding;

namespace PartForge.Electrical;

/// <summary>
/// The electrical engine: from magnets, coils and wire to flux linkage, back-EMF, resistance, winding layout,
/// sensor angles and operating points. Pure and deterministic; never throws on a loadable design: problems
/// come back as <see cref="ElectricalResult.Diagnostics"/>.
///
/// EMF: coil k at angle psi_k links lambda_0(theta - psi_k); phase X links Sum_k d_k lambda_0(theta - psi_k)
/// over its coils with their directions d_k (from the winding table), so each harmonic n of the phase is
/// C_n S_X,n with S_X,n = Sum_k d_k exp(-i n p psi_k); e = d lambda / dt at the speed (rotor counter-clockwise).
/// The winding factor is not applied again: the coil's own pitch effect is inside the integrated flux.
/// </summary>
public static partial class ElectricalEngine
{
    /// <summary>Evaluates a machine with the default quadrature.</summary>
    public static ElectricalResult Evaluate(MachineModel machine) => Evaluate(machine, FluxQuadrature.Default);

    /// <summary>Evaluates a machine with the given quadrature (tests use <see cref="FluxQuadrature.Fine"/> to check convergence).</summary>
    public static ElectricalResult Evaluate(MachineModel machine, FluxQuadrature q)
    {
        ArgumentNullException.ThrowIfNull(machine);
        var diags = new List<Diagnostic>();
        try
        {
            return Core(machine, q, diags);
        }
        catch (ArgumentException ex)
        {
            // A value outside what a kernel primitive accepts (e.g. a zero radius): report it, do not crash.
            diags.Add(new Diagnostic("electrical-unsupported", DiagnosticSeverity.Error, "coils",
                "the electrical model could not be built from these values (" + ex.Message + "); check coils and magnets sizes."));
            return Empty(machine, diags, WindingLayout.For(machine.CoilsPerStator, machine.Poles, machine.Phases), 0, null);
        }
    }

    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    private static ElectricalResult Core(MachineModel d, FluxQuadrature q, List<Diagnostic> diags)
    {
        int poles = d.Poles, coils = d.CoilsPerStator, phases = d.Phases;
        var conn = d.Connection;

        // Winding and sensors are planned in electrical angles: with same-pole magnets one electrical period is one
        // magnet pitch, as in an alternating machine of twice as many poles (MachineModel.ElectricalPoles).
        bool same = d.Magnets.Arrangement == MagnetArrangement.Same;
        var layout = WindingLayout.For(coils, d.ElectricalPoles, phases);
        if (!layout.IsValid && same)
            layout = layout with { Reason = SameReason(coils, poles, phases) };
        if (!layout.IsValid)
            diags.Add(new Diagnostic("winding-invalid", DiagnosticSeverity.Error, "machine.coils", layout.Reason!));

        var stack = d.Stack;
        double gap = stack.MagneticGapMm;
        if (!(gap > 0))
            diags.Add(new Diagnostic("magnetic-gap", DiagnosticSeverity.Error, "gap.air_gap",
                string.Format(Inv, "the magnet faces reach the copper (magnetic gap {0:0.###} mm); raise gap.air_gap or former.flange.", gap)));

        var wire = WireSpec.From(d.Coils.Wire, d.Coils.EnamelGrade);
        var spec = CoilSpec.From(d, wire, diags);

        bool fieldOk = gap > 0 && layout.IsValid && poles >= 2 && (same || poles % 2 == 0);
        // The magnets at the still air's temperature (the machine at rest): the steel's flux, the pull and the turns
        // solved for a target EMF use this Br; the EMF at the operating point uses the magnets' operating temperature.
        double ambient = d.Operation.AmbientC;
        double brAmbient = MagnetGrades.BrAt(d.Magnets.BrTesla, ambient);
        var ironFlux = fieldOk ? BackIronFlux.Compute(d, q.FarFactor, brAmbient) : Array.Empty<BackIronFluxResult>();
        RotorField? field = fieldOk ? RotorField.From(d, q.FarFactor, ironFlux, brAmbient) : null;

        if (spec is null) return Empty(d, diags, layout, gap, field);

        int p = Math.Max(1, d.FieldPeriods);
        int statorFactor = d.Layout.Stators.Count;
        bool parallel = phases == 1 && conn == Connection.Parallel;
        int inSeries = (phases == 3 ? coils / 3 : parallel ? 1 : coils) * statorFactor;
        int paths = parallel ? coils : 1;
        double mult = statorFactor * (parallel ? 1.0 / coils : 1.0);

        // Turns.
        int turns;
        bool solved = false;
        if (d.Coils.Turns is { } nGiven && nGiven >= 1) turns = nGiven;
        else if (d.Coils.Target is { } target)
        {
            if (field is null || !layout.IsValid)
            {
                diags.Add(new Diagnostic("target-emf-unsolvable", DiagnosticSeverity.Error, "coils.target_emf",
                    "coils.target_emf cannot be solved while the magnets, gap or winding have errors; fix those or give coils.turns."));
                return Empty(d, diags, layout, gap, field);
            }
            turns = SolveTurns(spec, field, layout, q, mult, target, diags);
            solved = true;
        }
        else
        {
            diags.Add(new Diagnostic("coil-turns-missing", DiagnosticSeverity.Error, "coils.turns", "give coils.turns, or coils.target_emf to have the turns solved."));
            return Empty(d, diags, layout, gap, field);
        }

        var coil = spec.Wind(turns);
        CheckCoil(coil, spec, diags);
        double ohmPh20 = parallel ? coil.Resistance20COhm / coils * statorFactor : coil.Resistance20COhm * inSeries;
        double lPh = parallel ? coil.InductanceUh / coils * statorFactor : coil.InductanceUh * inSeries;
        double OhmPhAt(double tempC) => Copper.AtTemperature(ohmPh20, tempC);

        if (field is null || !layout.IsValid)
        {
            // No field: no EMF, no current, no heat; the winding at the air's temperature.
            var e = Empty(d, diags, layout, gap, field);
            return e with
            {
                Coil = MakeCoilResult(coil, spec, solved, ambient),
                Phase = new PhaseResult
                {
                    Connection = conn, CoilsInSeries = inSeries, ParallelPaths = paths, EmfPeakV = 0, EmfRmsV = 0, EmfFundamentalRmsV = 0,
                    Resistance20COhm = ohmPh20, ResistanceHotOhm = OhmPhAt(ambient), InductanceUh = lPh, ThdPercent = 0,
                },
            };
        }

        var seriesAmbient = CoilFlux.Compute(field, coil.Outline, turns, q);
        var phaseNames = phases == 3 ? new[] { 'A', 'B', 'C' } : new[] { 'A' };
        // The switching plan with the magnets and the winding at the air's temperature: the heat balance's motor loss
        // flows in the windows the sensor really gives (the plan is made again at the hot resistance for the results;
        // its windows are taken from the cool field).
        double planColdOhm = OhmPhAt(ambient);
        var kCold = phaseNames.Select(x => PhaseHarmonics(seriesAmbient, layout, x, mult)).ToArray();
        var sensorsCold = SensorPlanner.Plan(d.Sensor, d.ElectricalPoles, phases, coil.Outline, coils,
            kCold.Select(kk => Norm(-90 - kk[0].Phase * 180 / Math.PI)).ToArray(), new List<Diagnostic>(), !same);
        var planCold = SwitchingPlanner.Plan(d, field, sensorsCold, PhaseFluxOf(kCold, seriesAmbient.Orders, phaseNames, p), planColdOhm, lPh * 1e-6);
        var heat = Heat(d, q, coil, seriesAmbient, brAmbient, ironFlux, layout, phaseNames, mult, parallel, OhmPhAt, lPh, wire, p, planCold, planColdOhm);
        var series = heat.Series;
        double tCoil = heat.Thermal.CoilTemperatureC;
        double ohmPhHot = OhmPhAt(tCoil);
        var coilResult = MakeCoilResult(coil, spec, solved, tCoil);

        double w = 2 * Math.PI * d.RatedRpm / 60;
        var k = phaseNames.Select(x => PhaseHarmonics(series, layout, x, mult)).ToArray(); // per rad/s
        Complex[] line = LineHarmonics(k, series.Orders, phases, conn);
        Complex[] coilK = series.Orders.Select((n, i) => Complex.ImaginaryOne * n * p * series.CoefficientsWb[i]).ToArray();

        double phaseRms = w * Rms(k[0]);
        double phaseFund = w * k[0][0].Magnitude / Math.Sqrt(2);
        double lineRmsPerW = Rms(line);
        double lineRms = w * lineRmsPerW;
        double linePeakPerW = Peak(line, series.Orders);
        double phasePeak = w * Peak(k[0], series.Orders);
        double coilRms = w * Rms(coilK);

        var harmonics = series.Orders.Select((n, i) => new Harmonic(n, w * k[0][i].Magnitude,
            k[0][0].Magnitude > 0 ? 100 * k[0][i].Magnitude / k[0][0].Magnitude : 0)).ToArray();
        double thd = k[0][0].Magnitude > 0
            ? 100 * Math.Sqrt(k[0].Skip(1).Sum(c => c.Magnitude * c.Magnitude)) / k[0][0].Magnitude : 0;

        double ke = lineRmsPerW * 2 * Math.PI * 1000 / 60;
        double kt = phases == 3 ? Math.Sqrt(3) * line[0].Magnitude / Math.Sqrt(2) : k[0][0].Magnitude / Math.Sqrt(2);
        double wMax = 2 * Math.PI * d.MaxRpm / 60;
        // The highest EMF is the one with the coldest magnets: at machine.max_rpm the magnets are taken at the air's temperature.
        double coldFactor = series.CoefficientsWb.Count > 0 && heat.BrOperatingTesla > 0 ? brAmbient / heat.BrOperatingTesla : 1;
        double lineRmsMax = lineRmsPerW * wMax * coldFactor, linePeakMax = linePeakPerW * wMax * coldFactor;
        if (lineRmsMax > 50)
            diags.Add(new Diagnostic("emf-above-elv-ac", DiagnosticSeverity.Warning, "machine.max_rpm",
                string.Format(Inv, "at machine.max_rpm the line EMF reaches {0:0.#} V rms, above the 50 V AC extra-low-voltage limit (IEC 61140): treat the output as hazardous, insulate and enclose it, and follow local electrical codes; or lower machine.max_rpm or coils.turns.", lineRmsMax),
                new DiagnosticMeasure(lineRmsMax, 50, "V", 50 - lineRmsMax)));
        if (linePeakMax > 120)
            diags.Add(new Diagnostic("emf-above-elv-dc", DiagnosticSeverity.Warning, "machine.max_rpm",
                string.Format(Inv, "at machine.max_rpm the rectified output can reach {0:0.#} V DC, above the 120 V ripple-free DC extra-low-voltage limit (IEC 61140): follow local electrical codes and licensed practice; or lower machine.max_rpm or coils.turns.", linePeakMax),
                new DiagnosticMeasure(linePeakMax, 120, "V", 120 - linePeakMax)));

        FieldReach(d, gap, diags);
        NegligibleEmf(d, w * linePeakPerW, diags);

        // Waveforms.
        int M = q.SamplesPerPeriod;
        var thE = Enumerable.Range(0, M).Select(i => 360.0 * i / M).ToArray();
        var thM = thE.Select(t => t / p).ToArray();
        double[] Wave(Complex[] kk, double scale) => HarmonicSynth.Sample(kk, series.Orders, M).Select(v => v * scale).ToArray();
        var waves = new Waveforms
        {
            ThetaElecDeg = thE,
            ThetaMechDeg = thM,
            CoilFluxLinkageWb = thM.Select(t => series.At(t * Math.PI / 180)).ToArray(),
            CoilEmfV = Wave(coilK, w),
            PhaseEmfV = k.Select(kk => (IReadOnlyList<double>)Wave(kk, w)).ToArray(),
            LineEmfV = Wave(line, w),
        };

        // Sensor timing: the positive-going zero crossing of each phase's fundamental EMF: p theta + arg K = -90.
        var zeroCross = k.Select(kk => Norm(-90 - kk[0].Phase * 180 / Math.PI)).ToArray();
        var sensors = SensorPlanner.Plan(d.Sensor, d.ElectricalPoles, phases, coil.Outline, coils, zeroCross, diags, !same);
        var phaseFlux = PhaseFluxOf(k, series.Orders, phaseNames, p);
        var plan = SwitchingPlanner.Plan(d, field, sensors, phaseFlux, ohmPhHot, lPh * 1e-6);

        // Operating points (the winding at its steady temperature; a pulse drive's windows are the ones its sensor
        // really gives, from the switching plan).
        var op = d.Operation;
        const int fine = 720;
        var (genPoint, motPoint) = OperatingModel.Of(d, k, series.Orders, parallel, lPh, wire, p, plan, ohmPhHot).At(1, ohmPhHot);
        GeneratorPoint? gen = genPoint;
        MotorPoint? mot = motPoint;

        // Charging the store through the rectifier (generator roles).
        ChargingPoint? charging = null;
        if (d.RunsAsGenerator && d.Load.Rectifier != RectifierKind.None && d.Storage is not NoStorage)
        {
            var rect = new double[fine];
            double rPath;
            if (phases == 3)
            {
                bool star = conn == Connection.Star;
                if (d.Load.Rectifier == RectifierKind.Bridge)
                {
                    Complex[][] pairs = star
                        ? new[] { Sub(k[0], k[1]), Sub(k[1], k[2]), Sub(k[2], k[0]) }
                        : new[] { NoTriplen(k[0], series.Orders), NoTriplen(k[1], series.Orders), NoTriplen(k[2], series.Orders) };
                    var pw = pairs.Select(pp => HarmonicSynth.Sample(pp, series.Orders, fine)).ToArray();
                    for (int i = 0; i < fine; i++) rect[i] = Math.Max(Math.Abs(pw[0][i]), Math.Max(Math.Abs(pw[1][i]), Math.Abs(pw[2][i])));
                    rPath = star ? 2 * ohmPhHot : 2 * ohmPhHot / 3;
                }
                else
                {
                    var pw = k.Select(kk => HarmonicSynth.Sample(kk, series.Orders, fine)).ToArray();
                    for (int i = 0; i < fine; i++) rect[i] = Math.Max(0, Math.Max(pw[0][i], Math.Max(pw[1][i], pw[2][i])));
                    rPath = ohmPhHot;
                }
            }
            else
            {
                var w1 = HarmonicSynth.Sample(k[0], series.Orders, fine);
                for (int i = 0; i < fine; i++) rect[i] = d.Load.Rectifier == RectifierKind.Bridge ? Math.Abs(w1[i]) : Math.Max(0, w1[i]);
                rPath = ohmPhHot;
            }
            charging = Charging.Point(d, rect, rPath, coldFactor);
        }

        // Only the role's operating points (machine.role; never inferred from the sensor).
        if (!d.RunsAsGenerator) gen = null;
        if (!d.RunsAsMotor) mot = null;
        double peakLink = series.PeakWb();
        return new ElectricalResult
        {
            PolePairs = p,
            RatedRpm = d.RatedRpm,
            ElectricalHz = p * d.RatedRpm / 60,
            MagneticGapMm = gap,
            WindingFactor = layout.WindingFactor,
            Magnet = new MagnetResult
            {
                BrTesla = d.Magnets.BrTesla, BrSource = d.Magnets.BrSource, BackIronImageModel = field.HasBackIron,
                BrAmbientTesla = brAmbient, BrOperatingTesla = heat.BrOperatingTesla, TemperatureC = heat.Thermal.MagnetTemperatureC,
                MaxWorkingTemperatureC = d.Magnets.MaxWorkingTemperatureC,
            },
            Coil = coilResult,
            CoilFluxLinkagePeakWb = peakLink,
            FluxPerTurnPeakWb = peakLink / turns,
            CoilEmfRmsV = coilRms,
            Phase = new PhaseResult
            {
                Connection = conn, CoilsInSeries = inSeries, ParallelPaths = paths, EmfPeakV = phasePeak, EmfRmsV = phaseRms,
                EmfFundamentalRmsV = phaseFund, Resistance20COhm = ohmPh20, ResistanceHotOhm = ohmPhHot, InductanceUh = lPh, ThdPercent = thd,
            },
            LineEmfRmsV = lineRms,
            LineEmfPeakV = linePeakPerW * w,
            KeVPerKrpm = ke,
            KtNmPerA = kt,
            LineEmfRmsAtMaxRpmV = lineRmsMax,
            LineEmfPeakAtMaxRpmV = linePeakMax,
            Harmonics = harmonics,
            FluxLinkage = series,
            Winding = layout,
            Sensors = sensors,
            Switching = plan,
            Charging = charging,
            PhaseFlux = phaseFlux,
            Generator = gen,
            Motor = mot,
            Waveforms = waves,
            Pull = PullOf(d, ironFlux, brAmbient),
            BackIron = ironFlux,
            Thermal = heat.Thermal,
            Diagnostics = diags,
        };
    }

    /// <summary>The axial pull between the rotors of a dual-rotor machine (the only layout where a rotor feels a net
    /// axial pull: a coreless stator holds no iron, and a magnet's pull on its own back iron is internal to its rotor).</summary>
    private static MagneticPullResult? PullOf(MachineModel d, IReadOnlyList<BackIronFluxResult> ironFlux, double brTesla)
    {
        if (!d.Layout.StatorBetweenRotors) return null;
        return MagneticPull.Compute(d, ironFlux, brTesla);
    }

    private static int SolveTurns(CoilSpec spec, RotorField field, WindingLayout layout, FluxQuadrature q, double mult,
        EmfTarget target, List<Diagnostic> diags)
    {
        double w = 2 * Math.PI * target.Rpm / 60;
        double Emf(int n)
        {
            var s = CoilFlux.Compute(field, spec.Wind(n).Outline, n, q);
            return w * Rms(PhaseHarmonics(s, layout, 'A', mult));
        }
        int nCur = 1;
        double e1 = Emf(1);
        if (!(e1 > 0))
        {
            diags.Add(new Diagnostic("target-emf-unsolvable", DiagnosticSeverity.Error, "coils.target_emf", "the coil links no flux, so no number of turns reaches coils.target_emf; check the magnets and the coil position."));
            return 1;
        }
        nCur = (int)Math.Clamp(Math.Round(target.RmsV / e1), 1, 100000);
        var seen = new HashSet<int>();
        int best = nCur;
        double bestErr = double.MaxValue;
        for (int it = 0; it < 30 && seen.Add(nCur); it++)
        {
            double e = Emf(nCur);
            double err = Math.Abs(e - target.RmsV);
            if (err < bestErr) { bestErr = err; best = nCur; }
            if (!(e > 0)) break;
            int next = (int)Math.Clamp(Math.Round(nCur * target.RmsV / e), 1, 100000);
            if (next == nCur) break;
            nCur = next;
        }
        if (best >= 100000)
            diags.Add(new Diagnostic("target-emf-unreachable", DiagnosticSeverity.Error, "coils.target_emf", "coils.target_emf needs more than 100000 turns; lower the target or raise the speed."));
        return best;
    }

    /// <summary>
    /// Below this share of its value at the magnet faces the working field has died away across the gap (our own band).
    /// </summary>
    public const double FieldReachWarnRatio = 0.1;

    /// <summary>Forward drop of one silicon diode, V (common practice, about 0.6 to 0.7 V at small currents).</summary>
    public const double DiodeDropV = 0.7;

    /// <summary>
    /// gap-weakens-field: the field of alternating magnets of pole pitch tau (arc length per magnet at the magnet
    /// pitch radius) falls off across a gap g as exp(-pi g / tau) in its fundamental (the Laplace solution above a
    /// periodic magnetisation, docs/physics.md §12). Below <see cref="FieldReachWarnRatio"/> the coils see little
    /// of the magnets however many turns they have: a warning that names the air gap (or the pole count) that
    /// brings the ratio back, within the keys' ranges.
    /// </summary>
    internal static void FieldReach(MachineModel d, double magneticGapMm, List<Diagnostic> diags)
    {
        double tau = 2 * Math.PI * d.Magnets.Shape.PitchRadiusMm / d.Poles;
        if (!(tau > 0) || !(magneticGapMm > 0)) return;
        double ratio = Math.Exp(-Math.PI * magneticGapMm / tau);
        if (ratio >= FieldReachWarnRatio) return;
        double gMax = tau * Math.Log(1 / FieldReachWarnRatio) / Math.PI; // magnetic gap at which the ratio is the limit
        var fixes = new List<string>();
        double air = d.Gap.AirGapMm - (magneticGapMm - gMax);
        if (air >= d.Gap.MinRunningGapMm && air > 0)
            fixes.Add(string.Format(Inv, "lower gap.air_gap to {0:0.###}", Math.Floor(air * 1000) / 1000));
        // Fewer, longer poles reach further: tau >= g pi / ln(1/ratio) at the same pitch radius.
        int polesMax = (int)Math.Floor(2 * Math.PI * d.Magnets.Shape.PitchRadiusMm * Math.Log(1 / FieldReachWarnRatio) / (Math.PI * magneticGapMm));
        polesMax -= polesMax % 2;
        if (polesMax >= 2 && polesMax < d.Poles && WindingLayout.For(d.CoilsPerStator, polesMax, d.Phases).IsValid) fixes.Add(string.Format(Inv, "lower machine.poles to {0}", polesMax));
        string fix = fixes.Count > 0 ? string.Join(" or ", fixes) : "bring the coils closer to the magnets (smaller gap.air_gap or former.flange)";
        diags.Add(new Diagnostic("gap-weakens-field", DiagnosticSeverity.Warning, "gap.air_gap",
            string.Format(Inv, "the magnetic gap of {0:0.###} mm is {1:0.##} pole pitches ({2:0.###} mm at the magnets' pitch radius): the working field reaching the coils is {3:G3} of its value at the magnet faces, below {4}; {5}.",
                magneticGapMm, magneticGapMm / tau, tau, ratio, FieldReachWarnRatio, fix),
            new DiagnosticMeasure(ratio, FieldReachWarnRatio, "1", ratio - FieldReachWarnRatio)));
    }

    /// <summary>
    /// emf-negligible: the line EMF's peak at rated speed below one silicon diode's forward drop cannot drive a
    /// current through a rectifier or light an indicator (common practice): a warning naming the turns or speed
    /// that reach it (turns within the schema, never 0).
    /// </summary>
    internal static void NegligibleEmf(MachineModel d, double linePeakV, List<Diagnostic> diags)
    {
        if (!double.IsFinite(linePeakV) || linePeakV >= DiodeDropV) return;
        var fixes = new List<string>();
        if (linePeakV > 0)
        {
            double scale = DiodeDropV / linePeakV;
            if (d.Coils.Turns is { } n && Math.Ceiling(n * scale) <= SchemaMax("coils.turns"))
                fixes.Add(string.Format(Inv, "raise coils.turns to {0} (if the winding fits)", (long)Math.Ceiling(n * scale)));
            double rpm = Math.Ceiling(d.RatedRpm * scale);
            if (rpm <= d.MaxRpm) fixes.Add(string.Format(Inv, "raise machine.rated_rpm to {0}", rpm));
        }
        fixes.Add("bring the coils closer to the magnets (gap.air_gap)");
        diags.Add(new Diagnostic("emf-negligible", DiagnosticSeverity.Warning, "coils.turns",
            string.Format(Inv, "at machine.rated_rpm the line EMF peaks at {0:0.####} V, below one silicon diode's forward drop ({1} V): the machine can drive almost nothing; {2}.",
                linePeakV, DiodeDropV, string.Join(" or ", fixes)),
            new DiagnosticMeasure(linePeakV, DiodeDropV, "V", linePeakV - DiodeDropV)));
    }

    /// <summary>The schema's maximum of a key (so a fix never names a value the loader refuses).</summary>
    private static double SchemaMax(string keyPath) =>
        PartForge.Design.Keys.SectionSpec.Root.Resolve(keyPath, out _)?[^1].Range?.Max ?? double.PositiveInfinity;

    private static void CheckCoil(CoilWinding coil, CoilSpec spec, List<Diagnostic> diags)
    {
        if (coil.NeighbourGapMm is { } g && g < 0)
        {
            int? nMax = MaxTurns(spec);
            diags.Add(new Diagnostic("coil-overlap", DiagnosticSeverity.Error, "coils.turns",
                string.Format(Inv, "the coils overlap their neighbours by {0:0.###} mm: {1} turns need a {2:0.###} mm build; {3}use thinner wire, or raise coils.pitch_radius.",
                    -g, coil.Turns, coil.Outline.RadialBuildMm, nMax is >= 1 and var nm && nm < coil.Turns ? string.Format(Inv, "lower coils.turns to {0} or fewer, ", nm) : ""),
                new DiagnosticMeasure(g, 0, "mm", g)));
        }
        if (coil.Outline.OuterMinRadiusMm <= 0)
            diags.Add(new Diagnostic("coil-crosses-axis", DiagnosticSeverity.Error, "coils.turns",
                "the winding reaches the machine axis; lower coils.turns or raise coils.pitch_radius."));
    }

    private static int? MaxTurns(CoilSpec spec)
    {
        if (spec.MaxBuildMm() is not { } b) return null;
        return (int)Math.Floor(Math.Max(0, b) * spec.FillFactor * spec.HeightMm / spec.Wire.CopperAreaMm2);
    }

    private static CoilResult MakeCoilResult(CoilWinding c, CoilSpec spec, bool solved, double temperatureC)
    {
        int? awg = null;
        if (solved && spec.MaxBuildMm() is { } b && b > 0)
        {
            double dMax = Math.Sqrt(b * spec.FillFactor * spec.HeightMm * 4 / (Math.PI * c.Turns));
            awg = WireGauge.ThickestAwgWithin(dMax);
        }
        var o = c.Outline;
        return new CoilResult
        {
            Shape = o.Shape, Turns = c.Turns, TurnsSolved = solved, WireAwg = c.Wire.Awg, WireBareMm = c.Wire.BareDiameterMm,
            WireOverallMm = c.Wire.OverallDiameterMm, WireOverallIsApproximate = c.Wire.OverallIsApproximate, WireOhmPerM20C = c.Wire.OhmPerMetre20,
            FillFactor = c.FillFactor, InnerDiameterMm = o.InnerDiameterMm, OuterDiameterMm = o.OuterDiameterMm, HeightMm = o.HeightMm,
            PitchRadiusMm = o.PitchRadiusMm, RadialBuildMm = o.RadialBuildMm, MeanTurnMm = c.MeanTurnMm, LeadAllowanceMm = c.LeadAllowanceMm,
            WireLengthM = c.WireLengthM, Resistance20COhm = c.Resistance20COhm, ResistanceHotOhm = Copper.AtTemperature(c.Resistance20COhm, temperatureC),
            MaxTemperatureC = c.MaxTemperatureC, TemperatureC = temperatureC,
            InductanceUh = c.InductanceUh, InductanceIsApproximate = c.InductanceIsApproximate, CopperMassG = c.CopperMassG,
            NeighbourGapMm = c.NeighbourGapMm, MaxTurnsForNeighbourGap = MaxTurns(spec), ThickestFittingAwg = awg, Outline = o,
        };
    }

    private static ElectricalResult Empty(MachineModel d, List<Diagnostic> diags, WindingLayout layout, double gap, RotorField? field = null)
    {
        int p = Math.Max(0, d.FieldPeriods);
        return new ElectricalResult
        {
            PolePairs = p, RatedRpm = d.RatedRpm, ElectricalHz = p * d.RatedRpm / 60,
            MagneticGapMm = double.IsFinite(gap) ? gap : 0, WindingFactor = layout.IsValid ? layout.WindingFactor : 0,
            Magnet = new MagnetResult
            {
                BrTesla = d.Magnets.BrTesla, BrSource = d.Magnets.BrSource, BackIronImageModel = field?.HasBackIron ?? false,
                BrAmbientTesla = MagnetGrades.BrAt(d.Magnets.BrTesla, d.Operation.AmbientC), BrOperatingTesla = MagnetGrades.BrAt(d.Magnets.BrTesla, d.Operation.AmbientC),
                TemperatureC = d.Operation.AmbientC, MaxWorkingTemperatureC = d.Magnets.MaxWorkingTemperatureC,
            },
            CoilFluxLinkagePeakWb = 0, FluxPerTurnPeakWb = 0, CoilEmfRmsV = 0, LineEmfRmsV = 0, LineEmfPeakV = 0, KeVPerKrpm = 0, KtNmPerA = 0,
            LineEmfRmsAtMaxRpmV = 0, LineEmfPeakAtMaxRpmV = 0, Harmonics = Array.Empty<Harmonic>(), Winding = layout, Diagnostics = diags,
        };
    }

    /// <summary>Why a same-pole combination gives no winding, in the design's own counts (the planner sees twice the poles).</summary>
    private static string SameReason(int coils, int magnets, int phases) => phases == 1
        ? string.Format(Inv, "{0} coils with {1} same-pole magnets are not all in phase for a 1-phase winding (their EMFs would partly cancel); use coils = magnets ({1}), a divisor of 2 x magnets, or 3 phases.", coils, magnets)
        : string.Format(Inv, "machine.coils {0} with {1} same-pole magnets give no balanced 3-phase winding (coils / (3 x gcd(coils, magnets)) must be a whole number); choose coils and magnets with that ratio, or machine.phases: 1.", coils, magnets);

    /// <summary>Phase harmonics per unit shaft speed (V per rad/s): K_n = i n p C_n S_n x mult.</summary>
    private static Complex[] PhaseHarmonics(FluxLinkageSeries s, WindingLayout layout, char phase, double mult)
    {
        var r = new Complex[s.Orders.Count];
        for (int i = 0; i < r.Length; i++)
        {
            int n = s.Orders[i];
            r[i] = Complex.ImaginaryOne * n * s.PolePairs * s.CoefficientsWb[i] * layout.PhaseSum(phase, n) * mult;
        }
        return r;
    }

    private static Complex[] LineHarmonics(Complex[][] k, IReadOnlyList<int> orders, int phases, Connection conn)
    {
        if (phases != 3) return k[0];
        return conn == Connection.Star ? Sub(k[0], k[1]) : NoTriplen(k[0], orders);
    }

    private static Complex[] Sub(Complex[] a, Complex[] b) => a.Select((x, i) => x - b[i]).ToArray();

    private static Complex[] NoTriplen(Complex[] a, IReadOnlyList<int> orders) => a.Select((x, i) => orders[i] % 3 == 0 ? Complex.Zero : x).ToArray();

    private static double Rms(Complex[] k) => Math.Sqrt(k.Sum(c => c.Magnitude * c.Magnitude) / 2);

    private static double Peak(Complex[] k, IReadOnlyList<int> orders) => HarmonicSynth.Peak(k, orders);

    /// <summary>Each phase's flux linkage as terms of the mechanical angle, from its EMF harmonics per rad/s
    /// (lambda_n = K_n / (j n p)).</summary>
    private static PhaseFlux[] PhaseFluxOf(Complex[][] k, IReadOnlyList<int> orders, char[] phaseNames, int p) =>
        k.Select((kk, x) => new PhaseFlux(phaseNames[x], orders.Select((n, i) =>
        {
            Complex lam = kk[i] / (Complex.ImaginaryOne * n * p);
            return new FluxTerm(n * p, lam.Real, -lam.Imaginary);
        }).ToArray())).ToArray();

    private static double Norm(double deg)
    {
        double x = deg % 360;
        return x < 0 ? x + 360 : x;
    }
}
