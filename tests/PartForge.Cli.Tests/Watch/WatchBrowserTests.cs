using System.Diagnostics;
using System.Globalization;
using System.Text.RegularExpressions;
using PartForge.Cli.Tests.EndToEnd;

namespace PartForge.Cli.Tests.Watch;

/// <summary>
/// The live design loop in a real browser: <c>partforge watch</c> serving a preset, headless Chromium on its page
/// (DevTools protocol, <see cref="Cdp"/>). The page shows the new phase EMF within 1 s of saving a new
/// <c>coils.turns</c>: the value a separate <c>partforge check --json</c> of the new file gives (the EMF itself is
/// tested against its sources in the Electrical tests; more turns also make the winding larger, so it is not
/// simply scaled by the turns ratio); a broken
/// save shows its line and column on the page; the 3D canvas is not blank and changes when the explode slider moves.
/// </summary>
[Collection("watch")]
public class WatchBrowserTests
{
    private const string EmfCell = "(function(){var t=document.querySelector('tr[data-key=\"electrical.phase.emf_rms_v\"] td.num');return t?t.textContent:null;})()";

    [Fact]
    public void The_page_follows_the_design_file_and_shows_a_3d_view()
    {
        Assert.True(File.Exists(Cdp.Chromium), "Debian's chromium package is needed for this test (scripts/test.sh installs it)");
        using var dir = new WorkDir();
        string yaml = File.ReadAllText(Path.Combine(Repo.Root, "presets", "creek-sector.yaml"));
        var turnsLine = Regex.Match(yaml, @"^  turns: *(\d+)", RegexOptions.Multiline);
        Assert.True(turnsLine.Success, "the preset sets coils.turns");
        int turns = int.Parse(turnsLine.Groups[1].Value, CultureInfo.InvariantCulture);
        dir.Write("d.yaml", yaml);
        using var watch = new WatchProcess(dir.Path, "d.yaml", "-o", "out", "--port", "0");
        watch.Next(TimeSpan.FromSeconds(120), "build 1:");
        using var page = Cdp.Open(watch.Url + "/");

        // The first build's page, connected to the server.
        Wait(page, "document.body.getAttribute('data-live')", v => v == "build-1", TimeSpan.FromSeconds(60));
        double emf0 = double.Parse(page.EvalString(EmfCell)!, CultureInfo.InvariantCulture);

        // The 3D view: not blank, and the explode slider moves the parts.
        Assert.Equal("object", page.EvalString("typeof window.pfView"));
        page.Eval("document.getElementById('pf-view').scrollIntoView({block:'start'}); window.scrollBy(0, -10); 0");
        var rect = page.Eval("(function(){var r=document.getElementById('pf-view').getBoundingClientRect();return [r.x+window.scrollX,r.y+window.scrollY,r.width,r.height];})()")!.Value
            .EnumerateArray().Select(e => e.GetDouble()).ToArray();
        Assert.True(rect[2] > 300 && rect[3] > 200, $"canvas is {rect[2]} x {rect[3]}");
        var before = PngPixels.Decode(page.Screenshot(rect[0], rect[1], rect[2], rect[3]));
        double variance = PngPixels.GreyVariance(before.Rgb);
        Assert.True(variance > 50, $"the 3D canvas is blank (grey variance {variance:0.0}; the view says: {page.EvalString("document.getElementById('pf-view-msg').textContent")})");
        page.Eval("window.pfView.setExplode(1.5); 0");
        var after = PngPixels.Decode(page.Screenshot(rect[0], rect[1], rect[2], rect[3]));
        int changed = PngPixels.Differing(before.Rgb, after.Rgb);
        Assert.True(changed > before.W * before.H / 50, $"the explode slider changed only {changed} of {before.W * before.H} pixels");

        // A new coils.turns: the page shows the new phase EMF within 1 s of the save.
        int newTurns = turns + turns / 4;
        string edited = yaml[..turnsLine.Index] + "  turns: " + newTurns + yaml[(turnsLine.Index + turnsLine.Length)..];
        dir.Write("expected.yaml", edited);
        var check = PartforgeProcess.Run(dir.Path, "check", "expected.yaml", "--json");
        using var results = System.Text.Json.JsonDocument.Parse(check.Stdout);
        double expected = Math.Round(results.RootElement.GetProperty("electrical").GetProperty("phase").GetProperty("emf_rms_v").GetDouble(), 3);
        Assert.NotEqual(emf0, expected);
        var saved = Stopwatch.StartNew();
        File.WriteAllText(dir.File("d.yaml"), edited);
        string? shown = null;
        while (saved.ElapsedMilliseconds < 1000)
        {
            shown = page.EvalString(EmfCell);
            if (shown is not null && double.Parse(shown, CultureInfo.InvariantCulture) == expected) break;
            Thread.Sleep(10);
        }
        long ms = saved.ElapsedMilliseconds;
        Assert.True(ms < 1000, $"the page showed {shown} V, not {expected:0.###} V, 1 s after the save");
        // And the reloaded page (the whole new report) follows.
        Wait(page, "document.body.getAttribute('data-live')", v => v == "build-2", TimeSpan.FromSeconds(30));
        Assert.Equal(shown, page.EvalString(EmfCell));

        // A broken save: the page names its line and column and keeps the last good build.
        string broken = yaml[..turnsLine.Index] + "  turns: 9x0" + yaml[(turnsLine.Index + turnsLine.Length)..];
        int line = yaml[..turnsLine.Index].Count(c => c == '\n') + 1, column = "  turns: ".Length + 1;
        File.WriteAllText(dir.File("d.yaml"), broken);
        string errors = Wait(page, "(function(){var e=document.getElementById('pf-live-errors');return e?e.textContent:null;})()", v => v is not null, TimeSpan.FromSeconds(10))!;
        Assert.Contains($"line {line}, column {column}", errors);
        Assert.Contains("coils.turns", errors);
        Assert.Equal(shown, page.EvalString(EmfCell));
        Assert.True(File.Exists(dir.File(Path.Combine("out", "creek-sector-report.html"))), "the last good build stays on disk");
    }

    private static string? Wait(Cdp page, string expression, Func<string?, bool> ok, TimeSpan timeout)
    {
        var until = DateTime.UtcNow + timeout;
        string? v = null;
        while (DateTime.UtcNow < until)
        {
            v = page.EvalString(expression);
            if (ok(v)) return v;
            Thread.Sleep(20);
        }
        Assert.Fail($"{expression} stayed {v ?? "null"} for {timeout.TotalSeconds} s");
        return null;
    }
}
