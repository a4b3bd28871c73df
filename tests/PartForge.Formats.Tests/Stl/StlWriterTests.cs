using System.Buffers.Binary;
using System.Globalization;
using System.Text;
using PartForge.Formats.Stl;
using PartForge.Geometry.Meshes;

namespace PartForge.Formats.Tests.Stl;

public class StlWriterTests
{
    private static Mesh R1Mesh() => Mesher.Build(TestSolids.R1(), TestSolids.R1Precision);

    [Fact]
    public void BinaryLayoutFollowsTheFormat()
    {
        var m = R1Mesh();
        var bytes = StlWriter.ToBinaryBytes(m, "rotor R1");
        // Binary STL: 80-byte header, uint32 count, 50 bytes per facet.
        Assert.Equal(84 + 50 * m.TriangleCount, bytes.Length);
        Assert.False(Encoding.ASCII.GetString(bytes, 0, 5) == "solid");
        Assert.Equal((uint)m.TriangleCount, BinaryPrimitives.ReadUInt32LittleEndian(bytes.AsSpan(80)));
        Assert.Equal(bytes, StlWriter.ToBinaryBytes(R1Mesh(), "rotor R1"));
    }

    [Fact]
    public void AsciiIsDeterministicAndCarriesTheSameFloatBitsAsBinary()
    {
        var m = R1Mesh();
        byte[] Ascii() { var ms = new MemoryStream(); StlWriter.WriteAscii(ms, m, "rotor R1"); return ms.ToArray(); }
        var a = Ascii();
        Assert.Equal(a, Ascii());
        var text = Encoding.UTF8.GetString(a);
        Assert.StartsWith("solid rotor_R1\n", text);
        Assert.EndsWith("endsolid rotor_R1\n", text);
        var bin = ReadBinaryVertices(StlWriter.ToBinaryBytes(m, "x"));
        var asc = text.Split('\n').Where(l => l.TrimStart().StartsWith("vertex ")).Select(l =>
        {
            var p = l.Trim().Split(' ');
            return (float.Parse(p[1], CultureInfo.InvariantCulture), float.Parse(p[2], CultureInfo.InvariantCulture), float.Parse(p[3], CultureInfo.InvariantCulture));
        }).ToArray();
        Assert.Equal(bin, asc);
    }

    [Fact]
    public void ExactEdgePairingOnTheFloat32VertexBits()
    {
        foreach (var (solid, prec) in new[] { (TestSolids.R1(), TestSolids.R1Precision) }
                     .Concat(Enumerable.Range(0, 5).Select(s => (TestSolids.RandomPlate(s, PartForge.Geometry.Precision.FromChordalTolerance(0.01)), PartForge.Geometry.Precision.FromChordalTolerance(0.01)))))
        {
            var bytes = StlWriter.ToBinaryBytes(Mesher.Build(solid, prec), "p");
            var (unpaired, reused, degenerate) = PairEdges(ReadBinaryVertices(bytes));
            Assert.Equal(0, unpaired);
            Assert.Equal(0, reused);
            Assert.Equal(0, degenerate);
        }
    }

    [Fact]
    public void FileHelpersWriteAtomically()
    {
        string dir = Path.Combine(Path.GetTempPath(), "pf-stl-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(dir);
        try
        {
            var m = R1Mesh();
            string p = Path.Combine(dir, "rotor.stl");
            StlWriter.WriteBinaryFile(p, m, "rotor");
            Assert.Equal(StlWriter.ToBinaryBytes(m, "rotor"), File.ReadAllBytes(p));
            Assert.Single(Directory.GetFiles(dir));
        }
        finally { Directory.Delete(dir, true); }
    }

    /// <summary>Vertices of every facet, as float32 triples (the normal skipped).</summary>
    public static (float, float, float)[] ReadBinaryVertices(byte[] b)
    {
        uint n = BinaryPrimitives.ReadUInt32LittleEndian(b.AsSpan(80));
        var v = new (float, float, float)[n * 3];
        for (int t = 0; t < n; t++)
            for (int k = 0; k < 3; k++)
            {
                int o = 84 + 50 * t + 12 + 12 * k;
                v[3 * t + k] = (BinaryPrimitives.ReadSingleLittleEndian(b.AsSpan(o)), BinaryPrimitives.ReadSingleLittleEndian(b.AsSpan(o + 4)), BinaryPrimitives.ReadSingleLittleEndian(b.AsSpan(o + 8)));
            }
        return v;
    }

    /// <summary>
    /// Exact pairing on the vertex bits: every directed edge once and its reverse once (a closed, consistently
    /// oriented 2-manifold), and no facet with two equal corners.
    /// </summary>
    public static (int Unpaired, int Reused, int Degenerate) PairEdges((float, float, float)[] v)
    {
        var count = new Dictionary<((float, float, float), (float, float, float)), int>();
        int degenerate = 0;
        for (int t = 0; t < v.Length / 3; t++)
        {
            var a = v[3 * t]; var b = v[3 * t + 1]; var c = v[3 * t + 2];
            if (a == b || b == c || a == c) degenerate++;
            foreach (var e in new[] { (a, b), (b, c), (c, a) }) count[e] = count.GetValueOrDefault(e) + 1;
        }
        int unpaired = 0, reused = 0;
        foreach (var ((p, q), n) in count)
        {
            if (n > 1) reused++;
            if (!count.ContainsKey((q, p))) unpaired++;
        }
        return (unpaired, reused, degenerate);
    }
}
