using PartForge.Design.Machines;
using PartForge.Design.Parts;
using PartForge.Design.Stack;

namespace PartForge.Electrical.Field;

/// <summary>
/// One steel face behind a rotor's magnets, as the image method sees it: the plane of the face, the steel
/// thickness that carries the flux between poles, and the part that holds it. A back-iron disc (<c>rotor.back_iron</c>)
/// has its face at the disc's face towards the magnets. A steel rotor disc (<c>rotor.material</c> a magnetic steel)
/// with blind pockets acts as back iron itself: its face is the pocket floor (the magnets' back faces), and the
/// steel behind them is the pocket floor plus any back-iron disc bolted behind it. Dual-stator machines carry no
/// back iron (the rotor sits between the stators), so they have no planes.
/// </summary>
/// <param name="Rotor">the rotor whose magnets the steel backs</param>
/// <param name="Part">the steel part (the back iron, or the rotor itself when it is steel)</param>
/// <param name="FaceZMm">z of the steel face towards the magnets, mm</param>
/// <param name="TowardsPlusZ">true when the steel lies on the +z side of its face</param>
/// <param name="ThicknessMm">steel thickness carrying the flux, mm</param>
/// <param name="SteelRotor">true when the rotor disc itself is steel</param>
/// <param name="ThicknessKey">the design key that sets the thickness</param>
public sealed record IronPlane(PartId Rotor, PartId Part, double FaceZMm, bool TowardsPlusZ, double ThicknessMm, bool SteelRotor, string ThicknessKey)
{
    /// <summary>The steel faces of a machine, front rotor first (the one with the highest z).</summary>
    public static IReadOnlyList<IronPlane> Of(MachineModel machine)
    {
        var list = new List<IronPlane>();
        if (!machine.Layout.AllowsBackIron) return list;
        var stack = machine.Stack;
        var r = machine.Rotor;
        bool steelRotor = r.Material.IsMagneticSteel && r.PocketFloorMm > 0;
        foreach (var rotor in machine.Layout.Rotors)
        {
            var mags = stack.Slabs.Where(s => s.Kind == SlabKind.Magnet && s.Owner == rotor).ToList();
            var discs = stack.Slabs.Where(s => s.Kind == SlabKind.Rotor && s.Owner == rotor).ToList();
            if (mags.Count == 0 || discs.Count == 0) continue;
            var mag = mags[0];
            var disc = discs[0];
            bool up = disc.ZMax + disc.ZMin > mag.ZMax + mag.ZMin; // the disc lies beyond its magnets on the +z side
            var irons = stack.Slabs.Where(s => s.Kind == SlabKind.BackIron && s.Owner == rotor).ToList();
            double? bi = r.BackIronThicknessMm is { } b && irons.Count > 0 ? b : null;
            if (steelRotor)
                list.Add(new IronPlane(rotor, rotor, up ? mag.ZMax : mag.ZMin, up, r.PocketFloorMm + (bi ?? 0), true, "rotor.thickness"));
            else if (bi is { } t)
                list.Add(new IronPlane(rotor, PartId.BackIron, up ? irons[0].ZMin : irons[0].ZMax, up, t, false, "rotor.back_iron.thickness"));
        }
        return list.OrderByDescending(p => p.FaceZMm).ToList();
    }
}
