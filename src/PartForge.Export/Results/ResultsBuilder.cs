using PartForge.Checks;
using PartForge.Design.Machines;
using PartForge.Design.Parts;
using PartForge.Electrical;
using PartForge.Export.Bom;
using PartForge.Export.Pipeline;
using PartForge.Export.Report;
using PartForge.Parts;

namespace PartForge.Export.Results;

/// <summary>Fills the results document from the stages' outputs.</summary>
public static class ResultsBuilder
{
    /// <param name="ev">The evaluated design.</param>
    /// <param name="files">Output file names per part name (empty for <c>check</c>, which writes nothing).</param>
    /// <param name="forced">Written with --force although a check failed.</param>
    /// <param name="countTriangles">Measure the parts: their volumes (from the solids) and triangle counts (from
    /// the meshes). False reports 0 for both and makes neither, for summaries that do not show them and builds
    /// that do not write the results document; the solids and meshes are otherwise made on first use.</param>
    public static ResultsDocument Build(Evaluation ev, IReadOnlyDictionary<string, IReadOnlyList<string>>? files = null, bool forced = false, bool countTriangles = true)
    {
        var checks = ev.Checks;
        return new ResultsDocument
        {
            Design = ev.Machine.Name,
            Summary = new ResultsSummary(checks.StatusText, checks.FailCount, checks.WarnCount) { Forced = forced && checks.HasFailures },
            Electrical = ElectricalOf(ev.Machine, ev.Electrical),
            Checks = checks.Checks.Select(c => new CheckEntry(c.Id, c.PartName, c.StatusText, c.Value, c.Limit, c.Unit, c.Margin, c.Message)
            {
                Counterpart = c.CounterpartName, Where = c.Where?.Feature, WhereAngleDeg = c.Where?.AngleDeg, Basis = c.Basis, Measured = c.Measured,
            }).ToArray(),
            Parts = ev.Parts?.Parts.Select(p => new PartEntry(p.Name, Words.Of(p.Process), p.Quantity,
                files != null && files.TryGetValue(p.Name, out var f) ? f : Array.Empty<string>(), countTriangles ? p.VolumeMm3 : 0, countTriangles ? p.Mesh.TriangleCount : 0)
            {
                Material = p.Material.Name, Role = RoleWord(p.Role), MassG = countTriangles ? p.MassG : 0, Rotating = p.Rotating,
            }).ToArray() ?? [],
            Operating = OperatingOf(ev.Machine, ev.Electrical),
            Thermal = ThermalOf(ev.Electrical),
            Mechanics = MechanicsOf(ev, countTriangles),
            Assembly = checks.Assembly,
            Bom = ev.Parts is { } ps && countTriangles ? BomOf(ev.Machine, ev.Electrical, ps, ev.Checks.Joints, ev.Checks.Jacks) : [],
        };
    }

    /// <summary>The role's word in the results: the role's part name without a side (rotor, stator, gap-gauge, ...).</summary>
    private static string RoleWord(PartRole role) => PartNames.Of(new PartId(role));

    public static OperatingSection OperatingOf(MachineModel d, ElectricalResult e)
    {
        var g = e.Generator;
        var m = e.Motor;
        return new OperatingSection(d.RatedRpm,
            g is null ? null : new GeneratorEntry(g.Rpm, g.LoadResistanceOhm, g.CurrentA, g.CoilCurrentA, g.TerminalVoltageV, g.OutputPowerW,
                g.CopperLossW, g.Efficiency, g.ShaftTorqueNm, g.CurrentDensityAPerMm2),
            m is null ? null : new MotorEntry(m.Drive, m.SupplyVoltageV, m.SwitchDropV, m.PathResistanceOhm, m.NoLoadRpm, m.StallTorqueNm,
                m.StallCurrentA, m.RatedRpm, m.CurrentAtRatedA, m.TorqueAtRatedNm, m.OutputPowerAtRatedW, m.InputPowerAtRatedW, m.EfficiencyAtRated,
                m.CurrentDensityAtRatedAPerMm2, m.CurrentDensityAtStallAPerMm2))
        {
            Charging = e.Charging,
            Drive = e.Switching,
        };
    }

    /// <summary>The heat balance's figures (null when no EMF was computed).</summary>
    public static ThermalSection? ThermalOf(ElectricalResult e)
    {
        if (e.Thermal is not { } t) return null;
        var c = t.Cooling;
        return new ThermalSection(t.Point == PartForge.Electrical.Operation.OperatingMode.Motor ? "motor" : "generator", t.AmbientC, t.CoilTemperatureC,
            t.MagnetTemperatureC, t.CopperLossPerCoilW, t.CopperLossW, c.ResistanceKPerW, c.Faces, c.FaceAreaMm2, c.FlangeMm, c.FormerMaterial.Name,
            c.FormerMaterial.ThermalConductivityWPerMK, c.ConvectionWPerM2K, t.FieldPasses);
    }

    /// <summary>Rotating mass: every copy of every part that turns, plus the magnets (0 when the parts were not measured).</summary>
    private static MechanicsSection MechanicsOf(Evaluation ev, bool measured)
    {
        var d = ev.Machine;
        double magnetG = d.Magnets.Shape.MassKg * 1000;
        double rotatingKg = 0, inertia = 0;
        if (measured && ev.Parts is { } ps)
        {
            rotatingKg = ps.Parts.Where(p => p.Rotating).Sum(p => p.MassG * p.Quantity) / 1000 + d.Poles * d.Layout.Rotors.Count * magnetG / 1000;
            inertia = PartForge.Parts.Mechanics.RotatingAssembly.Of(d, ps).InertiaKgM2;
        }
        var pull = ev.Electrical.Pull;
        var perRotor = d.Layout.Rotors.Select(r => (r.Name, pull?.RotorToRotorN ?? 0)).ToArray();
        string method = pull?.Method ?? "no net axial pull on a rotor: a coreless stator holds no iron, and a rotor's pull on its own back iron is internal to it";
        return new MechanicsSection(rotatingKg, magnetG, perRotor, method)
        {
            PullCurve = pull?.AssemblyCurve.Select(c => (c.FaceToFaceMm, c.PullN)).ToArray() ?? Array.Empty<(double, double)>(),
            RotatingInertiaKgM2 = inertia,
        };
    }

    private static IReadOnlyList<BomEntry> BomOf(MachineModel d, ElectricalResult e, PartSet parts, IReadOnlyList<PartForge.Checks.Hardware.FastenerJoint> joints, PartForge.Checks.Hardware.JackingSet? jacks)
    {
        var view = ElectricalView.From(d, e);
        return BomBuilder.Build(d, view.TotalWireM, view.WireGramsPerMetre, ReportBuilder.BomParts(parts), joints, jacks, ReportBuilder.SheetsOf(d, parts)).Lines
            .Select(l => new BomEntry(l.Category, l.Item, l.Specification, l.Quantity, l.Unit, l.Notes)).ToArray();
    }

    public static ElectricalSection ElectricalOf(MachineModel d, ElectricalResult e)
    {
        var c = e.Coil;
        var o = c?.Outline;
        KeystoneOutline? outline = null;
        if (c != null && o != null && c.Shape != CoilShape.Round)
        {
            double build = o.RadialBuildMm;
            double window = d.Coils.CoreWidthMm ?? 0;
            outline = new KeystoneOutline(o.WindowMinRadiusMm - build, o.WindowMaxRadiusMm + build, window, window + 2 * build, build);
        }
        return new ElectricalSection
        {
            PolePairs = e.PolePairs,
            ElectricalHz = e.ElectricalHz,
            MagneticGap = e.MagneticGapMm,
            WindingFactor = e.WindingFactor,
            MagnetBr = e.Magnet.BrTesla,
            MagnetSource = e.Magnet.BrSource,
            MagnetShape = d.Magnets.Shape.Kind.Word,
            MagnetDescription = d.Magnets.Shape.Describe(),
            MagnetBrAmbient = e.Magnet.BrAmbientTesla,
            MagnetBrOperating = e.Magnet.BrOperatingTesla,
            MagnetTemperatureC = e.Magnet.TemperatureC,
            MagnetMaxWorkingTemperatureC = e.Magnet.MaxWorkingTemperatureC,
            Coil = new CoilSection
            {
                Turns = c?.Turns ?? 0,
                WireBare = c?.WireBareMm ?? 0,
                WireOverall = c?.WireOverallMm ?? 0,
                FillFactor = c?.FillFactor ?? d.Coils.FillFactor,
                InnerDiameter = c?.InnerDiameterMm,
                OuterDiameter = c?.OuterDiameterMm,
                Outline = outline,
                Height = c?.HeightMm ?? d.Coils.HeightMm,
                PitchRadius = c?.PitchRadiusMm ?? d.Coils.PitchRadiusMm,
                MeanTurn = c?.MeanTurnMm ?? 0,
                WireLengthM = c?.WireLengthM ?? 0,
                Resistance20cOhm = c?.Resistance20COhm ?? 0,
                ResistanceHotOhm = c?.ResistanceHotOhm ?? 0,
                InductanceUh = c?.InductanceUh ?? 0,
                CopperMassG = c?.CopperMassG ?? 0,
                WireAwg = c?.WireAwg,
                RadialBuild = c?.RadialBuildMm ?? 0,
                LeadAllowance = c?.LeadAllowanceMm ?? 0,
                MaxTemperatureC = c?.MaxTemperatureC ?? d.Coils.MaxTemperatureC,
                TemperatureC = c?.TemperatureC ?? d.Operation.AmbientC,
                WireOhmPerM20C = c?.WireOhmPerM20C ?? 0,
                EmfRmsV = e.CoilEmfRmsV,
                TurnsSolved = c?.TurnsSolved ?? false,
            },
            CoilFluxLinkagePeakWb = e.CoilFluxLinkagePeakWb,
            Phase = new PhaseSection(e.Phase?.CoilsInSeries ?? 0, e.Phase?.EmfPeakV ?? 0, e.Phase?.EmfRmsV ?? 0, e.Phase?.Resistance20COhm ?? 0)
            {
                Connection = Words.Of(d.Connection),
                ParallelPaths = e.Phase?.ParallelPaths ?? 1,
                EmfFundamentalRmsV = e.Phase?.EmfFundamentalRmsV ?? 0,
                ResistanceHotOhm = e.Phase?.ResistanceHotOhm ?? 0,
                InductanceUh = e.Phase?.InductanceUh ?? 0,
                ThdPercent = e.Phase?.ThdPercent ?? 0,
            },
            LineEmfRmsV = e.LineEmfRmsV,
            KeVPerKrpm = e.KeVPerKrpm,
            FluxPerTurnPeakWb = e.FluxPerTurnPeakWb,
            LineEmfPeakV = e.LineEmfPeakV,
            LineEmfRmsAtMaxRpmV = e.LineEmfRmsAtMaxRpmV,
            LineEmfPeakAtMaxRpmV = e.LineEmfPeakAtMaxRpmV,
            KtNmPerA = e.KtNmPerA,
            WireTotalM = ElectricalView.TotalWireM(d, e),
            RatedRpm = e.RatedRpm,
            Harmonics = e.Harmonics.Select(h => new HarmonicEntry(h.Order, h.PeakV, h.PercentOfFundamental)).ToArray(),
            WindingTable = e.Winding.Table.Select(c => new WindingEntry(c.Coil, c.AngleDeg, c.Phase.ToString(), c.Direction > 0 ? 1 : -1)).ToArray(),
            Sensors = e.Sensors?.Sensors.Select(s => new SensorEntry(s.Label, s.AngleDeg, s.RadiusMm, s.ElectricalDeg, s.Inverted, s.ClearanceMm, s.Fits)).ToArray() ?? [],
            SensorKind = Words.Of(d.Sensor.Kind),
            SensorRule = e.Sensors?.Rule ?? "",
        };
    }
}
