using PartForge.Geometry.Primitives;

namespace PartForge.Formats.Png;

/// <summary>
/// A small deterministic software rasteriser: orthographic projection, a depth buffer, flat Lambert shading
/// under one fixed light, optional supersampling. Single-threaded and free of time or randomness, so the
/// same scene always gives the same pixels.
/// </summary>
public static class SoftwareRasteriser
{
    public static RenderResult Render(IReadOnlyList<RenderItem> items, RenderView view)
    {
        if (view.Width <= 0 || view.Height <= 0 || view.Width > 8192 || view.Height > 8192)
            throw new ArgumentOutOfRangeException(nameof(view), "image size must be 1..8192 pixels");
        int ss = Math.Clamp(view.Supersample, 1, 4);
        int w = view.Width * ss, h = view.Height * ss;

        // Camera frame: f points from the scene towards the eye; right and up span the screen.
        double az = view.AzimuthDeg, el = view.ElevationDeg;
        var f = new Vec3(Angle.CosDeg(el) * Angle.CosDeg(az), Angle.CosDeg(el) * Angle.SinDeg(az), Angle.SinDeg(el));
        var right = new Vec3(-Angle.SinDeg(az), Angle.CosDeg(az), 0);
        var up = f.Cross(right);
        var light = Normalize(right * -0.45 + up * 0.65 + f * 0.62);

        // Fit the projected bounds into the image.
        double minX = double.MaxValue, maxX = double.MinValue, minY = double.MaxValue, maxY = double.MinValue;
        foreach (var it in items)
            foreach (var p in it.Positions)
            {
                double sx = p.Dot(right), sy = p.Dot(up);
                if (!double.IsFinite(sx) || !double.IsFinite(sy)) throw new ArgumentException("non-finite vertex", nameof(items));
                minX = Math.Min(minX, sx); maxX = Math.Max(maxX, sx);
                minY = Math.Min(minY, sy); maxY = Math.Max(maxY, sy);
            }
        if (minX > maxX) { minX = maxX = minY = maxY = 0; }
        double spanX = Math.Max(maxX - minX, 1e-9), spanY = Math.Max(maxY - minY, 1e-9);
        double scale = view.PixelsPerMm ?? Math.Min(view.Width * (1 - 2 * view.Margin) / spanX, view.Height * (1 - 2 * view.Margin) / spanY);
        double s = scale * ss;
        double cx = (minX + maxX) / 2, cy = (minY + maxY) / 2;

        // Working buffers from the shared pool (a supersampled 800 x 600 picture needs 8 MB of depth and 6 MB of
        // colour; fresh arrays would be zeroed by the runtime and then filled again). Every element used is
        // written below before it is read, so what a rented array held before does not matter.
        var depth = System.Buffers.ArrayPool<float>.Shared.Rent(w * h);
        var colour = System.Buffers.ArrayPool<byte>.Shared.Rent(w * h * 3);
        try
        {
        depth.AsSpan(0, w * h).Fill(float.NegativeInfinity);
        colour[0] = view.Background.R; colour[1] = view.Background.G; colour[2] = view.Background.B;
        for (int filled = 3, total = w * h * 3; filled < total; filled *= 2)
            colour.AsSpan(0, Math.Min(filled, total - filled)).CopyTo(colour.AsSpan(filled));

        foreach (var it in items)
        {
            var pos = it.Positions;
            var tri = it.Triangles;
            int n = pos.Count;
            var px = new double[n]; var py = new double[n]; var pz = new double[n];
            for (int i = 0; i < n; i++)
            {
                var p = pos[i];
                px[i] = w / 2.0 + (p.Dot(right) - cx) * s;
                py[i] = h / 2.0 - (p.Dot(up) - cy) * s;
                pz[i] = p.Dot(f);
            }
            for (int t = 0; t + 2 < tri.Count; t += 3)
            {
                int a = tri[t], b = tri[t + 1], c = tri[t + 2];
                var nrm = (pos[b] - pos[a]).Cross(pos[c] - pos[a]);
                double len = nrm.Length;
                if (!(len > 0)) continue;
                nrm = nrm * (1 / len);
                if (nrm.Dot(f) < 0)
                {
                    if (it.ClosedOutward) continue;            // a back face of a closed mesh: always hidden
                    nrm = nrm * -1;                            // light both sides
                }
                double shade = Math.Clamp(view.Ambient + (1 - view.Ambient) * Math.Max(0, nrm.Dot(light)), 0, 1);
                byte r = (byte)Math.Round(it.Colour.R * shade), g = (byte)Math.Round(it.Colour.G * shade), bl = (byte)Math.Round(it.Colour.B * shade);
                Fill(px[a], py[a], pz[a], px[b], py[b], pz[b], px[c], py[c], pz[c], w, h, depth, colour, r, g, bl);
            }
        }

        if (view.Outlines) DrawOutlines(depth, colour, w, h, view.OutlineDepthFraction * Math.Max(spanX, spanY));
        return new RenderResult(new RgbImage(view.Width, view.Height, Downsample(colour, w, h, ss)), scale);
        }
        finally
        {
            System.Buffers.ArrayPool<float>.Shared.Return(depth);
            System.Buffers.ArrayPool<byte>.Shared.Return(colour);
        }
    }

    private static void Fill(double ax, double ay, double az, double bx, double by, double bz, double cx, double cy, double cz,
        int w, int h, float[] depth, byte[] colour, byte r, byte g, byte b)
    {
        double area = (bx - ax) * (cy - ay) - (by - ay) * (cx - ax);
        if (area == 0 || !double.IsFinite(area)) return;
        int x0 = Math.Max(0, (int)Math.Floor(Math.Min(ax, Math.Min(bx, cx))));
        int x1 = Math.Min(w - 1, (int)Math.Ceiling(Math.Max(ax, Math.Max(bx, cx))));
        int y0 = Math.Max(0, (int)Math.Floor(Math.Min(ay, Math.Min(by, cy))));
        int y1 = Math.Min(h - 1, (int)Math.Ceiling(Math.Max(ay, Math.Max(by, cy))));
        double inv = 1 / area;
        for (int y = y0; y <= y1; y++)
        {
            double qy = y + 0.5;
            // Only the columns where this row crosses the triangle (from its edges, widened by a pixel either
            // side), so a long thin triangle costs its length, not its bounding box; the barycentric test
            // below still decides every pixel, so the picture is the same as scanning the whole box.
            double lo = double.PositiveInfinity, hi = double.NegativeInfinity;
            Span(ax, ay, bx, by, qy, ref lo, ref hi);
            Span(bx, by, cx, cy, qy, ref lo, ref hi);
            Span(cx, cy, ax, ay, qy, ref lo, ref hi);
            if (lo > hi) continue;
            int xs = Math.Max(x0, (int)Math.Floor(lo) - 1), xe = Math.Min(x1, (int)Math.Ceiling(hi) + 1);
            for (int x = xs; x <= xe; x++)
            {
                double qx = x + 0.5;
                // Barycentric weights from edge functions; the sign of area makes them positive inside.
                double w0 = ((bx - qx) * (cy - qy) - (by - qy) * (cx - qx)) * inv;
                double w1 = ((cx - qx) * (ay - qy) - (cy - qy) * (ax - qx)) * inv;
                double w2 = 1 - w0 - w1;
                if (w0 < 0 || w1 < 0 || w2 < 0) continue;
                float z = (float)(w0 * az + w1 * bz + w2 * cz);
                int i = y * w + x;
                if (z <= depth[i]) continue;
                depth[i] = z;
                colour[3 * i] = r; colour[3 * i + 1] = g; colour[3 * i + 2] = b;
            }
        }
    }

    /// <summary>Widens [lo, hi] by the x where edge (p, q) crosses the row y (when it does).</summary>
    private static void Span(double px, double py, double qx, double qy, double y, ref double lo, ref double hi)
    {
        if ((py > y) == (qy > y)) return;
        double x = px + (y - py) * (qx - px) / (qy - py);
        if (x < lo) lo = x;
        if (x > hi) hi = x;
    }

    /// <summary>
    /// Darkens pixels where the depth is not locally planar (second difference above the threshold, in mm):
    /// silhouettes, the rims of pockets and holes, steps between layers. Reads the depth buffer only, so it is
    /// as deterministic as the fill.
    /// </summary>
    private static void DrawOutlines(float[] depth, byte[] colour, int w, int h, double thresholdMm)
    {
        var edge = new bool[w * h];
        for (int y = 1; y < h - 1; y++)
            for (int x = 1; x < w - 1; x++)
            {
                int i = y * w + x;
                double z = depth[i];
                if (double.IsNegativeInfinity(z)) continue;
                double l = depth[i - 1], r = depth[i + 1], u = depth[i - w], dn = depth[i + w];
                if (double.IsNegativeInfinity(l) || double.IsNegativeInfinity(r) || double.IsNegativeInfinity(u) || double.IsNegativeInfinity(dn))
                {
                    edge[i] = true;
                    continue;
                }
                if (Math.Abs(l + r - 2 * z) > thresholdMm || Math.Abs(u + dn - 2 * z) > thresholdMm) edge[i] = true;
            }
        for (int i = 0; i < edge.Length; i++)
            if (edge[i])
            {
                colour[3 * i] = (byte)(colour[3 * i] * 0.3);
                colour[3 * i + 1] = (byte)(colour[3 * i + 1] * 0.3);
                colour[3 * i + 2] = (byte)(colour[3 * i + 2] * 0.3);
            }
    }

    private static byte[] Downsample(byte[] src, int w, int h, int ss)
    {
        if (ss == 1) return src.AsSpan(0, w * h * 3).ToArray(); // src is a pooled buffer: copy out
        int ow = w / ss, oh = h / ss, n = ss * ss;
        var dst = new byte[ow * oh * 3];
        for (int y = 0; y < oh; y++)
            for (int x = 0; x < ow; x++)
                for (int ch = 0; ch < 3; ch++)
                {
                    int sum = 0;
                    for (int dy = 0; dy < ss; dy++)
                        for (int dx = 0; dx < ss; dx++)
                            sum += src[((y * ss + dy) * w + x * ss + dx) * 3 + ch];
                    dst[(y * ow + x) * 3 + ch] = (byte)((sum + n / 2) / n);
                }
        return dst;
    }

    private static Vec3 Normalize(Vec3 v) => v * (1 / v.Length);
}
