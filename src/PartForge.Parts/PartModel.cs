using PartForge.Design.Machines;
using PartForge.Design.Materials;
using PartForge.Design.Parts;
using PartForge.Geometry.Meshes;
using PartForge.Geometry.Profiles;
using PartForge.Geometry.Solids;

namespace PartForge.Parts;

/// <summary>
/// One distinct part of the machine, immutable. Identical copies are one model with a <see cref="Quantity"/>
/// and one <see cref="PartInstance"/> each.
/// </summary>
public sealed record PartModel
{
    /// <summary>Which part (role and side).</summary>
    public required PartId Id { get; init; }

    /// <summary>The contract part name (rotor-front, back-iron, ...), for file names and messages; a print piece's
    /// name is its part's and the piece's (<c>former-base</c>).</summary>
    public string Name => Piece is null ? Id.Name : $"{Id.Name}-{Piece}";

    /// <summary>For a print piece (one of <see cref="PrintPieces"/> of a part): its name within the part; null for a part.</summary>
    public string? Piece { get; init; }

    /// <summary>
    /// The pieces the part is printed in when it is not printed whole (a coil former as a base and a cap, so that
    /// no surface overhangs): each a prismatic part of its own, in its own frame (z = 0 its bottom face), with the
    /// part's copies; together, as assembled, they make the part. Empty when the part is printed in one piece.
    /// </summary>
    public IReadOnlyList<PartModel> PrintPieces { get; init; } = Array.Empty<PartModel>();

    /// <summary>What goes on the printer: the part's pieces, or the part itself.</summary>
    public IEnumerable<PartModel> PrintUnits => PrintPieces.Count > 0 ? PrintPieces : new[] { this };

    /// <summary>What the part is for.</summary>
    public PartRole Role => Id.Role;

    /// <summary>Printed or cut.</summary>
    public required PartProcess Process { get; init; }

    /// <summary>How many copies the machine needs (= <see cref="Instances"/>.Count).</summary>
    public int Quantity => Instances.Count;

    /// <summary>Material (from the one material table).</summary>
    public required Material Material { get; init; }

    /// <summary>Height of the part (its solid spans z = 0 .. HeightMm in part-local coordinates).</summary>
    public required double HeightMm { get; init; }

    /// <summary>The part in exact primitives, layer by layer (what the solid was made from).</summary>
    public required IReadOnlyList<ExactLayer> ExactLayers { get; init; }

    /// <summary>
    /// The layered solid in part-local coordinates (z from 0 at the bottom face). Made from the exact layers on
    /// first use (thread-safe): checks work on the exact primitives, so a check or a sweep, or a build that
    /// writes only some parts, never pays for the regions of the others. Once the mesh is made the regions are
    /// let go (a later read makes them again, the same). Throws <see cref="PartsException"/> when the layers
    /// cannot be made into regions.
    /// </summary>
    public LayeredSolid Solid => (_solid ?? throw new InvalidOperationException($"{Name}: no solid source")).Value;

    private SolidSource? _solid;

    internal SolidSource SolidSource { init => _solid = value; }

    /// <summary>
    /// The solid's closed, outward-oriented triangle mesh (part-local). Made on first use (thread-safe), so that
    /// checking a design does not pay for meshing parts that are never written.
    /// </summary>
    public Mesh Mesh => (_mesh ?? throw new InvalidOperationException($"{Name}: no mesh source")).Value;

    private Lazy<Mesh>? _mesh;

    /// <summary>Whether the mesh has been made (a build meshes only the parts its files need).</summary>
    public bool MeshMade => _mesh?.IsValueCreated == true;

    /// <summary>How the mesh is made (set by <see cref="PartsBuilder"/>).</summary>
    internal Lazy<Mesh> MeshSource { init => _mesh = value; }

    /// <summary>
    /// A text that is equal for two parts exactly when their meshes are equal: the part, its height, the polygon
    /// precision, the symmetry and every exact layer (contour by contour, numbers round-tripped). The mesher is a
    /// pure function of these, so a later build with the same key can take this part's mesh
    /// (<see cref="ReusingMeshOf"/>).
    /// </summary>
    public string GeometryKey => _geometryKey ??= Parts.GeometryKey.Of(this, _meshInputs);

    private string? _geometryKey;

    private string _meshInputs = "";

    /// <summary>Precision and symmetry the mesh is made with (set by <see cref="PartsBuilder"/>).</summary>
    internal string MeshInputs { init => _meshInputs = value; }

    /// <summary>This part with <paramref name="earlier"/>'s solid and mesh (made or not) when both have the same
    /// <see cref="GeometryKey"/>; else this part unchanged.</summary>
    public PartModel ReusingMeshOf(PartModel earlier)
    {
        ArgumentNullException.ThrowIfNull(earlier);
        if (earlier.Id != Id || earlier.GeometryKey != GeometryKey || earlier._mesh is null || earlier._solid is null) return this;
        return this with { MeshSource = earlier._mesh, SolidSource = earlier._solid };
    }

    /// <summary>For cut parts: the exact profile to cut (outer boundary and through holes); null for printed parts.</summary>
    public Profile? CutProfile { get; init; }

    /// <summary>For cut parts: contours to engrave (polarity dots of a cut rotor); empty otherwise.</summary>
    public IReadOnlyList<Contour> Marks { get; init; } = Array.Empty<Contour>();

    /// <summary>Named features with exact primitives (pockets, seats, sensor pockets, holes, bore, rim, ...), part-local.</summary>
    public required IReadOnlyList<PartFeature> Features { get; init; }

    /// <summary>Every copy's nominal place in the machine.</summary>
    public required IReadOnlyList<PartInstance> Instances { get; init; }

    /// <summary>True for parts that turn with the shaft (rotors, their back irons, the dual-rotor hub spacer).</summary>
    public bool Rotating => Id.Facts.Rotates;

    /// <summary>Builder's instructions and the geometry choices worth telling the user (which way up magnets go, ...).</summary>
    public IReadOnlyList<string> Notes { get; init; } = Array.Empty<string>();

    /// <summary>Volume of one copy in mm^3: sum over the solid's layers of region area x height (the discretised solid,
    /// within the chordal bound of the true-circle volume).</summary>
    public double VolumeMm3 => (_solid ?? throw new InvalidOperationException($"{Name}: no solid source")).Volume;

    /// <summary>Mass of one copy in grams from <see cref="VolumeMm3"/> and the material density (solid, 100% infill).</summary>
    public double MassG => Material.MassG(VolumeMm3);

    /// <summary>Moment of inertia of one copy about the machine axis (the part's own z axis), kg m^2: density x Int r^2 dV of its regions.</summary>
    public double InertiaKgM2 => Material.DensityKgM3 * (_solid ?? throw new InvalidOperationException($"{Name}: no solid source")).PolarMomentMm5 * 1e-15;

    /// <summary>Features of one kind, in index order.</summary>
    public IEnumerable<PartFeature> FeaturesOf(FeatureKind kind) => Features.Where(f => f.Kind == kind).OrderBy(f => f.Index);

    /// <summary>The feature with this name (throws if absent).</summary>
    public PartFeature Feature(string name) => Features.First(f => f.Name == name);
}
