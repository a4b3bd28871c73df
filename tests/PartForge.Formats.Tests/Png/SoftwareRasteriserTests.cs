using PartForge.Formats.Png;
using PartForge.Geometry.Primitives;

namespace PartForge.Formats.Tests.Png;

public class SoftwareRasteriserTests
{
    private static readonly Rgb Grey = new(180, 180, 180);

    [Fact]
    public void Top_view_of_a_cube_covers_its_square()
    {
        var cube = TestMeshes.Box(new Vec3(-5, -5, -5), new Vec3(5, 5, 5), Grey);
        var view = new RenderView { Width = 200, Height = 200, ElevationDeg = 90, AzimuthDeg = -90, PixelsPerMm = 10, Supersample = 1 };
        var r = SoftwareRasteriser.Render([cube], view);
        int covered = r.Image.CountPixelsNotEqual(view.Background);
        // A 10 mm square at 10 px/mm is 100 x 100 px; pixel centres decide coverage, so exactly 10,000
        // (the square's edges fall on pixel boundaries here).
        Assert.Equal(10000, covered);
    }

    [Fact]
    public void Cube_seen_along_its_diagonal_has_the_projected_area_of_Cauchys_formula()
    {
        // Source: Cauchy's projection formula for a convex body: projected area along unit d =
        // 1/2 sum |n_i . d| A_i; for a cube of side a along (1,1,1)/sqrt(3) this is sqrt(3) a^2 (a regular hexagon).
        double a = 10, ppm = 12;
        var cube = TestMeshes.Box(new Vec3(0, 0, 0), new Vec3(a, a, a), Grey);
        var view = new RenderView { Width = 400, Height = 400, AzimuthDeg = 45, ElevationDeg = Math.Atan(1 / Math.Sqrt(2)) * 180 / Math.PI, PixelsPerMm = ppm, Supersample = 1 };
        var r = SoftwareRasteriser.Render([cube], view);
        double expected = Math.Sqrt(3) * a * a * ppm * ppm;
        double perimeterPx = 6 * a * Math.Sqrt(2.0 / 3.0) * ppm;   // hexagon side = a sqrt(2/3)
        double covered = r.Image.CountPixelsNotEqual(view.Background);
        Assert.InRange(covered, expected - perimeterPx, expected + perimeterPx);
    }

    [Fact]
    public void The_nearer_surface_hides_the_farther_one()
    {
        var far = TestMeshes.Box(new Vec3(-10, -10, 0), new Vec3(10, 10, 1), new Rgb(200, 0, 0));
        var near = TestMeshes.Box(new Vec3(-2, -2, 5), new Vec3(2, 2, 6), new Rgb(0, 0, 200));
        var view = new RenderView { Width = 100, Height = 100, ElevationDeg = 90, AzimuthDeg = -90, PixelsPerMm = 4, Supersample = 1 };
        foreach (var order in new[] { new[] { far, near }, new[] { near, far } })
        {
            var img = SoftwareRasteriser.Render(order, view).Image;
            var centre = img[50, 50];
            Assert.True(centre.B > 0 && centre.R == 0, $"centre {centre}");
            var side = img[50, 20];
            Assert.True(side.R > 0 && side.B == 0, $"side {side}");
        }
    }

    [Fact]
    public void Rendering_is_deterministic_and_fitted_into_the_frame()
    {
        var items = new[]
        {
            TestMeshes.Box(new Vec3(-30, -30, 0), new Vec3(30, 30, 4), new Rgb(90, 140, 200)),
            TestMeshes.Box(new Vec3(-5, -5, 4), new Vec3(5, 5, 20), new Rgb(220, 150, 60)),
        };
        var view = new RenderView();
        var a = SoftwareRasteriser.Render(items, view);
        var b = SoftwareRasteriser.Render(items, view);
        Assert.Equal(PngEncoder.Encode(a.Image), PngEncoder.Encode(b.Image));
        // Fitted with a 6% margin: the border rows and columns stay background.
        for (int x = 0; x < view.Width; x++)
        {
            Assert.Equal(view.Background, a.Image[x, 0]);
            Assert.Equal(view.Background, a.Image[x, view.Height - 1]);
        }
        Assert.True(a.Image.CountPixelsNotEqual(view.Background) > view.Width * view.Height / 10);
    }
}
