using PartForge.Design.Machines;
using PartForge.Electrical.Flux;

namespace PartForge.Electrical.Field;

/// <summary>
/// Flux density in the steel behind the magnets, and the image strength that follows from it.
///
/// Model: with ideal iron the normal flux density at the steel face is twice that of every source on the gap side
/// of the face (the face's own images mirror them). The flux of one pole is that density integrated over one pole
/// pitch of the face (magnet 0's sector, radially the magnets' range widened by a margin on each side; flux landing
/// farther out is left out). Under a pole the flux splits in two and runs tangentially through the steel to the two
/// neighbouring poles, so the steel's radial section between two poles carries half the pole's flux. The section
/// counted is the steel thickness times the magnets' radial length only (conservative: flux spreading over a wider
/// disc is not counted): B = Phi_pole / (2 t L_r). With same-pole magnets the flux leaves each pole radially
/// through the arcs of one pole pitch at the track's edges: B = Phi_pole / (t 2 pi (r_in + r_out) / poles).
///
/// Saturation: the steel carries at most B_sat over that section. When the ideal-iron flux asks for more, the image
/// is weakened (a factor k between 0 and 1 on every image in that face) so that the flux per pole is what the
/// section carries at B_sat, interpolating linearly between no iron (k = 0) and ideal iron (k = 1); the field is
/// linear in the sources, so this is exact within the image model's idealisations. A stated approximation: real
/// steel bends over gradually (its B-H knee), which the check's margin below B_sat covers.
/// </summary>
public static class BackIronFlux
{
    /// <summary>Saturation flux density of low-carbon steel, T (mild steel about 2.0-2.1 T; from memory).</summary>
    public const double SaturationTesla = 2.0;

    /// <summary>Highest flux density the check accepts, T: the knee of mild steel's B-H curve, where its permeability
    /// has fallen to a few hundred (common practice for back iron, about 80 % of saturation; from memory).</summary>
    public const double LimitTesla = 1.6;

    /// <summary>Below this the check passes without a warning, T.</summary>
    public const double PassTesla = 1.4;

    /// <summary>Steel thicknesses are offered in steps of this, mm (sheet stock).</summary>
    public const double ThicknessStepMm = 0.5;

    /// <summary>The steel faces of the machine with their flux (ideal iron) and image strength, with the magnets at
    /// <paramref name="brTesla"/> (default: the design's Br at 20 C).</summary>
    public static IReadOnlyList<BackIronFluxResult> Compute(MachineModel machine, double farFactor = RotorField.DefaultFarFactor, double? brTesla = null)
    {
        var planes = IronPlane.Of(machine);
        if (planes.Count == 0) return Array.Empty<BackIronFluxResult>();
        var g = machine.Magnets.Shape;
        int poles = machine.Poles;
        double br = brTesla ?? machine.Magnets.BrTesla;
        var real = new List<MagnetSource>();
        foreach (var m in RotorField.MagnetSlabs(machine))
            for (int k = 0; k < poles; k++)
                real.Add(new MagnetSource(g, k * 360.0 / poles, m.ZMin, m.ZMax, machine.Magnets.SignOf(k) * br, farFactor));
        var (rMin, rMax) = g.RadialRangeMm(0);
        double radial = Math.Max(rMax - rMin, 1e-6);
        var results = new List<BackIronFluxResult>();
        foreach (var p in planes)
        {
            // Sources on the gap side of this face: the magnets and their (ideal) images in the other faces.
            var gapSide = new List<MagnetSource>(real);
            foreach (var other in planes)
                if (!ReferenceEquals(other, p))
                    gapSide.AddRange(real.Select(m => m.ImageIn(other.FaceZMm, farFactor)));
            double dist = real.Min(m => Math.Min(Math.Abs(m.ZMinMm - p.FaceZMm), Math.Abs(m.ZMaxMm - p.FaceZMm)));
            double margin = Math.Max(3, 2 * dist);
            var rb = new List<double> { Math.Max(0, rMin - margin), rMin };
            for (int i = 1; i <= 4; i++) rb.Add(rMin + radial * i / 4);
            rb.Add(rMax + margin);
            var (xr, wr) = GaussLegendre.Composite(rb, 3, false);
            double half = Math.PI / poles;
            var ab = new List<double>();
            for (int i = 0; i <= 4; i++) ab.Add(-half + 2 * half * i / 4);
            var (xa, wa) = GaussLegendre.Composite(ab, 3, false);
            double ideal = 0, bare = 0;
            for (int i = 0; i < xr.Length; i++)
                for (int j = 0; j < xa.Length; j++)
                {
                    double x = xr[i] * Math.Cos(xa[j]), y = xr[i] * Math.Sin(xa[j]), w = wr[i] * wa[j] * xr[i];
                    double b0 = 0, b1 = 0;
                    for (int s = 0; s < gapSide.Count; s++)
                    {
                        double bz = gapSide[s].Bz(x, y, p.FaceZMm);
                        b1 += bz;
                        if (s < real.Count) b0 += bz;
                    }
                    ideal += w * 2 * b1;
                    bare += w * b0;
                }
            double phiIdeal = Math.Abs(ideal) * 1e-6, phiBare = Math.Abs(bare) * 1e-6;
            double t = p.ThicknessMm;
            // Alternating magnets: the pole's flux splits both ways to the neighbouring poles, through two radial
            // sections t x L_r. Same-pole magnets have no neighbour of the other sign: the flux leaves the pole
            // radially, inwards and outwards, through the steel's arcs of one pole pitch at the track's inner and
            // outer edges (t x 2 pi r / poles each; conservative, the disc beyond the track is not counted).
            double section = machine.Magnets.Arrangement == MagnetArrangement.Same
                ? t * 2 * Math.PI * (rMin + rMax) / poles * 1e-6
                : 2 * t * radial * 1e-6; // m^2, both ways out of the pole
            double bIdeal = section > 0 ? phiIdeal / section : double.PositiveInfinity;
            double cap = SaturationTesla * section;
            double k = phiIdeal - phiBare > 1e-15 ? Math.Clamp((cap - phiBare) / (phiIdeal - phiBare), 0, 1) : 1;
            // B falls as 1/t (the face flux does not depend on the thickness in the image model).
            double need = bIdeal * t / PassTesla;
            double pass = Math.Ceiling(need / ThicknessStepMm - 1e-9) * ThicknessStepMm;
            results.Add(new BackIronFluxResult(p, phiIdeal, bIdeal, k, Math.Max(pass, ThicknessStepMm)));
        }
        return results;
    }
}

/// <summary>The flux in one steel face's section (see <see cref="BackIronFlux"/>).</summary>
/// <param name="Plane">the steel face</param>
/// <param name="FluxPerPoleWb">flux of one pole into the face with ideal iron, Wb</param>
/// <param name="FluxDensityTesla">tangential flux density the section would carry with ideal iron, T</param>
/// <param name="ImageStrength">the face's image strength after saturation (1: ideal)</param>
/// <param name="ThicknessToPassMm">steel thickness that brings the density to <see cref="BackIronFlux.PassTesla"/>, mm (sheet steps)</param>
public sealed record BackIronFluxResult(IronPlane Plane, double FluxPerPoleWb, double FluxDensityTesla, double ImageStrength, double ThicknessToPassMm);
