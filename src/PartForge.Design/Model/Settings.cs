namespace PartForge.Design.Model;

public sealed class Gap
{
    [Range(0, 50, MinExclusive = true), Doc("Nominal running clearance between rotating and stationary faces, each side, mm.")]
    public double AirGap { get; init; } = 1.0;

    [Range(0, 50), Doc("Worst-case running clearance below this fails, mm.")]
    public double MinRunningGap { get; init; } = 0.3;
}

public sealed class Tolerances
{
    [Range(0, 5), Doc("Printer accuracy in the plane, mm.")]
    public double PrintXy { get; init; } = 0.1;

    [Range(0, 5), Doc("Printer accuracy along z, mm.")]
    public double PrintZ { get; init; } = 0.1;

    [Range(0, 10), Doc("Axial wobble at the rotor rim, mm.")]
    public double Runout { get; init; } = 0.1;

    [Range(0, 10), Doc("Bearing axial play, mm.")]
    public double AxialPlay { get; init; } = 0.05;
}

public sealed class Process
{
    [Range(0.05, 3), Doc("Printer nozzle diameter, mm.")]
    public double Nozzle { get; init; } = 0.4;

    [Range(0.01, 2), Doc("Print layer height, mm.")]
    public double Layer { get; init; } = 0.2;

    [Range(1, 20), Doc("Minimum number of extrusion lines in a wall.")]
    public int MinWallLines { get; init; } = 2;

    [Range(0, 2), Doc("Laser kerf for cut parts, mm.")]
    public double Kerf { get; init; } = 0.15;

    [OneOf("polyline", "entities"), Doc("How DXF cut sheets carry contours that are not full circles: polyline (one closed POLYLINE, arcs as bulges) or entities (LINE and ARC entities chained end to end, for laser-cutter software that reads no bulges).")]
    public string DxfContours { get; init; } = "polyline";
}

public sealed class MeshSettings
{
    [Range(0, 10, MinExclusive = true), Doc("Maximum distance between a true arc and its facets, mm.")]
    public double ChordalTolerance { get; init; } = 0.01;
}

public sealed class Operation
{
    [Range(0, 1e9, MinExclusive = true), Doc("Generator: resistive load across each phase (star) or line, ohm.")]
    public double LoadResistance { get; init; } = 10;

    [Range(0, 1000, MinExclusive = true), Doc("Motor: DC supply voltage, V.")]
    public double SupplyVoltage { get; init; } = 12;

    [Range(0, 10), Doc("Motor: voltage drop of the switch (transistor or reed), V.")]
    public double SwitchDrop { get; init; } = 0.7;

    [Range(0, 5000), Doc("Lead length added to each coil's wire, mm.")]
    public double LeadAllowance { get; init; } = 150;

    [Range(-40, 60), Doc("Still air around the machine, C: the coils' steady temperature is this plus the rise from their copper loss.")]
    public double AmbientTemperature { get; init; } = 25;
}

public sealed class AssemblyLayout
{
    [Range(0, 500), Doc("Axial distance added between neighbouring parts in the exploded assembly, mm.")]
    public double Explode { get; init; } = 15;
}

public sealed class PartOverrides
{
    [Doc("Override for the rotor disc(s).")]
    public PartOverride? Rotor { get; init; }

    [Doc("Override for the back-iron disc(s).")]
    public PartOverride? BackIron { get; init; }

    [Doc("Override for the coil former.")]
    public PartOverride? Former { get; init; }

    [Doc("Override for the stator ring(s).")]
    public PartOverride? Stator { get; init; }

    [Doc("Override for the spacer rings.")]
    public PartOverride? Spacer { get; init; }
}

public sealed class PartOverride
{
    [OneOf("print", "cut"), Doc("print: 3D-print (STL/3MF); cut: laser-cut from sheet (DXF/SVG).")]
    public string? Process { get; init; }

    [OneOf("PLA", "PETG", "ABS", "ASA", "PA", "aluminium", "steel", "acrylic", "plywood"), Doc("Material of the part.")]
    public string? Material { get; init; }
}
