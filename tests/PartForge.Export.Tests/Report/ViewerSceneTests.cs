using System.Text.Json;
using PartForge.Checks;
using PartForge.Export.Report;
using PartForge.Geometry.Primitives;
using PartForge.Parts.Placement;

namespace PartForge.Export.Tests.Report;

/// <summary>
/// The 3D view's scene decodes back to the parts: every vertex within half a quantisation step of the mesh, the
/// indices equal, and each copy's matrix puts a point where the assembly placement (AssemblyBuilder) puts it.
/// The decoding is written here, independently of the viewer's script.
/// </summary>
public class ViewerSceneTests
{
    public static IEnumerable<object[]> Presets() => Pipeline.Presets();

    [Theory]
    [MemberData(nameof(Presets))]
    public void The_scene_decodes_to_the_part_meshes_and_their_placements(string preset)
    {
        var ev = Pipeline.Evaluate(preset);
        using var doc = JsonDocument.Parse(ViewerScene.Json(ev.Parts!, ev.Checks));
        var parts = doc.RootElement.GetProperty("parts").EnumerateArray().ToList();
        Assert.Equal(ev.Parts!.Parts.Select(p => p.Name), parts.Select(p => p.GetProperty("name").GetString()));
        var places = AssemblyBuilder.Places(ev.Parts!, exploded: false);
        foreach (var (model, js) in ev.Parts.Parts.Zip(parts))
        {
            var mesh = model.Mesh;
            var lo = js.GetProperty("lo").EnumerateArray().Select(e => e.GetDouble()).ToArray();
            var st = js.GetProperty("step").EnumerateArray().Select(e => e.GetDouble()).ToArray();
            var pos = Convert.FromBase64String(js.GetProperty("pos").GetString()!);
            Assert.Equal(mesh.VertexCount * 6, pos.Length);
            var decoded = new Vec3[mesh.VertexCount];
            for (int i = 0; i < mesh.VertexCount; i++)
            {
                decoded[i] = new Vec3(lo[0] + BitConverter.ToUInt16(pos, 6 * i) * st[0], lo[1] + BitConverter.ToUInt16(pos, 6 * i + 2) * st[1], lo[2] + BitConverter.ToUInt16(pos, 6 * i + 4) * st[2]);
                var v = mesh.Vertices[i];
                Assert.True(Math.Abs(decoded[i].X - v.X) <= st[0] / 2 + 1e-9 && Math.Abs(decoded[i].Y - v.Y) <= st[1] / 2 + 1e-9 && Math.Abs(decoded[i].Z - v.Z) <= st[2] / 2 + 1e-9,
                    $"{preset} {model.Name}: vertex {i} decodes to {decoded[i]}, not {v}");
            }
            var idx = Convert.FromBase64String(js.GetProperty("idx").GetString()!);
            bool wide = js.GetProperty("wide").GetBoolean();
            Assert.Equal(wide, mesh.VertexCount > 65535);
            Assert.Equal(mesh.Indices.Count * (wide ? 4 : 2), idx.Length);
            for (int i = 0; i < mesh.Indices.Count; i++)
                Assert.Equal(mesh.Indices[i], wide ? (int)BitConverter.ToUInt32(idx, 4 * i) : BitConverter.ToUInt16(idx, 2 * i));

            var copies = js.GetProperty("copies").EnumerateArray().ToList();
            var mine = places.Where(p => p.Part == model).ToList();
            Assert.Equal(mine.Count, copies.Count);
            foreach (var (place, c) in mine.Zip(copies))
            {
                var m = c.GetProperty("m").EnumerateArray().Select(e => e.GetDouble()).ToArray();
                Assert.Equal(place.Copy.ExplodeRank, c.GetProperty("rank").GetDouble());
                // Three vertices of the part, placed by the matrix and by the placement the 3MF uses.
                var placed = place.PlacedMesh();
                foreach (int i in new[] { 0, mesh.VertexCount / 2, mesh.VertexCount - 1 })
                {
                    var p = mesh.Vertices[i];
                    var q = new Vec3(m[0] * p.X + m[4] * p.Y + m[8] * p.Z + m[12], m[1] * p.X + m[5] * p.Y + m[9] * p.Z + m[13], m[2] * p.X + m[6] * p.Y + m[10] * p.Z + m[14]);
                    var want = placed.Vertices[i];
                    Assert.True((q - want).Length < 1e-9, $"{preset} {place.ObjectName}: vertex {i} placed at {q}, the assembly has {want}");
                }
            }
        }
    }

    [Theory]
    [MemberData(nameof(Presets))]
    public void The_scene_lists_every_warning_and_failure_that_names_a_part_and_is_deterministic(string preset)
    {
        var ev = Pipeline.Evaluate(preset);
        string a = ViewerScene.Json(ev.Parts!, ev.Checks), b = ViewerScene.Json(ev.Parts!, ev.Checks);
        Assert.Equal(a, b, StringComparer.Ordinal);
        Assert.All(a, ch => Assert.True(ch >= 0x20 && ch < 0x7f, "the scene text is plain ASCII"));
        Assert.DoesNotContain("</", a);
        using var doc = JsonDocument.Parse(a);
        var listed = doc.RootElement.GetProperty("checks").EnumerateArray()
            .Select(c => (c.GetProperty("id").GetString(), c.GetProperty("part").GetString(), c.TryGetProperty("counterpart", out var cp) ? cp.GetString() : null)).ToList();
        var expected = ev.Checks.Checks.Where(c => c.Part is not null && c.Status != CheckStatus.Pass).Select(c => (c.Id, c.PartName, c.CounterpartName)).ToList();
        Assert.Equal(expected, listed);
    }
}
