using PartForge.Design.Parts;
using PartForge.Formats.Png;
using PartForge.Parts;
using PartForge.Parts.Placement;

namespace PartForge.Export.Report;

/// <summary>
/// Shaded PNG previews of each part and of the exploded assembly, drawn by the project's own rasteriser
/// (deterministic: the same parts give the same bytes).
/// </summary>
public static class Previews
{
    /// <summary>Picture size of every preview, pixels.</summary>
    public const int Width = 800, Height = 600;

    /// <summary>The shade of a part by its role.</summary>
    public static Rgb ColourOf(PartRole role) => role switch
    {
        PartRole.Rotor => new Rgb(95, 160, 150),
        PartRole.BackIron => new Rgb(122, 128, 136),
        PartRole.Former => new Rgb(222, 182, 90),
        PartRole.Stator => new Rgb(205, 184, 130),
        _ => new Rgb(164, 158, 143), // the spacers
    };

    /// <summary>One part on its own, seen from above at an angle.</summary>
    public static byte[] Part(PartModel part)
    {
        var view = new RenderView { Width = Width, Height = Height, AzimuthDeg = -60, ElevationDeg = 38 };
        // The kernel's meshes are closed and outward by construction (and validated), so back faces can go.
        var img = SoftwareRasteriser.Render([RenderItem.FromMesh(part.Mesh, ColourOf(part.Role)) with { ClosedOutward = true }], view).Image;
        return PngEncoder.Encode(img);
    }

    /// <summary>The exploded assembly, seen from the side and a little above so the axial order shows.</summary>
    public static byte[] Assembly(PartSet set)
    {
        var placed = AssemblyBuilder.Build(set, exploded: true);
        var items = placed.Select(p => RenderItem.FromMesh(p.Mesh, ColourOf(p.Part.Role))).ToArray();
        var view = new RenderView { Width = Width, Height = Height, AzimuthDeg = -65, ElevationDeg = 18 };
        return PngEncoder.Encode(SoftwareRasteriser.Render(items, view).Image);
    }
}
