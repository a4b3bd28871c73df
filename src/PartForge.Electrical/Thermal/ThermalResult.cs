using PartForge.Electrical.Operation;

namespace PartForge.Electrical.Thermal;

/// <summary>
/// The coils' and magnets' steady temperatures at the operating point (docs/physics.md §13): the copper loss at the
/// governing operating point with the winding resistance at the temperature it produces, shed through
/// <see cref="CoilCooling"/> into still air at <c>operation.ambient_temperature</c>.
///
/// Magnet temperature: taken equal to the coil's steady temperature. The magnets carry no loss of their own in this
/// model (eddy currents in them are neglected), so in steady state they sit between the air and the hottest surface
/// they exchange heat with, the coil faces: the coil's temperature bounds them from above (conservative). Their Br
/// follows the reversible coefficient up to the grade's maximum working temperature and is held there beyond it (the
/// loss is then not reversible, which the model does not follow; the magnet-temperature check fails).
/// </summary>
public sealed record ThermalResult
{
    /// <summary>Which operating point's copper loss heats the coils.</summary>
    public required OperatingMode Point { get; init; }

    /// <summary>Still air around the machine, C.</summary>
    public required double AmbientC { get; init; }

    /// <summary>Steady winding temperature (the mean over the winding, what its resistance sees), C.</summary>
    public required double CoilTemperatureC { get; init; }

    /// <summary>Copper loss in one coil at that temperature, W.</summary>
    public required double CopperLossPerCoilW { get; init; }

    /// <summary>Copper loss of the whole machine at that temperature, W.</summary>
    public required double CopperLossW { get; init; }

    /// <summary>Heat path of one coil.</summary>
    public required CoilCooling Cooling { get; init; }

    /// <summary>Magnet temperature used for Br, C (equal to <see cref="CoilTemperatureC"/>; see the type's note).</summary>
    public required double MagnetTemperatureC { get; init; }

    /// <summary>Field evaluations the magnet temperature took (1 unless steel behind the magnets saturates).</summary>
    public required int FieldPasses { get; init; }
}
