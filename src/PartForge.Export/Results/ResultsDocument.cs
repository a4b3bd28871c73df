namespace PartForge.Export.Results;

/// <summary>
/// The results document (its pinned keys: `partforge schema --results`): what <c>check --json</c> prints and
/// <c>&lt;name&gt;-results.json</c> holds. Serialised by <see cref="ResultsJson"/> in a fixed key order.
/// </summary>
public sealed record ResultsDocument
{
    public const string FormatName = "partforge-results/1";

    public string Format { get; init; } = FormatName;
    public required string Design { get; init; }
    public required ResultsSummary Summary { get; init; }
    public required ElectricalSection Electrical { get; init; }
    public required IReadOnlyList<CheckEntry> Checks { get; init; }
    public required IReadOnlyList<PartEntry> Parts { get; init; }

    /// <summary>The operating points (an addition to the pinned keys: <c>operating</c>).</summary>
    public OperatingSection Operating { get; init; } = new(0, null, null);

    /// <summary>The coils' and magnets' steady temperatures (an addition: <c>thermal</c>; null when no EMF was computed).</summary>
    public ThermalSection? Thermal { get; init; }

    /// <summary>Masses and forces of the rotating assembly (an addition to the pinned keys: <c>mechanics</c>).</summary>
    public MechanicsSection Mechanics { get; init; } = new(0, 0, [], "");

    /// <summary>The bill of materials, line by line (empty when no parts could be made).</summary>
    public IReadOnlyList<BomEntry> Bom { get; init; } = [];

    /// <summary>The ordered assembly steps with the pull at each (empty when no parts were made).</summary>
    public IReadOnlyList<PartForge.Checks.Hardware.AssemblyStep> Assembly { get; init; } = [];
}

/// <summary>pass / warn / fail and the counts; <see cref="Forced"/> when --force wrote a failing design.</summary>
public sealed record ResultsSummary(string Status, int Fail, int Warn)
{
    /// <summary>Written with --force although a check failed (the document says so).</summary>
    public bool Forced { get; init; }
}

public sealed record CheckEntry(string Id, string Part, string Status, double Value, double Limit, string Unit, double Margin, string Message)
{
    /// <summary>False when the finding has no number (value, limit and margin are 0 and mean nothing); written only then (an addition).</summary>
    public bool Measured { get; init; } = true;

    /// <summary>The other part of the pair the check is about, or null (an addition to the pinned keys: every check carries it).</summary>
    public string? Counterpart { get; init; }

    /// <summary>Where the limiting value occurs (features; rotor angle for the rotation sweep), or null.</summary>
    public string? Where { get; init; }

    /// <summary>The rotor angle at which it occurs, degrees, or null.</summary>
    public double? WhereAngleDeg { get; init; }

    /// <summary>The published source or stated assumption behind the check.</summary>
    public string? Basis { get; init; }
}

public sealed record PartEntry(string Name, string Process, int Quantity, IReadOnlyList<string> Files, double VolumeMm3, long Triangles)
{
    /// <summary>Material of the part (an addition to the contract).</summary>
    public string? Material { get; init; }

    /// <summary>What the part is for: rotor, back-iron, former, stator, hub-spacer, gap-gauge, rim-spacer.</summary>
    public string? Role { get; init; }

    /// <summary>Mass of one copy, g (solid, 100% infill); 0 when the parts were not measured.</summary>
    public double MassG { get; init; }

    /// <summary>The part turns with the shaft.</summary>
    public bool Rotating { get; init; }
}

/// <summary>The "electrical" object of the contract.</summary>
public sealed record ElectricalSection
{
    public required int PolePairs { get; init; }
    public required double ElectricalHz { get; init; }
    public required double MagneticGap { get; init; }
    public required double WindingFactor { get; init; }
    public required double MagnetBr { get; init; }

    /// <summary>"br" when magnets.br was given, else the grade (additions: <c>magnet.source</c>, <c>magnet.shape</c>, <c>magnet.description</c>).</summary>
    public string MagnetSource { get; init; } = "";
    public string MagnetShape { get; init; } = "";
    public string MagnetDescription { get; init; } = "";

    /// <summary>Additions: Br with the magnets at the air's temperature and at their operating temperature (T), that temperature and
    /// the grade's maximum working temperature (C): <c>magnet.br_ambient</c>, <c>br_operating</c>, <c>temperature_c</c>, <c>max_working_temperature_c</c>.</summary>
    public double MagnetBrAmbient { get; init; }
    public double MagnetBrOperating { get; init; }
    public double MagnetTemperatureC { get; init; }
    public double MagnetMaxWorkingTemperatureC { get; init; }
    public required CoilSection Coil { get; init; }
    public required double CoilFluxLinkagePeakWb { get; init; }
    public required PhaseSection Phase { get; init; }
    public required double LineEmfRmsV { get; init; }
    public required double KeVPerKrpm { get; init; }

    // Additions: every figure the report shows.
    public double FluxPerTurnPeakWb { get; init; }
    public double LineEmfPeakV { get; init; }
    public double LineEmfRmsAtMaxRpmV { get; init; }
    public double LineEmfPeakAtMaxRpmV { get; init; }
    public double KtNmPerA { get; init; }
    public double WireTotalM { get; init; }
    public double RatedRpm { get; init; }
    public IReadOnlyList<HarmonicEntry> Harmonics { get; init; } = [];

    /// <summary>Which coil goes to which phase, and which way it is wound (an addition to the pinned keys: <c>electrical.winding_table</c>).</summary>
    public IReadOnlyList<WindingEntry> WindingTable { get; init; } = [];

    /// <summary>The timing sensors (an addition to the pinned keys: <c>electrical.sensors</c>).</summary>
    public IReadOnlyList<SensorEntry> Sensors { get; init; } = [];

    /// <summary>hall, reed or none.</summary>
    public string SensorKind { get; init; } = "";

    /// <summary>How the sensor angles were found, one sentence (empty without sensors).</summary>
    public string SensorRule { get; init; } = "";
}

/// <summary>One odd harmonic of the phase EMF at rated speed.</summary>
public sealed record HarmonicEntry(int Order, double PeakV, double PercentOfFundamental);

/// <summary>One coil of the winding table: index (from 0, coil 0 on +x), angle, phase letter, +1 wound forward or -1 reversed.</summary>
public sealed record WindingEntry(int Coil, double AngleDeg, string Phase, int Direction);

/// <summary>One timing sensor: label, mechanical angle, radius (mm), electrical angle, inverted output, room between the coils (mm).</summary>
public sealed record SensorEntry(string Label, double AngleDeg, double Radius, double ElectricalDeg, bool Inverted, double Clearance, bool Fits);

/// <summary>
/// The heat balance (an addition: <c>thermal</c>): which operating point heats the coils, the air, the coil's and magnets'
/// steady temperatures, the copper loss per coil and in all, and the heat path of one coil (faces, face area, flange,
/// former material and its conductivity, convection coefficient, thermal resistance).
/// </summary>
public sealed record ThermalSection(string Point, double AmbientC, double CoilTemperatureC, double MagnetTemperatureC, double CopperLossPerCoilW,
    double CopperLossW, double ThermalResistanceKPerW, int Faces, double FaceAreaMm2, double FlangeMm, string FormerMaterial,
    double FormerConductivityWPerMK, double ConvectionWPerM2K, int FieldPasses);

/// <summary>The operating points at rated speed: as a generator into the load, and as a motor on the supply (null when not computed).</summary>
public sealed record OperatingSection(double Rpm, GeneratorEntry? Generator, MotorEntry? Motor)
{
    /// <summary>The generator charging its store through the rectifier (<c>operating.charging</c>; null without one).</summary>
    public PartForge.Electrical.Operation.ChargingPoint? Charging { get; init; }

    /// <summary>The drive as the sensors switch it (<c>operating.drive</c>; null without one).</summary>
    public PartForge.Electrical.Switching.SwitchingPlan? Drive { get; init; }
}

public sealed record GeneratorEntry(double Rpm, double LoadResistanceOhm, double CurrentA, double CoilCurrentA, double TerminalVoltageV,
    double OutputPowerW, double CopperLossW, double Efficiency, double ShaftTorqueNm, double CurrentDensityAPerMm2);

public sealed record MotorEntry(string Drive, double SupplyVoltageV, double SwitchDropV, double PathResistanceOhm, double NoLoadRpm,
    double StallTorqueNm, double StallCurrentA, double RatedRpm, double CurrentAtRatedA, double TorqueAtRatedNm, double OutputPowerAtRatedW,
    double InputPowerAtRatedW, double EfficiencyAtRated, double CurrentDensityAtRatedAPerMm2, double CurrentDensityAtStallAPerMm2);

/// <summary>
/// The rotating assembly: its mass (rotating parts and magnets), one magnet's mass, and the axial pull on each
/// rotor at the running gap (<c>pull_n</c>, by rotor part name), with the model used.
/// </summary>
public sealed record MechanicsSection(double RotatingMassKg, double MagnetMassG, IReadOnlyList<(string Part, double N)> PullN, string PullMethod)
{
    /// <summary>The pull between the rotors against the face-to-face gap of their magnets while they are brought
    /// together (<c>pull_curve</c>; empty unless dual-rotor), first point at the running gap.</summary>
    public IReadOnlyList<(double FaceToFaceMm, double PullN)> PullCurve { get; init; } = Array.Empty<(double, double)>();

    /// <summary>Moment of inertia of everything that turns about the axis, kg m^2 (<c>rotating_inertia_kg_m2</c>; 0 when the parts were not measured).</summary>
    public double RotatingInertiaKgM2 { get; init; }
}

/// <summary>One line of the bill of materials.</summary>
public sealed record BomEntry(string Category, string Item, string Specification, double Quantity, string Unit, string Notes);

public sealed record CoilSection
{
    public required int Turns { get; init; }
    public required double WireBare { get; init; }
    public required double WireOverall { get; init; }
    public required double FillFactor { get; init; }

    /// <summary>Round coils only.</summary>
    public double? InnerDiameter { get; init; }

    /// <summary>Round coils only.</summary>
    public double? OuterDiameter { get; init; }

    /// <summary>Keystone coils: their outline instead of the diameters.</summary>
    public KeystoneOutline? Outline { get; init; }

    public required double Height { get; init; }
    public required double PitchRadius { get; init; }
    public required double MeanTurn { get; init; }
    public required double WireLengthM { get; init; }
    public required double Resistance20cOhm { get; init; }
    public required double ResistanceHotOhm { get; init; }
    public required double InductanceUh { get; init; }
    public required double CopperMassG { get; init; }

    // Additions.
    public int? WireAwg { get; init; }
    public double RadialBuild { get; init; }
    public double LeadAllowance { get; init; }
    public double MaxTemperatureC { get; init; }

    /// <summary>The winding's steady temperature at the operating point, C (an addition: <c>coil.temperature_c</c>; the hot resistance is at it).</summary>
    public double TemperatureC { get; init; }
    public double WireOhmPerM20C { get; init; }
    public double EmfRmsV { get; init; }
    public bool TurnsSolved { get; init; }
}

/// <summary>
/// Keystone coil outline, mm: radial extent of the winding's outer boundary, the inner window's width at the
/// pitch radius (coils.core.width) and the winding's overall width there (window + 2 x radial build).
/// </summary>
public sealed record KeystoneOutline(double InnerRadius, double OuterRadius, double WindowWidth, double Width, double RadialBuild);

public sealed record PhaseSection(int CoilsInSeries, double EmfPeakV, double EmfRmsV, double Resistance20cOhm)
{
    // Additions.
    public string Connection { get; init; } = "";
    public int ParallelPaths { get; init; } = 1;
    public double EmfFundamentalRmsV { get; init; }
    public double ResistanceHotOhm { get; init; }
    public double InductanceUh { get; init; }
    public double ThdPercent { get; init; }
}
