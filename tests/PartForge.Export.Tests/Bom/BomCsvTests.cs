using PartForge.Export.Bom;

namespace PartForge.Export.Tests.Bom;

public class BomCsvTests
{
    [Fact]
    public void Quotes_fields_per_RFC_4180_and_ends_lines_with_CRLF()
    {
        // Source: RFC 4180 section 2: CRLF line breaks; fields with commas, quotes or line breaks in double
        // quotes; a quote inside a field doubled.
        var bom = new BillOfMaterials("x", [new BomLine("magnets", "disc, N42", "D12 \"x\" 4", 24, "pcs", "")]);
        string csv = BomCsv.Write(bom);
        Assert.Equal("category,item,specification,quantity,unit,notes\r\nmagnets,\"disc, N42\",\"D12 \"\"x\"\" 4\",24,pcs,\r\n", csv);
    }

    [Fact]
    public void Python_csv_reads_it_back()
    {
        // Reference reader: python3's csv module (RFC 4180 dialect 'excel').
        var bom = new BillOfMaterials("x",
        [
            new BomLine("wire", "AWG 28", "enamelled copper, grade-2", 61.234567, "m", "total 55.67 m + 10% + 1 m spare"),
            new BomLine("fasteners", "M3 x 12", "ISO 273 medium", 8, "pcs", "line\nbreak"),
        ]);
        string dir = Directory.CreateTempSubdirectory("pf-bom-").FullName;
        try
        {
            string f = Path.Combine(dir, "b.csv");
            File.WriteAllBytes(f, BomCsv.WriteUtf8(bom));
            var psi = new System.Diagnostics.ProcessStartInfo("/usr/bin/python3",
                ["-c", "import csv,sys,json; print(json.dumps(list(csv.reader(open(sys.argv[1], newline='', encoding='utf-8')))))", f])
            { RedirectStandardOutput = true };
            using var p = System.Diagnostics.Process.Start(psi)!;
            string o = p.StandardOutput.ReadToEnd();
            p.WaitForExit();
            var rows = System.Text.Json.JsonSerializer.Deserialize<string[][]>(o)!;
            Assert.Equal(3, rows.Length);
            Assert.Equal(["wire", "AWG 28", "enamelled copper, grade-2", "61.235", "m", "total 55.67 m + 10% + 1 m spare"], rows[1]);
            Assert.Equal("line\nbreak", rows[2][5]);
        }
        finally { Directory.Delete(dir, true); }
    }

    [Theory]
    // Source: ISO 273 clearance holes (medium series M3 3.4, M4 4.5, M6 6.6; fine M3 3.2, M5 5.3), from memory.
    [InlineData(3.4, "M3", "medium")]
    [InlineData(3.2, "M3", "fine")]
    [InlineData(4.5, "M4", "medium")]
    [InlineData(5.3, "M5", "fine")]
    [InlineData(6.6, "M6", "medium")]
    [InlineData(4.2, "M3", "coarse or looser")]
    public void Picks_the_largest_bolt_that_passes_the_hole(double hole, string size, string series)
    {
        var r = PartForge.Design.Hardware.MetricThreads.ForHole(hole);
        Assert.NotNull(r);
        Assert.Equal(size, r.Value.Thread.Size);
        Assert.Equal(series, r.Value.Series);
    }

    [Fact]
    public void A_hole_smaller_than_the_smallest_clearance_takes_no_bolt()
    {
        Assert.Null(PartForge.Design.Hardware.MetricThreads.ForHole(1.5));
    }
}
