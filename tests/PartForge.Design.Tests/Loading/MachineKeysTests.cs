using PartForge.Design.Loading;
using PartForge.Design.Machines;
using static PartForge.Design.Tests.TestSupport;

namespace PartForge.Design.Tests.Loading;

/// <summary>The printer and cutter sections: defaults, the sheet list, and the located errors of their cross-key rules.</summary>
public class MachineKeysTests
{
    private static MachineModel Load(string text)
    {
        var r = DesignLoader.LoadText(text, "t.yaml");
        Assert.True(r.Success, string.Join(" | ", r.Errors));
        return r.Machine!;
    }

    [Fact]
    public void Defaults_are_the_documented_machines_and_the_process_nozzle_and_kerf()
    {
        var m = Load(Crank);
        Assert.Equal(new PrinterSpec(220, 220, 250, m.Process.NozzleMm, 3), m.Printer);
        Assert.Equal(600, m.Cutter.BedXMm);
        Assert.Equal(400, m.Cutter.BedYMm);
        Assert.Equal(m.Process.KerfMm, m.Cutter.KerfMm);
        Assert.Equal(new[] { new SheetSize(600, 400, null) }, m.Cutter.Sheets);
    }

    [Fact]
    public void Sheets_are_read_in_order_with_counts_and_the_printer_nozzle_is_the_one_used()
    {
        string text = Crank + "\nprinter: { bed_x: 180, bed_y: 180, bed_z: 180, nozzle: 0.6 }\ncutter: { kerf: 0.2, sheets: \"300x200:2, 450.5x300\" }\n";
        text = text.Replace("  nozzle: 0.4\n", "").Replace("  kerf: 0.15\n", "");
        var m = Load(text);
        Assert.Equal(0.6, m.Process.NozzleMm);
        Assert.Equal(0.6, m.Printer.NozzleMm);
        Assert.Equal(0.2, m.Process.KerfMm);
        Assert.Equal(new[] { new SheetSize(300, 200, 2), new SheetSize(450.5, 300, null) }, m.Cutter.Sheets);
        Assert.Equal(180, m.Printer.BedZMm);
    }

    [Fact]
    public void A_sheet_larger_than_the_bed_a_zero_count_and_a_bad_list_are_refused_at_the_key()
    {
        var e = Single(Crank + "\ncutter: { bed_x: 400, bed_y: 300, sheets: \"500x300\" }\n", "cutter.sheets");
        Assert.Contains("larger than the cutter's bed", e.Message);
        Assert.Contains("count of 0", Single(Crank + "\ncutter: { sheets: \"300x200:0\" }\n", "cutter.sheets").Message);
        Single(Crank + "\ncutter: { sheets: \"300 by 200\" }\n", "cutter.sheets");
        // A sheet that fits the bed only turned a quarter is fine.
        Load(Crank + "\ncutter: { bed_x: 400, bed_y: 300, sheets: \"300x400\" }\n");
    }

    [Fact]
    public void Spacing_below_the_kerf_and_two_different_nozzles_are_refused()
    {
        Assert.Contains("less than the kerf", Single(Crank + "\ncutter: { spacing: 0.1, kerf: 0.15 }\n", "cutter.spacing").Message);
        Assert.Contains("differs from process.nozzle", Single(Crank + "\nprocess: { nozzle: 0.4 }\nprinter: { nozzle: 0.8 }\n", "printer.nozzle").Message);
    }
}
