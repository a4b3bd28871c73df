using System.Globalization;
using System.IO.Compression;
using System.Text;
using PartForge.Formats.Cutting;
using PartForge.Formats.Io;
using PartForge.Geometry.Meshes;
using PartForge.Geometry.Primitives;

namespace PartForge.Formats.ThreeMf;

/// <summary>
/// Writes a 3MF package following the 3MF Core Specification: an OPC (Open Packaging Conventions) ZIP with
/// <c>[Content_Types].xml</c>, <c>_rels/.rels</c> (one relationship of the 3D model type to
/// <c>/3D/3dmodel.model</c>) and the model part: unit millimetre, a Title metadata, one
/// <c>&lt;object type="model"&gt;</c> per <see cref="ThreeMfObject"/> with its name and its mesh (shared
/// vertices, triangles as vertex indices), and one build item per placement.
/// </summary>
/// <remarks>
/// Deterministic: fixed entry order and ZIP timestamps (1980-01-01), one compression level, invariant
/// numbers in shortest round-trip form without exponents, LF line ends, UTF-8 without byte-order mark; the many vertex and triangle lines carry no indentation.
/// Each mesh is checked on the way (finite coordinates, no repeated vertex in a triangle, no zero-area
/// triangle, positive enclosed volume) and each placement must keep orientation (positive determinant);
/// a violation is an <see cref="ArgumentException"/> naming the object, and nothing is written.
/// </remarks>
public static class ThreeMfWriter
{
    public const string ModelNamespace = "http://schemas.microsoft.com/3dmanufacturing/core/2015/02";
    public const string ModelContentType = "application/vnd.ms-package.3dmanufacturing-3dmodel+xml";
    public const string RelationshipsContentType = "application/vnd.openxmlformats-package.relationships+xml";
    public const string ModelRelationshipType = "http://schemas.microsoft.com/3dmanufacturing/2013/01/3dmodel";
    public const string ContentTypesNamespace = "http://schemas.openxmlformats.org/package/2006/content-types";
    public const string RelationshipsNamespace = "http://schemas.openxmlformats.org/package/2006/relationships";

    /// <summary>ZIP entry names, in the order they are written.</summary>
    public const string ContentTypesEntry = "[Content_Types].xml", RelationshipsEntry = "_rels/.rels", ModelEntry = "3D/3dmodel.model";

    /// <summary>Deflate level of every entry (fixed, so the bytes are reproducible).</summary>
    public const CompressionLevel Compression = CompressionLevel.Fastest;

    /// <summary>Writes the package. <paramref name="title"/> becomes the Title metadata.</summary>
    public static void Write(Stream stream, string title, IReadOnlyList<ThreeMfObject> objects)
    {
        ArgumentNullException.ThrowIfNull(stream);
        Validate(title, objects);
        WritePackage(stream, title, objects);
    }

    /// <summary>The model is written straight into the compressor in small pieces (on a seekable stream, such
    /// as the atomic writer's temporary file, straight into the file), so a build never holds the model text
    /// whole; the bytes are the same as from <see cref="ModelXml"/>.</summary>
    private static void WritePackage(Stream stream, string title, IReadOnlyList<ThreeMfObject> objects)
    {
        byte[] types = ContentTypesXml(), rels = RelationshipsXml();
        DeterministicZip.Write(stream, new (string, Action<Stream>)[]
        {
            (ContentTypesEntry, s => s.Write(types)),
            (RelationshipsEntry, s => s.Write(rels)),
            (ModelEntry, s =>
            {
                var w = new AsciiBuffer(s);
                WriteModel(w, title, objects);
                w.Flush();
            }),
        }, Compression);
    }

    /// <summary>Writes the package to a file atomically (temporary file, then rename). The objects are checked
    /// before the file is touched; a mesh found bad while it is written (a zero-area triangle, say) leaves
    /// nothing under the final name.</summary>
    public static void WriteFile(string path, string title, IReadOnlyList<ThreeMfObject> objects)
    {
        Validate(title, objects);
        AtomicFile.Write(path, s => WritePackage(s, title, objects));
    }

    /// <summary>The <c>[Content_Types].xml</c> part.</summary>
    public static byte[] ContentTypesXml() => Utf8(
        "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n" +
        $"<Types xmlns=\"{ContentTypesNamespace}\">\n" +
        $"  <Default Extension=\"rels\" ContentType=\"{RelationshipsContentType}\"/>\n" +
        $"  <Default Extension=\"model\" ContentType=\"{ModelContentType}\"/>\n" +
        "</Types>\n");

    /// <summary>The <c>_rels/.rels</c> part: the package's start part is the 3D model.</summary>
    public static byte[] RelationshipsXml() => Utf8(
        "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n" +
        $"<Relationships xmlns=\"{RelationshipsNamespace}\">\n" +
        $"  <Relationship Target=\"/{ModelEntry}\" Id=\"rel0\" Type=\"{ModelRelationshipType}\"/>\n" +
        "</Relationships>\n");

    /// <summary>The model part <c>3D/3dmodel.model</c>.</summary>
    public static byte[] ModelXml(string title, IReadOnlyList<ThreeMfObject> objects)
    {
        Validate(title, objects);
        long estimate = objects.Sum(o => o.IsDeferred ? 0 : (long)o.Mesh.VertexCount * 48 + (long)o.Mesh.TriangleCount * 40) + 1024;
        var w = new AsciiBuffer((int)Math.Min(estimate, 1 << 30));
        WriteModel(w, title, objects);
        return w.ToArray();
    }

    private static void Validate(string title, IReadOnlyList<ThreeMfObject> objects)
    {
        ArgumentNullException.ThrowIfNull(title);
        ArgumentNullException.ThrowIfNull(objects);
        if (objects.Count == 0) throw new ArgumentException("a 3MF model needs at least one object", nameof(objects));
        for (int i = 0; i < objects.Count; i++)
        {
            var o = objects[i] ?? throw new ArgumentException($"object {i} is missing", nameof(objects));
            if (o.Name is null || !o.HasMesh || o.Placements is null) throw new ArgumentException($"object {i} has no name, mesh or placement list", nameof(objects));
            foreach (var t in o.Placements)
            {
                if (t.Values().Any(v => !double.IsFinite(v))) throw new ArgumentException($"object '{o.Name}': a placement has a value that is not finite", nameof(objects));
                if (!(t.Determinant > 1e-12)) throw new ArgumentException($"object '{o.Name}': a placement is singular or mirrors (determinant {t.Determinant.ToString("R", CultureInfo.InvariantCulture)}); mirror the mesh instead", nameof(objects));
            }
        }
    }

    private static void WriteModel(AsciiBuffer w, string title, IReadOnlyList<ThreeMfObject> objects)
    {
        w.Append("<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n"u8);
        w.Append("<model unit=\"millimeter\" xml:lang=\"en-US\" xmlns=\""u8);
        w.AppendText(ModelNamespace);
        w.Append("\">\n  <metadata name=\"Title\">"u8);
        w.AppendText(Escape(title));
        w.Append("</metadata>\n  <metadata name=\"Application\">PartForge</metadata>\n  <resources>\n"u8);
        for (int i = 0; i < objects.Count; i++) WriteObject(w, i + 1, objects[i]);
        w.Append("  </resources>\n  <build>\n"u8);
        for (int i = 0; i < objects.Count; i++)
        {
            var placements = objects[i].Placements;
            if (placements.Count == 0)
            {
                w.Append("    <item objectid=\""u8);
                w.Append(i + 1);
                w.Append("\"/>\n"u8);
                continue;
            }
            foreach (var t in placements)
            {
                w.Append("    <item objectid=\""u8);
                w.Append(i + 1);
                w.Append("\""u8);
                if (!t.IsIdentity)
                {
                    w.Append(" transform=\""u8);
                    bool first = true;
                    foreach (double v in t.Values())
                    {
                        if (!first) w.Append(" "u8);
                        first = false;
                        w.Append(v);
                    }
                    w.Append("\""u8);
                }
                w.Append("/>\n"u8);
            }
        }
        w.Append("  </build>\n</model>\n"u8);
    }

    private static void WriteObject(AsciiBuffer w, int id, ThreeMfObject o)
    {
        var mesh = o.Mesh; // a deferred object's mesh is made here and dropped when this returns
        var verts = mesh.Vertices;
        var idx = mesh.Indices;
        if (mesh.TriangleCount == 0) throw new ArgumentException($"object '{o.Name}': the mesh has no triangles");

        // Shared vertices: each distinct position once, numbered in order of first use by a triangle. An open
        // addressing table of vertex indices finds a position seen before (no per-entry objects: three
        // integer arrays of about the vertex count in all).
        var newId = new int[verts.Count];
        Array.Fill(newId, -1);
        int bits = 4;
        while ((1 << bits) < 2 * verts.Count) bits++;
        int cap = 1 << bits;
        var table = new int[cap];
        Array.Fill(table, -1);
        var byNew = new int[verts.Count];
        int count = 0;
        for (int k = 0; k < idx.Count; k++)
        {
            int old = idx[k];
            if (newId[old] >= 0) continue;
            var p = verts[old];
            if (!double.IsFinite(p.X) || !double.IsFinite(p.Y) || !double.IsFinite(p.Z))
                throw new ArgumentException($"object '{o.Name}': vertex {old} is not finite");
            int slot = (int)(((uint)p.GetHashCode() * 0x9E3779B1u) >> (32 - bits)); // Fibonacci hashing: the top bits
            int n = -1;
            while (table[slot] >= 0)
            {
                if (verts[table[slot]] == p) { n = newId[table[slot]]; break; }
                slot = (slot + 1) & (cap - 1);
            }
            if (n < 0)
            {
                table[slot] = old;
                n = count++;
                byNew[n] = old;
            }
            newId[old] = n;
        }
        table = null!; // not needed past here
        double volume6 = 0;
        Vec3 origin = verts[idx[0]];
        for (int t = 0; t < idx.Count; t += 3)
        {
            int a = newId[idx[t]], b = newId[idx[t + 1]], c = newId[idx[t + 2]];
            if (a == b || b == c || a == c)
                throw new ArgumentException($"object '{o.Name}': triangle {t / 3} uses one vertex twice");
            Vec3 va = verts[byNew[a]], vb = verts[byNew[b]], vc = verts[byNew[c]];
            Vec3 pa = va - origin, pb = vb - origin, pc = vc - origin;
            var cross = (vb - va).Cross(vc - va);
            if (cross.X == 0 && cross.Y == 0 && cross.Z == 0)
                throw new ArgumentException($"object '{o.Name}': triangle {t / 3} has zero area");
            volume6 += pa.Dot(pb.Cross(pc));
        }
        if (!(volume6 > 0))
            throw new ArgumentException($"object '{o.Name}': the mesh encloses no positive volume (open, or triangles facing inward)");

        w.Append("    <object id=\""u8);
        w.Append(id);
        w.Append("\" type=\"model\" name=\""u8);
        w.AppendText(Escape(o.Name));
        w.Append("\">\n      <mesh>\n        <vertices>\n"u8);
        for (int n = 0; n < count; n++)
        {
            var p = verts[byNew[n]];
            w.Append("<vertex x=\""u8);
            w.Append(p.X);
            w.Append("\" y=\""u8);
            w.Append(p.Y);
            w.Append("\" z=\""u8);
            w.Append(p.Z);
            w.Append("\"/>\n"u8);
        }
        w.Append("        </vertices>\n        <triangles>\n"u8);
        for (int t = 0; t < idx.Count; t += 3)
        {
            w.Append("<triangle v1=\""u8);
            w.Append(newId[idx[t]]);
            w.Append("\" v2=\""u8);
            w.Append(newId[idx[t + 1]]);
            w.Append("\" v3=\""u8);
            w.Append(newId[idx[t + 2]]);
            w.Append("\"/>\n"u8);
        }
        w.Append("        </triangles>\n      </mesh>\n    </object>\n"u8);
    }

    private static byte[] Utf8(string s) => new UTF8Encoding(false).GetBytes(s);

    private static string Escape(string s)
    {
        var b = new StringBuilder(s.Length + 8);
        foreach (char ch in s)
        {
            switch (ch)
            {
                case '<': b.Append("&lt;"); break;
                case '>': b.Append("&gt;"); break;
                case '&': b.Append("&amp;"); break;
                case '"': b.Append("&quot;"); break;
                default:
                    if ((ch < 0x20 && ch != '\t') || ch == '\uFFFE' || ch == '\uFFFF') b.Append(' ');
                    else b.Append(ch);
                    break;
            }
        }
        return b.ToString();
    }
}
