using System.Globalization;
using System.IO.Compression;
using System.Text.RegularExpressions;
using System.Xml;
using PartForge.Formats.ThreeMf;
using PartForge.Formats.Tests.Golden;
using PartForge.Geometry;
using PartForge.Geometry.Meshes;
using PartForge.Geometry.Regions;
using PartForge.Geometry.Solids;
using PartForge.Geometry.Primitives;

namespace PartForge.Formats.Tests.ThreeMf;

public class ThreeMfWriterTests
{
    private const string Core = "http://schemas.microsoft.com/3dmanufacturing/core/2015/02";

    /// <summary>A box built once at its own place and a tetrahedron placed twice (rotated and moved).</summary>
    private static IReadOnlyList<ThreeMfObject> Sample() => new[]
    {
        ThreeMfObject.At("plate & base", SampleMeshes.Box(20, 10, 2)),
        new ThreeMfObject("corner", SampleMeshes.Tetrahedron(5), new[]
        {
            ThreeMfTransform.Translation(new Vec3(30, 0, 0)),
            ThreeMfTransform.RotationZDeg(90, new Vec3(50, 5, 2.5)),
        }),
    };

    private static byte[] Package(IReadOnlyList<ThreeMfObject> objects, string title = "Sample <assembly>")
    {
        using var ms = new MemoryStream();
        ThreeMfWriter.Write(ms, title, objects);
        return ms.ToArray();
    }

    private static Dictionary<string, byte[]> Entries(byte[] package, out List<ZipArchiveEntry> entries)
    {
        // System.IO.Compression's reader, independent of the writer's own ZIP code.
        var zip = new ZipArchive(new MemoryStream(package), ZipArchiveMode.Read);
        entries = zip.Entries.ToList();
        var d = new Dictionary<string, byte[]>();
        foreach (var e in entries)
        {
            using var s = e.Open();
            using var ms = new MemoryStream();
            s.CopyTo(ms);
            d[e.FullName] = ms.ToArray();
        }
        return d;
    }

    private static XmlDocument Xml(byte[] bytes)
    {
        var doc = new XmlDocument();
        using var r = XmlReader.Create(new MemoryStream(bytes), new XmlReaderSettings { DtdProcessing = DtdProcessing.Prohibit });
        doc.Load(r);
        return doc;
    }

    [Fact]
    public void PartsMatchTheGoldenFiles()
    {
        var parts = Entries(Package(Sample()), out _);
        GoldenFile.AssertMatches("sample-3dmodel.model", parts["3D/3dmodel.model"]);
        GoldenFile.AssertMatches("sample-content-types.xml", parts["[Content_Types].xml"]);
        GoldenFile.AssertMatches("sample-rels.xml", parts["_rels/.rels"]);
    }

    [Fact]
    public void RewriteIsByteIdenticalInAnyCulture()
    {
        var first = Package(Sample());
        Assert.Equal(first, Package(Sample()));
        Assert.Equal(first, HostileCulture.Run(() => Package(Sample())));
    }

    /// <summary>The model is streamed into the compressor and the ZIP headers patched afterwards on a seekable
    /// output, or produced in memory first on one that cannot seek: both give the same bytes, also for a model of
    /// several megabytes (many buffer flushes), and the entry's CRC-32 and sizes are what an independent ZIP
    /// reader (the base library's ZipArchive, which checks the CRC as it reads) accepts.</summary>
    [Fact]
    public void StreamedAndBufferedPackagesAreIdentical()
    {
        var big = new[] { ThreeMfObject.At("cylinder", SampleMeshes.Cylinder(10, 5, 20000)), ThreeMfObject.At("box", SampleMeshes.Box(20, 10, 2)) };
        var seekable = new MemoryStream();
        ThreeMfWriter.Write(seekable, "big", big);
        var oneWay = new MemoryStream();
        ThreeMfWriter.Write(new ForwardOnly(oneWay), "big", big);
        using var zip = new ZipArchive(new MemoryStream(seekable.ToArray()), ZipArchiveMode.Read);
        var model = zip.GetEntry("3D/3dmodel.model")!;
        using var text = new MemoryStream();
        using (var z = model.Open()) z.CopyTo(text);
        Assert.Equal(model.Length, text.Length);
        Assert.True(text.Length > 2_000_000, $"model of {text.Length} bytes");
        Assert.True(text.ToArray().AsSpan().SequenceEqual(ThreeMfWriter.ModelXml("big", big)));
        Assert.Equal(seekable.Length, oneWay.Length);
        Assert.True(seekable.ToArray().AsSpan().SequenceEqual(oneWay.ToArray()));
    }

    private sealed class ForwardOnly(Stream inner) : Stream
    {
        public override bool CanRead => false;
        public override bool CanSeek => false;
        public override bool CanWrite => true;
        public override long Length => throw new NotSupportedException();
        public override long Position { get => throw new NotSupportedException(); set => throw new NotSupportedException(); }
        public override void Flush() => inner.Flush();
        public override int Read(byte[] buffer, int offset, int count) => throw new NotSupportedException();
        public override long Seek(long offset, SeekOrigin origin) => throw new NotSupportedException();
        public override void SetLength(long value) => throw new NotSupportedException();
        public override void Write(byte[] buffer, int offset, int count) => inner.Write(buffer, offset, count);
    }

    [Fact]
    public void PackageFollowsOpcAndTheCoreSpecification()
    {
        // 3MF Core Specification, chapter 2 (parts and relationships) and Open Packaging Conventions.
        var parts = Entries(Package(Sample()), out var entries);
        Assert.Equal(new[] { "[Content_Types].xml", "_rels/.rels", "3D/3dmodel.model" }, entries.Select(e => e.FullName));
        Assert.All(entries, e => Assert.Equal(new DateTime(1980, 1, 1, 0, 0, 0), e.LastWriteTime.DateTime));

        var types = Xml(parts["[Content_Types].xml"]).DocumentElement!;
        Assert.Equal("http://schemas.openxmlformats.org/package/2006/content-types", types.NamespaceURI);
        var defaults = types.ChildNodes.OfType<XmlElement>().ToDictionary(e => e.GetAttribute("Extension"), e => e.GetAttribute("ContentType"));
        Assert.Equal("application/vnd.ms-package.3dmanufacturing-3dmodel+xml", defaults["model"]);
        Assert.Equal("application/vnd.openxmlformats-package.relationships+xml", defaults["rels"]);

        var rels = Xml(parts["_rels/.rels"]).DocumentElement!;
        Assert.Equal("http://schemas.openxmlformats.org/package/2006/relationships", rels.NamespaceURI);
        var rel = Assert.Single(rels.ChildNodes.OfType<XmlElement>());
        Assert.Equal("/3D/3dmodel.model", rel.GetAttribute("Target"));
        Assert.Equal("http://schemas.microsoft.com/3dmanufacturing/2013/01/3dmodel", rel.GetAttribute("Type"));
        Assert.Matches("^[A-Za-z_][A-Za-z0-9_.-]*$", rel.GetAttribute("Id")); // an XML ID

        var model = Xml(parts["3D/3dmodel.model"]);
        var root = model.DocumentElement!;
        Assert.Equal("model", root.LocalName);
        Assert.Equal(Core, root.NamespaceURI);
        Assert.Equal("millimeter", root.GetAttribute("unit"));
        Assert.Equal("en-US", root.GetAttribute("xml:lang"));
        var ns = new XmlNamespaceManager(model.NameTable);
        ns.AddNamespace("m", Core);
        Assert.Equal("Sample <assembly>", root.SelectSingleNode("m:metadata[@name='Title']", ns)!.InnerText);

        var objects = root.SelectNodes("m:resources/m:object", ns)!.Cast<XmlElement>().ToList();
        Assert.Equal(2, objects.Count);
        Assert.Equal(new[] { "plate & base", "corner" }, objects.Select(o => o.GetAttribute("name")));
        Assert.All(objects, o => Assert.Equal("model", o.GetAttribute("type")));
        var ids = objects.Select(o => o.GetAttribute("id")).ToHashSet();
        var expectedVolume = new[] { 20.0 * 10 * 2, 125.0 / 6 };
        for (int k = 0; k < objects.Count; k++)
        {
            var vs = objects[k].SelectNodes("m:mesh/m:vertices/m:vertex", ns)!.Cast<XmlElement>()
                .Select(v => new Vec3(D(v.GetAttribute("x")), D(v.GetAttribute("y")), D(v.GetAttribute("z")))).ToList();
            Assert.Equal(vs.Count, vs.Distinct().Count()); // shared vertices: no position twice
            var ts = objects[k].SelectNodes("m:mesh/m:triangles/m:triangle", ns)!.Cast<XmlElement>()
                .Select(t => (int.Parse(t.GetAttribute("v1"), CultureInfo.InvariantCulture), int.Parse(t.GetAttribute("v2"), CultureInfo.InvariantCulture), int.Parse(t.GetAttribute("v3"), CultureInfo.InvariantCulture))).ToList();
            Assert.All(ts, t =>
            {
                Assert.InRange(t.Item1, 0, vs.Count - 1);
                Assert.InRange(t.Item2, 0, vs.Count - 1);
                Assert.InRange(t.Item3, 0, vs.Count - 1);
                Assert.True(t.Item1 != t.Item2 && t.Item2 != t.Item3 && t.Item1 != t.Item3);
            });
            // Every directed edge once and its reverse once: closed and consistently oriented.
            var edges = ts.SelectMany(t => new[] { (t.Item1, t.Item2), (t.Item2, t.Item3), (t.Item3, t.Item1) }).ToList();
            Assert.Equal(edges.Count, edges.Distinct().Count());
            Assert.All(edges, e => Assert.Contains((e.Item2, e.Item1), edges));
            // Divergence theorem on the numbers as read back: the enclosed volume is the solid's.
            double vol = ts.Sum(t => vs[t.Item1].Dot(vs[t.Item2].Cross(vs[t.Item3]))) / 6;
            Assert.Equal(expectedVolume[k], vol, 9);
        }

        var items = root.SelectNodes("m:build/m:item", ns)!.Cast<XmlElement>().ToList();
        Assert.Equal(3, items.Count);
        Assert.All(items, i => Assert.Contains(i.GetAttribute("objectid"), ids));
        Assert.False(items[0].HasAttribute("transform"));
        var m = items[2].GetAttribute("transform").Split(' ').Select(D).ToArray();
        Assert.Equal(12, m.Length);
        // Row vectors (3MF Core 3.3): the tetrahedron's x axis corner (5,0,0) turned 90 degrees lands on (50, 10, 2.5).
        var p = new Vec3(5, 0, 0);
        Assert.Equal(new Vec3(50, 10, 2.5), new Vec3(p.X * m[0] + p.Y * m[3] + p.Z * m[6] + m[9], p.X * m[1] + p.Y * m[4] + p.Z * m[7] + m[10], p.X * m[2] + p.Y * m[5] + p.Z * m[8] + m[11]));
    }

    private static double D(string s)
    {
        Assert.DoesNotContain('E', s.ToUpperInvariant());
        return double.Parse(s, NumberStyles.Float, CultureInfo.InvariantCulture);
    }

    [Fact]
    public void TriangleSoupIsWrittenWithSharedVertices()
    {
        var soup = SampleMeshes.Soup(SampleMeshes.Box(1, 2, 3));
        Assert.Equal(36, soup.VertexCount);
        var model = Xml(ThreeMfWriter.ModelXml("soup", new[] { ThreeMfObject.At("box", soup) }));
        Assert.Equal(8, model.GetElementsByTagName("vertex").Count);
        Assert.Equal(12, model.GetElementsByTagName("triangle").Count);
    }

    [Fact]
    public void InwardMeshIsRefused()
    {
        var box = SampleMeshes.Box(1, 1, 1);
        var inward = box.Transformed(p => p, reversesOrientation: true);
        var ex = Assert.Throws<ArgumentException>(() => Package(new[] { ThreeMfObject.At("inside-out", inward) }));
        Assert.Contains("inside-out", ex.Message);
    }

    [Fact]
    public void DegenerateTrianglesAndMirrorsAreRefused()
    {
        var v = new[] { new Vec3(0, 0, 0), new Vec3(1, 0, 0), new Vec3(1, 0, 0), new Vec3(0, 1, 0) };
        var twice = new Mesh(v, new[] { 0, 1, 2, 0, 1, 3 }); // vertices 1 and 2 share a position
        Assert.Throws<ArgumentException>(() => ThreeMfWriter.ModelXml("t", new[] { ThreeMfObject.At("dup", twice) }));
        var flat = new Mesh(new[] { new Vec3(0, 0, 0), new Vec3(1, 0, 0), new Vec3(2, 0, 0) }, new[] { 0, 1, 2 });
        Assert.Throws<ArgumentException>(() => ThreeMfWriter.ModelXml("t", new[] { ThreeMfObject.At("flat", flat) }));
        var mirror = new ThreeMfTransform(-1, 0, 0, 0, 1, 0, 0, 0, 1, 0, 0, 0);
        Assert.Throws<ArgumentException>(() => ThreeMfWriter.ModelXml("t", new[] { ThreeMfObject.At("m", SampleMeshes.Box(1, 1, 1), mirror) }));
        Assert.Throws<ArgumentException>(() => ThreeMfWriter.ModelXml("t", Array.Empty<ThreeMfObject>()));
    }

    [Fact]
    public void FileIsWrittenAtomically()
    {
        string path = ExternalReader.TempFile(".3mf");
        ThreeMfWriter.WriteFile(path, "Sample <assembly>", Sample());
        Assert.Equal(Package(Sample()), File.ReadAllBytes(path));
        var inward = SampleMeshes.Box(1, 1, 1).Transformed(p => p, reversesOrientation: true);
        Assert.Throws<ArgumentException>(() => ThreeMfWriter.WriteFile(path, "x", new[] { ThreeMfObject.At("bad", inward) }));
        Assert.Equal(Package(Sample()), File.ReadAllBytes(path));
        File.Delete(path);
    }

    [Fact]
    public void AssimpReadsOneMeshPerObject()
    {
        // Independent reader: assimp-utils (`assimp info`); lenient (it accepted malformed files when this check was written), hence the XML checks above.
        var objects = new[]
        {
            ThreeMfObject.At("cylinder", SampleMeshes.Cylinder(10, 5, 64)),
            ThreeMfObject.At("box", SampleMeshes.Box(20, 10, 2)),
            ThreeMfObject.At("corner", SampleMeshes.Tetrahedron(5), ThreeMfTransform.Translation(new Vec3(40, 0, 0))),
        };
        string path = ExternalReader.TempFile(".3mf");
        File.WriteAllBytes(path, Package(objects));
        var (code, stdout, stderr) = ExternalReader.Run("assimp", "info", path);
        var (zipCode, zipOut, _) = ExternalReader.Run("unzip", "-t", path);
        File.Delete(path);
        Assert.True(code == 0, $"assimp info failed ({code}): {stderr}\n{stdout}");
        Assert.Equal(3, Count(stdout, "Meshes"));
        int faces = 4 * 64 + 12 + 4;
        Assert.Equal(faces, Count(stdout, "Faces"));
        // Info-ZIP checks every entry's CRC.
        Assert.True(zipCode == 0, zipOut);
        Assert.Contains("No errors detected", zipOut);
    }

    [Fact]
    public void KernelPlateMeshReadsBackWithItsCountsAndVolume()
    {
        // The test plate (60 x 40, a hole and a slot) extruded 3 mm by the kernel, written as 3MF, read by assimp
        // and by System.Xml: one mesh, the kernel's vertex and triangle counts, and the volume of the solid.
        var prec = Precision.FromChordalTolerance(0.01);
        var solid = LayeredSolid.Extrude(Region.FromProfile(Tests.Cutting.SamplePlate.Profile(), prec), 0, 3);
        var mesh = Mesher.Build(solid, prec);
        byte[] package = Package(new[] { ThreeMfObject.At("plate", mesh) });
        var model = Xml(Entries(package, out _)["3D/3dmodel.model"]);
        Assert.Equal(mesh.VertexCount, model.GetElementsByTagName("vertex").Count);
        Assert.Equal(mesh.TriangleCount, model.GetElementsByTagName("triangle").Count);
        var vs = model.GetElementsByTagName("vertex").Cast<XmlElement>().Select(v => new Vec3(D(v.GetAttribute("x")), D(v.GetAttribute("y")), D(v.GetAttribute("z")))).ToList();
        double vol = model.GetElementsByTagName("triangle").Cast<XmlElement>().Sum(t =>
        {
            int a = int.Parse(t.GetAttribute("v1"), CultureInfo.InvariantCulture), b = int.Parse(t.GetAttribute("v2"), CultureInfo.InvariantCulture), c = int.Parse(t.GetAttribute("v3"), CultureInfo.InvariantCulture);
            return vs[a].Dot(vs[b].Cross(vs[c])) / 6;
        });
        Assert.Equal(solid.AnalyticVolume, vol, 6);

        string path = ExternalReader.TempFile(".3mf");
        File.WriteAllBytes(path, package);
        var (code, stdout, stderr) = ExternalReader.Run("assimp", "info", path);
        File.Delete(path);
        Assert.True(code == 0, $"assimp info failed ({code}): {stderr}\n{stdout}");
        Assert.Equal(1, Count(stdout, "Meshes"));
        Assert.Equal(mesh.TriangleCount, Count(stdout, "Faces"));
    }

    private static int Count(string assimpInfo, string label)
    {
        var m = Regex.Match(assimpInfo, @"^\s*" + label + @":\s+(\d+)", RegexOptions.Multiline);
        Assert.True(m.Success, $"no '{label}' in assimp output:\n{assimpInfo}");
        return int.Parse(m.Groups[1].Value, CultureInfo.InvariantCulture);
    }
}
