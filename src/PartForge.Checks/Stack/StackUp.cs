using PartForge.Design.Parts;
using PartForge.Design.Stack;

namespace PartForge.Checks.Stack;

/// <summary>
/// Worst-case axial stack-up of every running gap. The nominal positions come from
/// <see cref="AxialStack.From"/> (the one rule shared with the electrical engine and the part builders);
/// this adds the tolerances, linearly (every loss at its full value at once: a worst case, not a
/// statistical sum):
/// <list type="bullet">
/// <item>print_z once for each printed part whose thickness sets a face of the gap: the rotor (its face and
/// its pocket depth, hence the magnet's stand-proud) and the stationary pack (the thicker of the stator ring
/// and the formers; both when they are equally thick, since either may come out thick);</item>
/// <item>tolerances.runout, the axial wobble at the rotor rim, in full;</item>
/// <item>tolerances.axial_play, the bearing play, in full on each side (the shaft can sit at either end);</item>
/// <item>the rotor's rim deflection under the magnetic pull (Roark annular plate, see
/// <see cref="Mechanics.AnnularPlate"/>);</item>
/// <item>the coil bulge: how far the copper pushes the former flange out past the stationary face (see
/// <see cref="CoilBulge"/>); zero when the flanged former is inside the stator ring's thickness by more
/// than the bulge.</item>
/// </list>
/// </summary>
public static class StackUp
{
    /// <param name="stack">Nominal stack.</param>
    /// <param name="printZMm">tolerances.print_z.</param>
    /// <param name="runoutMm">tolerances.runout.</param>
    /// <param name="axialPlayMm">tolerances.axial_play.</param>
    /// <param name="isPrinted">Whether the named part (rotor, rotor-front, stator, former, ...) is printed.</param>
    /// <param name="deflectionMm">Rim deflection toward the stator of the named rotor, mm (positive).</param>
    /// <param name="bulgePerFaceMm">Axial bulge of the winding on each face, mm.</param>
    /// <param name="flangeMm">former.flange.</param>
    public static IReadOnlyList<FaceGap> Compute(AxialStack stack, double printZMm, double runoutMm, double axialPlayMm,
        Func<PartId, bool> isPrinted, Func<PartId, double> deflectionMm, double bulgePerFaceMm, double flangeMm)
    {
        var result = new List<FaceGap>();
        var rotatingKinds = new[] { SlabKind.Rotor, SlabKind.Magnet };
        var stationaryKinds = new[] { SlabKind.Stator, SlabKind.Former, SlabKind.Copper };
        var rotors = stack.Slabs.Where(s => s.Kind == SlabKind.Rotor).Select(s => s.Owner).Distinct().ToList();
        var stators = stack.Slabs.Where(s => s.Kind == SlabKind.Stator).Select(s => s.Owner).Distinct().ToList();
        foreach (var rotor in rotors)
        {
            var rot = stack.Slabs.Where(s => s.Owner == rotor && rotatingKinds.Contains(s.Kind)).ToList();
            double rotMin = rot.Min(s => s.ZMin), rotMax = rot.Max(s => s.ZMax);
            foreach (var stator in stators)
            {
                var sta = stack.Slabs.Where(s => s.Owner == stator && stationaryKinds.Contains(s.Kind)).ToList();
                double staMin = sta.Min(s => s.ZMin), staMax = sta.Max(s => s.ZMax);
                int side;
                double nominal;
                if (rotMin >= staMax) { side = 1; nominal = rotMin - staMax; }
                else if (staMin >= rotMax) { side = -1; nominal = staMin - rotMax; }
                else { side = rotMin + rotMax > staMin + staMax ? 1 : -1; nominal = side > 0 ? rotMin - staMax : staMin - rotMax; }
                // Only the stationary pack that faces this rotor directly (dual-stator: each stator faces one rotor face).
                if (stators.Count > 1 && !FacesDirectly(stack, rotor, stator, side)) continue;

                var rotorFace = stack.Slabs.First(s => s.Owner == rotor && s.Kind == SlabKind.Rotor);
                var magnet = stack.Slabs.FirstOrDefault(s => s.Owner == rotor && s.Kind == SlabKind.Magnet);
                bool magnetNearest = side > 0 ? magnet.ZMin < rotorFace.ZMin - 1e-12 : magnet.ZMax > rotorFace.ZMax + 1e-12;

                var losses = new List<GapLoss>();
                if (isPrinted(rotor)) losses.Add(new GapLoss($"print_z {rotor.Name}", printZMm));
                var statorSlab = sta.First(s => s.Kind == SlabKind.Stator);
                var formerSlab = sta.FirstOrDefault(s => s.Kind == SlabKind.Former);
                double statorT = statorSlab.Thickness, formerT = formerSlab.Thickness;
                bool statorSets = statorT >= formerT - 1e-12, formerSets = formerT >= statorT - 1e-12;
                if ((statorSets && isPrinted(stator)) || (formerSets && isPrinted(PartId.Former)))
                    losses.Add(new GapLoss($"print_z {(formerSets && !statorSets ? PartId.Former : stator).Name}", printZMm));
                if (runoutMm > 0) losses.Add(new GapLoss("runout", runoutMm));
                if (axialPlayMm > 0) losses.Add(new GapLoss("axial_play", axialPlayMm));
                double defl = Math.Max(0, deflectionMm(rotor));
                if (defl > 0) losses.Add(new GapLoss("deflection", defl));
                if (bulgePerFaceMm > 0)
                {
                    // The copper's face plus the flange it pushes out, against the stationary face.
                    var copper = sta.First(s => s.Kind == SlabKind.Copper);
                    double copperFace = side > 0 ? copper.ZMax : -copper.ZMin;
                    double face = side > 0 ? staMax : -staMin;
                    double intrusion = copperFace + flangeMm + bulgePerFaceMm - face;
                    if (intrusion > 0) losses.Add(new GapLoss("coil bulge", intrusion));
                }
                result.Add(new FaceGap(rotor, stator, side, nominal, losses, magnetNearest ? "magnet face" : "rotor face"));
            }
        }
        return result;
    }

    private static bool FacesDirectly(AxialStack stack, PartId rotor, PartId stator, int side)
    {
        // In dual-stator the stator on +z faces the rotor's +z face and vice versa.
        var sta = stack.Slabs.First(s => s.Owner == stator && s.Kind == SlabKind.Stator);
        var rot = stack.Slabs.First(s => s.Owner == rotor && s.Kind == SlabKind.Rotor);
        double staMid = (sta.ZMin + sta.ZMax) / 2, rotMid = (rot.ZMin + rot.ZMax) / 2;
        return side > 0 ? rotMid > staMid : rotMid < staMid;
    }
}
