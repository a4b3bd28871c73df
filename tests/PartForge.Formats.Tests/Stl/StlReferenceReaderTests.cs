using System.Globalization;
using System.Text.RegularExpressions;
using PartForge.Formats.Stl;
using PartForge.Geometry;
using PartForge.Geometry.Meshes;
using PartForge.Geometry.Solids;

namespace PartForge.Formats.Tests.Stl;

/// <summary>
/// Our STL files read by independent readers: Debian's admesh (facet connectivity, "Original" column) and
/// numpy-stl under /usr/bin/python3 (volume by get_mass_properties). numpy-stl's is_closed() is not used: it
/// is unreliable on float32 (found when these checks were written); closedness is checked by exact edge pairing.
/// </summary>
public class StlReferenceReaderTests
{
    private static IEnumerable<(string Name, LayeredSolid Solid, Precision Prec)> Cases()
    {
        yield return ("r1", TestSolids.R1(), TestSolids.R1Precision);
        var p = Precision.FromChordalTolerance(0.01);
        for (int s = 0; s < 3; s++) yield return ($"plate{s}", TestSolids.RandomPlate(s, p), p);
    }

    private static string TempDir()
    {
        string d = Path.Combine(Path.GetTempPath(), "pf-readers-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(d);
        return d;
    }

    private static int Original(string admeshOut, string label)
    {
        var m = Regex.Match(admeshOut, Regex.Escape(label) + @"\s*:\s*(\d+)");
        Assert.True(m.Success, $"admesh output lacks '{label}':\n{admeshOut}");
        return int.Parse(m.Groups[1].Value, CultureInfo.InvariantCulture);
    }

    [ReaderFact(ExternalTool.Admesh)]
    public void AdmeshFindsNoDisconnectedDegenerateOrBackwardFacets()
    {
        string dir = TempDir();
        try
        {
            foreach (var (name, solid, prec) in Cases())
            {
                var mesh = Mesher.Build(solid, prec);
                foreach (bool ascii in new[] { false, true })
                {
                    string path = Path.Combine(dir, name + (ascii ? "-ascii" : "") + ".stl");
                    if (ascii) StlWriter.WriteAsciiFile(path, mesh, name); else StlWriter.WriteBinaryFile(path, mesh, name);
                    var (_, o, _) = ExternalTool.Run(ExternalTool.Admesh, "-e", path);
                    Assert.Equal(mesh.TriangleCount, Original(o, "Number of facets"));
                    Assert.Equal(0, Original(o, "Total disconnected facets"));
                    Assert.Equal(0, Original(o, "Degenerate facets"));
                    Assert.Equal(0, Original(o, "Backwards edges"));
                }
            }
        }
        finally { Directory.Delete(dir, true); }
    }

    [ReaderFact(ExternalTool.Python, "stl")]
    public void NumpyStlVolumeMatchesTheLayersAndTheTrueCircleVolume()
    {
        string dir = TempDir();
        try
        {
            string script = Path.Combine(dir, "vol.py");
            File.WriteAllText(script, "import sys\nfrom stl import mesh\nfor p in sys.argv[1:]:\n    v, cog, inertia = mesh.Mesh.from_file(p).get_mass_properties()\n    print(repr(float(v)))\n");
            var cases = Cases().ToList();
            var paths = new List<string>();
            var expected = new List<double>();
            foreach (var (name, solid, prec) in cases)
            {
                string path = Path.Combine(dir, name + ".stl");
                StlWriter.WriteBinaryFile(path, Mesher.Build(solid, prec), name);
                paths.Add(path);
                expected.Add(solid.AnalyticVolume);
            }
            var (exit, o, err) = ExternalTool.Run(ExternalTool.Python, new[] { script }.Concat(paths).ToArray());
            Assert.True(exit == 0, err);
            var vols = o.Split('\n', StringSplitOptions.RemoveEmptyEntries).Select(s => double.Parse(s, CultureInfo.InvariantCulture)).ToArray();
            Assert.Equal(paths.Count, vols.Length);
            for (int i = 0; i < vols.Length; i++)
                Assert.True(Math.Abs(vols[i] - expected[i]) <= 1e-5 * expected[i], $"{paths[i]}: reader {vols[i]} vs layers {expected[i]}");
            // R1 against the true circles (within the issue's 0.3%)
            Assert.InRange(vols[0], TestSolids.R1TrueVolume * 0.997, TestSolids.R1TrueVolume * 1.003);
        }
        finally { Directory.Delete(dir, true); }
    }
}
