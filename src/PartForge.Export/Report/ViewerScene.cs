using System.Globalization;
using System.Text;
using PartForge.Checks;
using PartForge.Design.Parts;
using PartForge.Geometry.Meshes;
using PartForge.Parts;

namespace PartForge.Export.Report;

/// <summary>
/// The 3D view's data: every part's mesh once, in its own frame, quantised to 16-bit steps of its bounding box
/// (positions) and 16- or 32-bit indices, base64 in a JSON object; every copy as a 4x4 placement and its
/// explode rank; the checks that name a part, for the highlight. Deterministic: fixed order, invariant numbers.
/// </summary>
public static class ViewerScene
{
    /// <summary>The scene as one JSON text (ASCII only, safe inside a script element).</summary>
    public static string Json(PartSet parts, CheckReport checks)
    {
        var sb = new StringBuilder();
        sb.Append("{\"explodeMm\":").Append(N(parts.ExplodeMm)).Append(",\"parts\":[");
        bool first = true;
        foreach (var p in parts.Parts)
        {
            if (!first) sb.Append(',');
            first = false;
            var c = Previews.ColourOf(p.Role);
            sb.Append("{\"name\":\"").Append(p.Name).Append("\",\"colour\":[")
              .Append(N(c.R / 255.0)).Append(',').Append(N(c.G / 255.0)).Append(',').Append(N(c.B / 255.0)).Append("],");
            AppendMesh(sb, p.Mesh);
            sb.Append(",\"copies\":[");
            for (int i = 0; i < p.Instances.Count; i++)
            {
                var inst = p.Instances[i];
                if (i > 0) sb.Append(',');
                sb.Append("{\"m\":[");
                var m = Placement(inst);
                for (int k = 0; k < 16; k++) { if (k > 0) sb.Append(','); sb.Append(N(m[k])); }
                sb.Append("],\"rank\":").Append(N(inst.ExplodeRank)).Append('}');
            }
            sb.Append("]}");
        }
        sb.Append("],\"checks\":[");
        first = true;
        foreach (var r in checks.Checks.Where(r => r.Part is not null && r.Status != CheckStatus.Pass))
        {
            if (!first) sb.Append(',');
            first = false;
            sb.Append("{\"id\":\"").Append(JsonText(r.Id)).Append("\",\"status\":\"").Append(r.StatusText).Append("\",\"part\":\"").Append(JsonText(r.PartName)).Append('"');
            if (r.CounterpartName is { } cp) sb.Append(",\"counterpart\":\"").Append(JsonText(cp)).Append('"');
            if (r.Where is { } w)
            {
                sb.Append(",\"where\":\"").Append(JsonText(w.Feature)).Append('"');
                if (w.AngleDeg is { } a) sb.Append(",\"angleDeg\":").Append(N(a));
            }
            sb.Append('}');
        }
        sb.Append("]}");
        return sb.ToString();
    }

    /// <summary>Column-major 4x4 matrix taking part-local (x, y, z) to the machine frame, as
    /// <see cref="PartInstance.ToMachine(PartForge.Geometry.Primitives.Vec2)"/> and <see cref="PartInstance.ToMachineZ"/> do.</summary>
    public static double[] Placement(PartInstance inst)
    {
        double a = inst.RotationDeg * Math.PI / 180, c = Math.Cos(a), s = Math.Sin(a);
        // q = R (p + (ox, 0)); flipped mirrors y; z -> bottom + z or bottom + height - z.
        double fy = inst.Flipped ? -1 : 1;
        double zz = inst.Flipped ? -1 : 1, tz = inst.Flipped ? inst.BottomZMm + inst.HeightMm : inst.BottomZMm;
        double ox = inst.OffsetXMm;
        return
        [
            c, fy * s, 0, 0,
            -s, fy * c, 0, 0,
            0, 0, zz, 0,
            c * ox, fy * s * ox, tz, 1,
        ];
    }

    private static void AppendMesh(StringBuilder sb, Mesh mesh)
    {
        var (lo, hi) = mesh.Bounds();
        var v = mesh.Vertices;
        var pos = new byte[v.Count * 6];
        double sx = Step(lo.X, hi.X), sy = Step(lo.Y, hi.Y), sz = Step(lo.Z, hi.Z);
        for (int i = 0; i < v.Count; i++)
        {
            Put16(pos, 6 * i, Q(v[i].X, lo.X, sx));
            Put16(pos, 6 * i + 2, Q(v[i].Y, lo.Y, sy));
            Put16(pos, 6 * i + 4, Q(v[i].Z, lo.Z, sz));
        }
        var idx = mesh.Indices;
        bool wide = v.Count > 65535;
        var ib = new byte[idx.Count * (wide ? 4 : 2)];
        for (int i = 0; i < idx.Count; i++)
        {
            if (wide) { uint u = (uint)idx[i]; ib[4 * i] = (byte)u; ib[4 * i + 1] = (byte)(u >> 8); ib[4 * i + 2] = (byte)(u >> 16); ib[4 * i + 3] = (byte)(u >> 24); }
            else Put16(ib, 2 * i, (ushort)idx[i]);
        }
        sb.Append("\"lo\":[").Append(N(lo.X)).Append(',').Append(N(lo.Y)).Append(',').Append(N(lo.Z))
          .Append("],\"step\":[").Append(N(sx)).Append(',').Append(N(sy)).Append(',').Append(N(sz))
          .Append("],\"wide\":").Append(wide ? "true" : "false")
          .Append(",\"pos\":\"").Append(Convert.ToBase64String(pos)).Append("\",\"idx\":\"").Append(Convert.ToBase64String(ib)).Append('"');
    }

    private static double Step(double lo, double hi) => hi > lo ? (hi - lo) / 65535.0 : 1;

    private static ushort Q(double x, double lo, double step) => (ushort)Math.Clamp(Math.Round((x - lo) / step), 0, 65535);

    private static void Put16(byte[] b, int at, ushort u) { b[at] = (byte)u; b[at + 1] = (byte)(u >> 8); }

    private static string N(double x) => x.ToString("R", CultureInfo.InvariantCulture);

    private static string JsonText(string s)
    {
        var sb = new StringBuilder(s.Length);
        foreach (char ch in s)
        {
            if (ch == '"' || ch == '\\') sb.Append('\\').Append(ch);
            else if (ch < 0x20 || ch > 0x7e || ch == '<' || ch == '>' || ch == '&') sb.Append("\\u").Append(((int)ch).ToString("x4", CultureInfo.InvariantCulture));
            else sb.Append(ch);
        }
        return sb.ToString();
    }
}
