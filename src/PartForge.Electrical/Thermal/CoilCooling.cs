using PartForge.Design.Machines;
using PartForge.Design.Materials;
using PartForge.Design.Parts;
using PartForge.Electrical.Coils;

namespace PartForge.Electrical.Thermal;

/// <summary>
/// How one coil sheds its copper loss: a steady, lumped heat path from the winding to still air (docs/physics.md §13).
///
/// The winding's two faces lie against the former's flanges; the heat crosses each flange (thickness
/// <c>former.flange</c>, the former material's conductivity from the material table) and leaves its outer face by
/// natural convection. Only the area of the winding's own face counts on each side (the flange's overhang beyond the
/// winding and the core inside it are left out), the winding's side wall is taken as insulated (it sits in the
/// stator's seat, and conduction into the stator ring is not credited), and no airflow from the turning rotor is
/// credited: every simplification lowers the heat shed, so the temperature is an upper estimate. The two faces are in
/// parallel: R = 1 / (2 / (f / (k A) + 1 / (h A))) with A the winding's plan area.
///
/// h = 10 W/(m^2 K): a common-practice figure for small surfaces in still air (natural convection; textbooks give
/// 2-25 W/(m^2 K) for free convection in gases, about 5-10 for plates of a few centimetres at a few tens of kelvin;
/// from memory), with no credit for radiation.
/// </summary>
public sealed record CoilCooling
{
    /// <summary>Natural-convection coefficient from a former's face to still air, W/(m^2 K) (common practice, from memory).</summary>
    public const double NaturalConvectionWPerM2K = 10;

    /// <summary>Area of one face of the winding (the plan area of the winding between window and outline), mm^2.</summary>
    public required double FaceAreaMm2 { get; init; }

    /// <summary>Faces that shed heat (the two flanges).</summary>
    public int Faces => 2;

    /// <summary>Flange thickness the heat crosses on each face, mm.</summary>
    public required double FlangeMm { get; init; }

    /// <summary>The former's material (its thermal conductivity is used).</summary>
    public required Material FormerMaterial { get; init; }

    /// <summary>Convection coefficient used, W/(m^2 K).</summary>
    public double ConvectionWPerM2K { get; init; } = NaturalConvectionWPerM2K;

    /// <summary>Resistance of one flange (conduction across it), K/W.</summary>
    public double FlangeResistanceKPerW => FlangeMm * 1e-3 / (FormerMaterial.ThermalConductivityWPerMK * FaceAreaMm2 * 1e-6);

    /// <summary>Resistance of one face to the air (convection), K/W.</summary>
    public double ConvectionResistanceKPerW => 1 / (ConvectionWPerM2K * FaceAreaMm2 * 1e-6);

    /// <summary>Resistance from the winding to the air, K/W: the two faces in parallel.</summary>
    public double ResistanceKPerW => (FlangeResistanceKPerW + ConvectionResistanceKPerW) / Faces;

    /// <summary>The cooling of a machine's coil (its outline as wound, its former).</summary>
    public static CoilCooling Of(MachineModel machine, CoilOutline outline) => new()
    {
        FaceAreaMm2 = outline.WindingPlanAreaMm2,
        FlangeMm = machine.Former.FlangeMm,
        FormerMaterial = machine.Parts.For(PartRole.Former).Material,
    };
}
