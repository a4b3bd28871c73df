using System.Globalization;
using System.Text;
using PartForge.Formats.Cutting;
using PartForge.Formats.Io;
using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;

namespace PartForge.Formats.Dxf;

/// <summary>
/// Writes a cut sheet as ASCII DXF release 12 (AC1009), following the published DXF reference: a HEADER
/// (version, millimetre units, extents), TABLES (line type CONTINUOUS; layers <see cref="DxfLayers.Cut"/>,
/// <see cref="DxfLayers.Mark"/>, <see cref="DxfLayers.Notes"/>; text style STANDARD), an empty BLOCKS
/// section and the ENTITIES. Full circles become CIRCLE entities; every other contour, by default
/// (<see cref="DxfContours.Polyline"/>), one closed POLYLINE (flag 70 = 1) of VERTEX entities whose group 42
/// bulge, tan(sweep / 4), carries the true arcs, ended by SEQEND; or (<see cref="DxfContours.Entities"/>) one
/// LINE or ARC entity per segment, in the contour's order. Order: marks, then holes, then outlines. The kerf is stated in a 999 comment at the top
/// and, shorter, in a TEXT on the NOTES layer below the part.
/// </summary>
/// <remarks>
/// Lines end in CR LF (the customary DXF line end); group codes right-aligned in three columns, each value
/// on its own line; numbers in invariant culture, shortest round-trip form without exponents; text is
/// ASCII with other characters written as \U+XXXX. The output depends only on the input (byte-identical
/// on rewrite). No entity handles are written ($HANDLING 0), as R12 allows.
/// <para>LINE and ARC chains: an ARC is always counter-clockwise from its start angle (group 50) to its end
/// angle (group 51), in degrees in [0, 360), about its centre (group 10/20) with radius (group 40), as the
/// DXF reference defines it; a clockwise arc segment (every arc of a hole, which is cut clockwise) is
/// therefore written as the same arc with its ends swapped. Consecutive segments meet at the contour's
/// vertices (each segment's start point, as the polyline form writes them): a LINE's ends are written as
/// exactly those points, so neighbouring lines share their end points digit for digit and an ARC's ends,
/// which the reader computes from centre, radius and angles, meet them to rounding. An arc of a full turn
/// or more (which an ARC cannot carry) is written as two halves.</para>
/// </remarks>
public static class DxfWriter
{
    /// <summary>Height of the kerf note (mm).</summary>
    public const double NoteHeightMm = 2.5;

    /// <summary>Compensates the sheet for its kerf (<see cref="KerfCompensation.Apply"/>) and writes it.</summary>
    public static void Write(Stream stream, CutSheet sheet, DxfContours contours = DxfContours.Polyline) =>
        Write(stream, KerfCompensation.Apply(sheet), contours);

    /// <summary>Compensates and writes the sheet to a file atomically (temporary file, then rename); on an
    /// error nothing is left under <paramref name="path"/>'s name.</summary>
    public static void WriteFile(string path, CutSheet sheet, DxfContours contours = DxfContours.Polyline)
    {
        var plan = KerfCompensation.Apply(sheet);
        AtomicFile.Write(path, s => Write(s, plan, contours));
    }

    /// <summary>Writes an already compensated plan.</summary>
    public static void Write(Stream stream, CutPlan plan, DxfContours contours = DxfContours.Polyline)
    {
        if (contours is not (DxfContours.Polyline or DxfContours.Entities)) throw new ArgumentOutOfRangeException(nameof(contours));
        ArgumentNullException.ThrowIfNull(stream);
        ArgumentNullException.ThrowIfNull(plan);
        var w = new TagWriter(new StringBuilder(4096 + plan.Paths.Count * 512));

        string note = ShortKerfNote(plan);
        var frame = plan.Frame;
        // A nest's drawing is its sheet: the sheet's corner at the origin, the note below the sheet.
        var lo = frame is null ? plan.MinMm : new Vec2(Math.Min(0, plan.MinMm.X), Math.Min(0, plan.MinMm.Y));
        var hi = frame is null ? plan.MaxMm : new Vec2(Math.Max(frame.WidthMm, plan.MaxMm.X), Math.Max(frame.HeightMm, plan.MaxMm.Y));
        var notePos = new Vec2(lo.X, lo.Y - 2 * NoteHeightMm);
        // Approximate extents of the note: about 0.6 x height a character (STANDARD style, width factor 1).
        var extMin = new Vec2(lo.X, notePos.Y);
        var extMax = new Vec2(Math.Max(hi.X, notePos.X + 0.6 * NoteHeightMm * note.Length), hi.Y);

        w.Comment(Ascii($"{plan.PartName}: {KerfNote(plan)}"));
        w.Comment("written by PartForge, ASCII DXF R12, units millimetre");

        w.Tag(0, "SECTION"); w.Tag(2, "HEADER");
        w.Tag(9, "$ACADVER"); w.Tag(1, "AC1009");
        w.Tag(9, "$DWGCODEPAGE"); w.Tag(3, "ANSI_1252");
        w.Tag(9, "$HANDLING"); w.Int(70, 0);
        w.Tag(9, "$INSBASE"); w.Point(10, new Vec2(0, 0));
        w.Tag(9, "$EXTMIN"); w.Point(10, extMin);
        w.Tag(9, "$EXTMAX"); w.Point(10, extMax);
        w.Tag(9, "$LIMMIN"); w.Real(10, extMin.X); w.Real(20, extMin.Y);
        w.Tag(9, "$LIMMAX"); w.Real(10, extMax.X); w.Real(20, extMax.Y);
        w.Tag(9, "$INSUNITS"); w.Int(70, 4);
        w.Tag(9, "$MEASUREMENT"); w.Int(70, 1);
        w.Tag(0, "ENDSEC");

        w.Tag(0, "SECTION"); w.Tag(2, "TABLES");
        w.Tag(0, "TABLE"); w.Tag(2, "LTYPE"); w.Int(70, 1);
        w.Tag(0, "LTYPE"); w.Tag(2, "CONTINUOUS"); w.Int(70, 0); w.Tag(3, "Solid line"); w.Int(72, 65); w.Int(73, 0); w.Real(40, 0);
        w.Tag(0, "ENDTAB");
        w.Tag(0, "TABLE"); w.Tag(2, "LAYER"); w.Int(70, 4);
        Layer(w, "0", 7);
        Layer(w, DxfLayers.Cut, DxfLayers.CutColor);
        Layer(w, DxfLayers.Mark, DxfLayers.MarkColor);
        Layer(w, DxfLayers.Notes, DxfLayers.NotesColor);
        w.Tag(0, "ENDTAB");
        w.Tag(0, "TABLE"); w.Tag(2, "STYLE"); w.Int(70, 1);
        w.Tag(0, "STYLE"); w.Tag(2, "STANDARD"); w.Int(70, 0); w.Real(40, 0); w.Real(41, 1); w.Real(50, 0); w.Int(71, 0);
        w.Real(42, NoteHeightMm); w.Tag(3, "txt"); w.Tag(4, "");
        w.Tag(0, "ENDTAB");
        w.Tag(0, "ENDSEC");

        w.Tag(0, "SECTION"); w.Tag(2, "BLOCKS"); w.Tag(0, "ENDSEC");

        w.Tag(0, "SECTION"); w.Tag(2, "ENTITIES");
        foreach (var path in plan.Paths)
        {
            string layer = path.Kind == CutPathKind.Mark ? DxfLayers.Mark : DxfLayers.Cut;
            if (path.Contour.Circle is { } c)
            {
                w.Tag(0, "CIRCLE"); w.Tag(8, layer); w.Point(10, c.Center); w.Real(40, c.Radius);
                continue;
            }
            if (contours == DxfContours.Entities)
            {
                Chain(w, layer, path.Contour);
                continue;
            }
            w.Tag(0, "POLYLINE"); w.Tag(8, layer); w.Int(66, 1); w.Point(10, new Vec2(0, 0)); w.Int(70, 1);
            foreach (var s in ArcPieces.Of(path.Contour))
            {
                w.Tag(0, "VERTEX"); w.Tag(8, layer); w.Point(10, s.Start);
                if (s is ArcSegment a) w.Real(42, Math.Tan(a.SweepDeg * Math.PI / 180.0 / 4));
                w.Int(70, 0);
            }
            w.Tag(0, "SEQEND"); w.Tag(8, layer);
        }
        if (frame is not null)
        {
            // The sheet's edge on the notes layer (never cut), and each part's label.
            w.Tag(0, "POLYLINE"); w.Tag(8, DxfLayers.Notes); w.Int(66, 1); w.Point(10, new Vec2(0, 0)); w.Int(70, 1);
            foreach (var corner in new[] { new Vec2(0, 0), new Vec2(frame.WidthMm, 0), new Vec2(frame.WidthMm, frame.HeightMm), new Vec2(0, frame.HeightMm) })
            {
                w.Tag(0, "VERTEX"); w.Tag(8, DxfLayers.Notes); w.Point(10, corner); w.Int(70, 0);
            }
            w.Tag(0, "SEQEND"); w.Tag(8, DxfLayers.Notes);
            foreach (var (text, at) in frame.Labels)
            {
                w.Tag(0, "TEXT"); w.Tag(8, DxfLayers.Notes); w.Point(10, at); w.Real(40, NoteHeightMm); w.Tag(1, Ascii(text));
            }
        }
        w.Tag(0, "TEXT"); w.Tag(8, DxfLayers.Notes); w.Point(10, notePos); w.Real(40, NoteHeightMm); w.Tag(1, Ascii(note));
        w.Tag(0, "ENDSEC");
        w.Tag(0, "EOF");

        var bytes = Encoding.ASCII.GetBytes(w.Text.ToString());
        stream.Write(bytes, 0, bytes.Length);
    }

    /// <summary>The sentence stating the kerf, as written in the comment and the note.</summary>
    public static string KerfNote(CutPlan plan)
    {
        ArgumentNullException.ThrowIfNull(plan);
        string k = InvariantNumber.Format(plan.KerfMm), h = InvariantNumber.Format(plan.HalfKerfMm);
        return plan.KerfMm == 0
            ? "kerf 0 mm: paths are the design contours (no compensation)"
            : $"kerf {k} mm compensated: outlines +{h} mm, holes -{h} mm (cutter centre line)";
    }

    /// <summary>The kerf statement of the TEXT on the NOTES layer (short, so it stays near the part's width).</summary>
    public static string ShortKerfNote(CutPlan plan)
    {
        ArgumentNullException.ThrowIfNull(plan);
        string k = InvariantNumber.Format(plan.KerfMm), h = InvariantNumber.Format(plan.HalfKerfMm);
        return plan.KerfMm == 0 ? "kerf 0: not compensated" : $"kerf {k} mm compensated (outlines +{h}, holes -{h})";
    }

    /// <summary>The contour as LINE and ARC entities, one per segment, in order (see the remarks).</summary>
    private static void Chain(TagWriter w, string layer, Contour contour)
    {
        var segs = contour.Segments;
        for (int i = 0; i < segs.Count; i++)
        {
            switch (segs[i])
            {
                case LineSegment:
                    w.Tag(0, "LINE"); w.Tag(8, layer);
                    w.Point(10, segs[i].Start);
                    w.Point(11, segs[(i + 1) % segs.Count].Start);
                    break;
                case ArcSegment a when Math.Abs(a.SweepDeg) >= 360:
                    Arc(w, layer, a with { SweepDeg = a.SweepDeg / 2 });
                    Arc(w, layer, a with { StartDeg = a.StartDeg + a.SweepDeg / 2, SweepDeg = a.SweepDeg / 2 });
                    break;
                case ArcSegment a:
                    Arc(w, layer, a);
                    break;
                default:
                    throw new ArgumentException($"unknown segment type {segs[i].GetType().Name}", nameof(contour));
            }
        }
    }

    /// <summary>One ARC: counter-clockwise from group 50 to group 51; a clockwise segment with its ends swapped.</summary>
    private static void Arc(TagWriter w, string layer, ArcSegment a)
    {
        double from = a.SweepDeg >= 0 ? a.StartDeg : a.EndDeg;
        double to = a.SweepDeg >= 0 ? a.EndDeg : a.StartDeg;
        w.Tag(0, "ARC"); w.Tag(8, layer);
        w.Point(10, a.Center);
        w.Real(40, a.Radius);
        w.Real(50, Degrees(from));
        w.Real(51, Degrees(to));
    }

    /// <summary>An angle in [0, 360) (a tiny negative angle would otherwise round up to 360).</summary>
    private static double Degrees(double deg)
    {
        double r = Angle.Normalize360(deg);
        return r >= 360 ? 0 : r;
    }

    private static void Layer(TagWriter w, string name, int color)
    {
        w.Tag(0, "LAYER"); w.Tag(2, name); w.Int(70, 0); w.Int(62, color); w.Tag(6, "CONTINUOUS");
    }

    /// <summary>ASCII text for DXF values: printable ASCII kept, other characters as \U+XXXX, control characters as spaces.</summary>
    internal static string Ascii(string s)
    {
        var b = new StringBuilder(s.Length);
        foreach (var rune in s.EnumerateRunes())
        {
            if (rune.Value >= 0x20 && rune.Value < 0x7F) b.Append((char)rune.Value);
            else if (rune.Value < 0x20 || rune.Value == 0x7F) b.Append(' ');
            else b.Append("\\U+").Append(rune.Value.ToString("X4", CultureInfo.InvariantCulture));
        }
        return b.ToString();
    }

    private sealed class TagWriter(StringBuilder text)
    {
        public StringBuilder Text { get; } = text;

        public void Tag(int code, string value)
        {
            if (code < 10) Text.Append("  ");
            else if (code < 100) Text.Append(' ');
            Text.Append(code.ToString(CultureInfo.InvariantCulture)).Append("\r\n").Append(value).Append("\r\n");
        }

        public void Comment(string value) => Tag(999, value);

        public void Int(int code, int value) => Tag(code, value.ToString(CultureInfo.InvariantCulture));

        /// <summary>A real value, always with a decimal point so it reads as a real.</summary>
        public void Real(int code, double value)
        {
            string s = InvariantNumber.Format(value);
            Tag(code, s.Contains('.') ? s : s + ".0");
        }

        public void Point(int code, Vec2 p)
        {
            Real(code, p.X);
            Real(code + 10, p.Y);
            Real(code + 20, 0);
        }
    }
}
