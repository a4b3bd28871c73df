using PartForge.Design.Machines;
using PartForge.Geometry;
using PartForge.Geometry.Regions;

namespace PartForge.Parts.Mechanics;

/// <summary>One kind of part that turns: its copies, and the mass and moment of inertia of all of them.</summary>
public sealed record RotatingShare(string Name, int Quantity, double MassKg, double InertiaKgM2);

/// <summary>
/// Everything that turns with the shaft: every copy of every rotating part (mass and Int rho r^2 dV from the part's
/// own regions and its material's density), the magnets (each its mass times the mean r^2 over its face, from its
/// outline), and the user's extra inertia (<c>mechanics.extra_inertia</c>). All parts are coaxial with the machine
/// axis. Printed parts count as solid (100 % infill), as their mass does.
/// </summary>
public sealed record RotatingAssembly
{
    public required IReadOnlyList<RotatingShare> Shares { get; init; }

    /// <summary>Mass of the rotating parts and magnets, kg.</summary>
    public required double MassKg { get; init; }

    /// <summary>Moment of inertia about the axis: parts, magnets and the extra, kg m^2.</summary>
    public required double InertiaKgM2 { get; init; }

    /// <summary>The magnets' share of <see cref="InertiaKgM2"/>, kg m^2.</summary>
    public required double MagnetInertiaKgM2 { get; init; }

    /// <summary>The extra inertia on the shaft (<c>mechanics.extra_inertia</c>), kg m^2.</summary>
    public required double ExtraInertiaKgM2 { get; init; }

    /// <summary>The rotating assembly of a machine's parts.</summary>
    public static RotatingAssembly Of(MachineModel d, PartSet parts)
    {
        var shares = parts.Parts.Where(p => p.Rotating)
            .Select(p => new RotatingShare(p.Name, p.Quantity, p.MassG * p.Quantity / 1000, p.InertiaKgM2 * p.Quantity)).ToList();
        int magnets = d.Poles * d.Layout.Rotors.Count;
        double each = OneMagnetInertiaKgM2(d.Magnets.Shape, d.Precision);
        double magnetMass = magnets * d.Magnets.Shape.MassKg;
        shares.Add(new RotatingShare("magnets", magnets, magnetMass, magnets * each));
        double extra = d.Mechanics.ExtraInertiaKgM2;
        return new RotatingAssembly
        {
            Shares = shares,
            MassKg = shares.Sum(s => s.MassKg),
            InertiaKgM2 = shares.Sum(s => s.InertiaKgM2) + extra,
            MagnetInertiaKgM2 = magnets * each,
            ExtraInertiaKgM2 = extra,
        };
    }

    /// <summary>One magnet about the machine axis, kg m^2: its mass times Int r^2 dA / A over its face (outline of magnet 0).</summary>
    public static double OneMagnetInertiaKgM2(Design.Machines.Magnets.MagnetShape shape, Precision precision)
    {
        var face = Region.FromContour(shape.Outline(0), precision);
        return face.Area > 0 ? shape.MassKg * face.PolarMomentMm4 / face.Area * 1e-6 : 0;
    }
}
