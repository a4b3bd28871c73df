using System.Diagnostics;
using System.Net.Sockets;
using System.Text;
using PartForge.Cli.Watch;
using PartForge.Design.Presets;
using PartForge.Export.Pipeline;

namespace PartForge.Bench;

/// <summary>
/// Issue 16's watch figure: the largest bundled preset (by triangles) under <c>partforge watch</c> in-process
/// (session and 127.0.0.1 server), a page's event stream read over a real socket; each run saves a new
/// <c>coils.turns</c> (alternating two values) and times save -> the page's new figures (the <c>figures</c> event)
/// and save -> the new report served (the <c>build</c> event, then the report fetched as the reloading page does).
/// The timed figure is the second. Target: under 300 ms.
/// </summary>
public sealed class WatchSaveCase : IBenchCase
{
    private string _dir = "", _design = "", _text = "", _preset = "";
    private int _turns, _flip;
    private WatchSession? _session;
    private WatchServer? _server;
    private StreamReader? _events;
    private readonly CancellationTokenSource _stop = new();

    public string Name => "watch-save";

    public string Description => "watch, largest preset: save of coils.turns -> new figures event and new report served (target 300 ms)";

    public void Setup()
    {
        _dir = Path.Combine(Path.GetTempPath(), "partforge-bench-watch-" + Environment.ProcessId);
        Directory.CreateDirectory(_dir);
        long best = -1;
        foreach (var p in PresetLibrary.All)
        {
            string f = Path.Combine(_dir, p.Name + ".yaml");
            File.WriteAllText(f, p.Text);
            var r = BuildPipeline.Build(new BuildRequest { DesignPath = f, OutputDir = Path.Combine(_dir, "probe"), Formats = "json" });
            long tris = r.Results?.Parts.Sum(x => x.Triangles) ?? 0;
            if (tris > best) { best = tris; _design = f; _preset = p.Name; _text = p.Text; }
        }
        var m = System.Text.RegularExpressions.Regex.Match(_text, @"^  turns: *(\d+)", System.Text.RegularExpressions.RegexOptions.Multiline);
        if (!m.Success) throw new InvalidOperationException($"watch-save: {_preset} sets no coils.turns");
        _turns = int.Parse(m.Groups[1].Value, System.Globalization.CultureInfo.InvariantCulture);
        _session = new WatchSession(_design, Path.Combine(_dir, "out"));
        _server = new WatchServer(_session.OutputFolder, 0, () => _session.State);
        _session.Built += _server.Publish;
        _session.Figures += _server.PublishFigures;
        var session = _session;
        var ready = new ManualResetEventSlim();
        new Thread(() => { session.BuildNow(_ => { }); ready.Set(); session.Run(_stop.Token, _ => { }); }) { IsBackground = true }.Start();
        ready.Wait();
        var tcp = new TcpClient("127.0.0.1", _server.Port) { NoDelay = true };
        var s = tcp.GetStream();
        s.Write(Encoding.ASCII.GetBytes("GET /events HTTP/1.1\r\nHost: 127.0.0.1\r\n\r\n"));
        _events = new StreamReader(s, Encoding.UTF8);
        NextEvent("build"); // the current state
    }

    private string NextEvent(string name)
    {
        string? ev = null;
        while (true)
        {
            var line = _events!.ReadLine() ?? throw new InvalidOperationException("watch-save: the event stream closed");
            if (line.StartsWith("event: ", StringComparison.Ordinal)) ev = line[7..];
            else if (line.StartsWith("data: ", StringComparison.Ordinal) && ev == name) return line[6..];
        }
    }

    public IReadOnlyDictionary<string, double> Run()
    {
        int turns = _turns + (++_flip % 2 == 1 ? _turns / 5 : 0);
        string text = System.Text.RegularExpressions.Regex.Replace(_text, @"^  turns: *\d+", "  turns: " + turns, System.Text.RegularExpressions.RegexOptions.Multiline);
        var clock = Stopwatch.StartNew();
        File.WriteAllText(_design, text);
        NextEvent("figures");
        double figuresMs = clock.Elapsed.TotalMilliseconds;
        string state = NextEvent("build");
        if (!state.Contains("\"ok\":true", StringComparison.Ordinal)) throw new InvalidOperationException("watch-save: the save did not build: " + state);
        using var http = new HttpClient();
        var report = Directory.GetFiles(_session!.OutputFolder, "*-report.html").Single();
        var body = http.GetByteArrayAsync($"http://127.0.0.1:{_server!.Port}/{Path.GetFileName(report)}").Result;
        double pageMs = clock.Elapsed.TotalMilliseconds;
        return new Dictionary<string, double>
        {
            ["preset_" + _preset] = 1,
            ["turns"] = turns,
            ["figures_event_ms"] = figuresMs,
            ["report_served_ms"] = pageMs,
            ["report_bytes"] = body.Length,
        };
    }
}
