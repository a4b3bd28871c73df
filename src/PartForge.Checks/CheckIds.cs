namespace PartForge.Checks;

/// <summary>
/// The stable check identifiers. They appear in the results document and scripts rely on them: add new
/// ones, never rename.
/// </summary>
public static class CheckIds
{
    /// <summary>Worst-case axial running clearance on each rotating face (stack-up with every tolerance).</summary>
    public const string RunningGap = "running-gap";
    /// <summary>Rim deflection of a rotor disc under the magnetic pull (Roark annular plate).</summary>
    public const string MagnetPullDeflection = "magnet-pull-deflection";
    /// <summary>Bending stress at the clamped hub of a rotor disc under the magnetic pull (Roark annular plate).</summary>
    public const string MagnetPullStress = "magnet-pull-stress";
    /// <summary>Minimum 3D clearance between rotating and stationary bodies over one pole pitch.</summary>
    public const string RotationClearance = "rotation-clearance";
    /// <summary>Web between adjacent magnet pockets.</summary>
    public const string PocketWeb = "pocket-web";
    /// <summary>Wall between a magnet pocket and the rotor rim.</summary>
    public const string PocketRimWall = "pocket-rim-wall";
    /// <summary>Wall between a magnet pocket and the bore.</summary>
    public const string PocketBoreWall = "pocket-bore-wall";
    /// <summary>Wall between a magnet pocket and a bolt hole.</summary>
    public const string PocketBoltWall = "pocket-bolt-wall";
    /// <summary>Material under a blind magnet pocket, against the minimum wall and the layer count.</summary>
    public const string PocketFloor = "pocket-floor";
    /// <summary>Walls of the stator ring around the coil seats (between seats and to the ring edges).</summary>
    public const string SeatWall = "seat-wall";
    /// <summary>Material between a bolt or mount hole and the nearest edge.</summary>
    public const string BoltEdgeDistance = "bolt-edge-distance";
    /// <summary>Wall between a sensor pocket and the neighbouring coil seats.</summary>
    public const string SensorSeatClearance = "sensor-seat-clearance";
    /// <summary>Clearance between the windings (former flanges) of neighbouring coils in the ring.</summary>
    public const string CoilCoilClearance = "coil-coil-clearance";
    /// <summary>Copper fill factor the turns need, against hexagonal packing and the practical range.</summary>
    public const string WindingFill = "winding-fill";
    /// <summary>Hoop stress at the bore of a rotor spinning at max_rpm, magnets included (Timoshenko).</summary>
    public const string RotorHoopStress = "rotor-hoop-stress";
    /// <summary>Centrifugal force on a magnet at max_rpm against the pocket rim wall that holds it.</summary>
    public const string MagnetRetention = "magnet-retention";
    /// <summary>Axial magnetic pull on one magnet against the glue that holds it in its pocket.</summary>
    public const string MagnetPullOut = "magnet-pull-out";
    /// <summary>Current density in the coil wire at the operating point.</summary>
    public const string CurrentDensity = "current-density";
    /// <summary>Computed steady winding temperature against coils.max_temperature and the softening points of the former and stator materials.</summary>
    public const string CoilTemperature = "coil-temperature";

    /// <summary>The magnets' estimated operating temperature against their grade suffix's maximum working temperature.</summary>
    public const string MagnetTemperature = "magnet-temperature";
    /// <summary>A printed part fits the printer: its footprint in printing orientation on the bed (in a quarter turn), its height under bed_z.</summary>
    public const string PrintBedFit = "print-bed-fit";
    /// <summary>A printed part (each of its print pieces) has no overhang beyond 45 degrees in its printing orientation (warns: needs supports).</summary>
    public const string PrintOverhang = "print-overhang";
    /// <summary>A cut part fits a sheet the user has (with the edge spacing), and so the cutter's bed.</summary>
    public const string CutSheetFit = "cut-sheet-fit";
    /// <summary>Every copy of a cut part has a place in the nest of its material and thickness on the sheets of cutter.sheets.</summary>
    public const string CutSheetStock = "cut-sheet-stock";
    /// <summary>The coil seats (former footprint plus the seat clearance) lie radially inside the stator ring.</summary>
    public const string CoilSeatInRing = "coil-seat-in-ring";
    /// <summary>The windings face the magnet track: radial overlap of the winding with the magnets.</summary>
    public const string CoilFacesMagnets = "coil-faces-magnets";
    /// <summary>A diagnostic of the electrical engine (impossible combination, extra-low-voltage warning).</summary>
    public const string Electrical = "electrical";
    /// <summary>Flux density in the steel behind the magnets (back iron or a steel rotor) against steel's saturation.</summary>
    public const string BackIronSaturation = "back-iron-saturation";
    /// <summary>Tensile stress in each stud or bolt of a joint (ISO 898-1 tensile stress area, class 8.8) under the clamp the torque and pull need.</summary>
    public const string FastenerTension = "fastener-tension";
    /// <summary>Bearing stress a fastener puts on a clamped part: under its washer, and on the hole wall if the joint slips.</summary>
    public const string FastenerBearing = "fastener-bearing";
    /// <summary>Jacking screws of the last rotor against the full pull: screw stress and nut bearing on the printed trap, as a utilisation.</summary>
    public const string JackingScrew = "jacking-screw";
    /// <summary>Torque sign of every pulse of the drive as the sensors really switch it (a pulse whose linkage falls over its window brakes).</summary>
    public const string DrivePulseTorque = "drive-pulse-torque";
    /// <summary>Standstill torque of the drive against the friction torque: does the rotor start by itself, from which angles.</summary>
    public const string DriveStart = "drive-start";
    /// <summary>Peak coil current the switch carries (standstill) against its current rating.</summary>
    public const string SwitchCurrent = "switch-current";
    /// <summary>Voltage across the opening switch (the inductive kick) against its voltage rating.</summary>
    public const string SwitchVoltage = "switch-voltage";
    /// <summary>A reed's switched power (peak current x supply voltage) against its contact rating.</summary>
    public const string SwitchPower = "switch-power";
    /// <summary>A freewheel path for the coil current when the switch opens (a reed without one arcs).</summary>
    public const string DriveFreewheel = "drive-freewheel";
    /// <summary>The rectified open-circuit peak at max_rpm against the capacitor's rated voltage.</summary>
    public const string StorageOvervoltage = "storage-overvoltage";
    /// <summary>Energy a capacitor store holds at its rated voltage, with the cautions.</summary>
    public const string StoredEnergy = "stored-energy";
    /// <summary>The speed at which the generator starts charging its store, against rated and max speed.</summary>
    public const string ChargeCutIn = "charge-cut-in";
}
