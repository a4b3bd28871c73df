namespace PartForge.Parts;

/// <summary>What a named feature of a part is (the checker and the report select features by kind).</summary>
public enum FeatureKind
{
    /// <summary>The outer boundary of the part (rim), including any index notch.</summary>
    Rim,
    /// <summary>The central hole.</summary>
    Bore,
    /// <summary>A hole of the rotor/back-iron/spacer bolt circle.</summary>
    BoltHole,
    /// <summary>A clearance hole for a jacking screw (the last rotor of a dual-rotor machine and the back iron).</summary>
    JackHole,
    /// <summary>A hex pocket that holds a jacking screw's nut, on the rotor's stator-side face.</summary>
    NutTrap,
    /// <summary>A stator mount hole.</summary>
    MountHole,
    /// <summary>A magnet pocket (blind or through).</summary>
    MagnetPocket,
    /// <summary>An engraved polarity dot beside a north-up pocket.</summary>
    PolarityMark,
    /// <summary>The notch in the rim that marks pocket 0.</summary>
    IndexNotch,
    /// <summary>A through opening of the stator ring that holds a former.</summary>
    CoilSeat,
    /// <summary>A blind pocket for a timing sensor body.</summary>
    SensorPocket,
    /// <summary>A through hole that takes a sensor's leads to the grooved face.</summary>
    SensorLeadHole,
    /// <summary>A shallow groove for coil or sensor leads.</summary>
    WireChannel,
    /// <summary>The groove that collects every lead.</summary>
    Collector,
    /// <summary>The groove where the leads leave the ring at its rim.</summary>
    TerminalExit,
    /// <summary>The former core (the coil's window).</summary>
    Core,
    /// <summary>A former flange footprint.</summary>
    Flange,
    /// <summary>The start-lead slot through a former flange.</summary>
    LeadSlot,
    /// <summary>The through hole of a former for a winding spindle.</summary>
    SpindleHole,
    /// <summary>The coil's winding outline (copper, for reference).</summary>
    WindingOutline,
    /// <summary>The coil's winding window (inner boundary of the copper).</summary>
    WindingWindow,
}
