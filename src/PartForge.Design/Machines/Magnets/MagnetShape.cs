using System.Globalization;
using PartForge.Design.Materials;
using PartForge.Geometry.Profiles;

namespace PartForge.Design.Machines.Magnets;

/// <summary>
/// The plan shape of an axially magnetised rotor magnet, with everything that follows from it: its outline
/// (and its pocket's, grown by a clearance), face area, perimeter, radial extent, centroid, mass and
/// description. Magnet 0 is centred on +x at its pitch radius; magnet k of a rotor at k x 360 / poles.
/// A closed set (<see cref="MagnetShapes.Kinds"/>): a new shape is a new subclass and one registration.
/// </summary>
public abstract record MagnetShape
{
    protected MagnetShape(double thicknessMm, double pitchRadiusMm)
    {
        ThicknessMm = thicknessMm;
        PitchRadiusMm = pitchRadiusMm;
    }

    /// <summary>Thickness along the axis (the magnetisation direction), mm.</summary>
    public double ThicknessMm { get; }

    /// <summary>Radius of the magnet's reference centre (disc and block: centre; arc: mid radius; sector: centre-line midpoint), mm.</summary>
    public double PitchRadiusMm { get; }

    /// <summary>The shape's registration (design-file word and keys).</summary>
    public abstract MagnetShapeKind Kind { get; }

    /// <summary>
    /// Outline of magnet 0 grown by <paramref name="clearanceMm"/> as a pocket is: the clearance is added to each
    /// of the magnet's sizes (disc: on the diameter; block and sector: c/2 beyond every side; arc: c/2 on each
    /// radius and the span widened by c at the pitch radius). 0 gives the bare magnet.
    /// </summary>
    public abstract Contour Outline(double clearanceMm);

    /// <summary>Pole face area, mm^2.</summary>
    public abstract double FaceAreaMm2 { get; }

    /// <summary>Perimeter of the pole face, mm.</summary>
    public abstract double PerimeterMm { get; }

    /// <summary>Length along the radial centre line, mm.</summary>
    public abstract double RadialLengthMm { get; }

    /// <summary>Width across the centre line at the pitch radius (arc: the chord there), mm.</summary>
    public abstract double TangentialWidthMm { get; }

    /// <summary>Radius of the face's centroid, mm (the load radius of its pull and of its centrifugal force).</summary>
    public virtual double CentroidRadiusMm => PitchRadiusMm;

    /// <summary>Smallest and largest radius of the pocket (grown by <paramref name="clearanceMm"/>) from the machine axis, mm.</summary>
    public abstract (double Min, double Max) RadialRangeMm(double clearanceMm);

    /// <summary>
    /// Web between two neighbouring pockets of <paramref name="poles"/> (grown by <paramref name="clearanceMm"/>),
    /// mm; zero or negative when they touch or overlap. Neighbours are mirror images across the bisector between
    /// them, so the web is twice the distance of one pocket from that line.
    /// </summary>
    public abstract double WebMm(int poles, double clearanceMm);

    /// <summary>Largest plan size (for the far-field distance of its field), mm.</summary>
    public virtual double PlanSizeMm => Math.Max(RadialLengthMm, TangentialWidthMm);

    /// <summary>Volume, mm^3.</summary>
    public double VolumeMm3 => FaceAreaMm2 * ThicknessMm;

    /// <summary>Mass of one sintered NdFeB magnet, kg.</summary>
    public double MassKg => VolumeMm3 * 1e-9 * MaterialTable.NdFeBDensityKgM3;

    /// <summary>The magnet for a parts list: "disc D12 x 4 mm".</summary>
    public abstract string Describe();

    /// <summary>The pocket's plan size for a drawing note, e.g. "D12.15" or "20.15 x 10.15".</summary>
    public abstract string PocketText(double clearanceMm);

    /// <summary>The pocket's plan sizes for a drawing (id and value, mm), first the main one.</summary>
    public abstract IReadOnlyList<(string Id, double Mm)> PocketSizes(double clearanceMm);

    protected static string F(double v) => v.ToString("0.###", CultureInfo.InvariantCulture);
}
