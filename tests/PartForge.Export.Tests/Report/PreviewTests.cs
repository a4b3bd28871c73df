using PartForge.Design.Machines;
using PartForge.Export.Report;
using PartForge.Export.Tests.Report;
using PartForge.Parts;

namespace PartForge.Export.Tests.Report;

public class PreviewTests
{
    [Fact]
    public void Every_printed_part_has_a_preview_python_can_decode()
    {
        var ev = Pipeline.Evaluate("crank-bench");
        var pngs = ReportFiles.Pngs(ev);
        var printed = ev.Parts!.Parts.Where(p => p.Process == PartProcess.Print).Select(p => $"crank-bench-{p.Name}.png").ToList();
        Assert.Equal(printed.Append("crank-bench-assembly.png"), pngs.Select(x => x.FileName));
        string dir = Directory.CreateTempSubdirectory("pf-prev-").FullName;
        try
        {
            foreach (var (name, png) in pngs)
            {
                string f = Path.Combine(dir, name);
                File.WriteAllBytes(f, png);
                var (w, h, _, nonBg, _) = PngProbe.Probe(f);
                Assert.Equal(Previews.Width, w);
                Assert.Equal(Previews.Height, h);
                Assert.True(nonBg > w * h / 20, $"{name}: the part covers only {nonBg} pixels");
            }
        }
        finally { Directory.Delete(dir, true); }
    }
}
