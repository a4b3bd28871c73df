using System.Diagnostics;
using System.Net.WebSockets;
using System.Text;
using System.Text.Json;

namespace PartForge.Cli.Tests.Watch;

/// <summary>
/// Headless Chromium driven over its DevTools protocol (JSON messages on a WebSocket, System.Net.WebSockets):
/// start it on a page, evaluate script, take screenshots. WebGL runs on the software rasteriser
/// (<c>--use-angle=swiftshader --enable-unsafe-swiftshader</c>, since the GPU is disabled).
/// </summary>
public sealed class Cdp : IDisposable
{
    public const string Chromium = "/usr/bin/chromium";
    private readonly Process _browser;
    private readonly ClientWebSocket _ws = new();
    private readonly string _profile;
    private int _id;

    private Cdp(Process browser, string profile) { _browser = browser; _profile = profile; }

    public static Cdp Open(string url)
    {
        string profile = Directory.CreateTempSubdirectory("pf-chromium-").FullName;
        var psi = new ProcessStartInfo(Chromium)
        {
            RedirectStandardError = true, RedirectStandardOutput = true, UseShellExecute = false,
        };
        foreach (var a in new[]
        {
            "--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking",
            "--disable-component-update", "--disable-sync", "--user-data-dir=" + profile, "--use-angle=swiftshader", "--enable-unsafe-swiftshader",
            "--remote-debugging-port=0", "--window-size=1200,900", url,
        }) psi.ArgumentList.Add(a);
        var p = Process.Start(psi)!;
        var cdp = new Cdp(p, profile);
        // "DevTools listening on ws://127.0.0.1:PORT/devtools/browser/ID" on standard error.
        string? browserWs = null;
        var until = DateTime.UtcNow.AddSeconds(60);
        while (browserWs is null && DateTime.UtcNow < until)
        {
            var line = p.StandardError.ReadLine();
            if (line is null) break;
            int at = line.IndexOf("ws://", StringComparison.Ordinal);
            if (line.Contains("DevTools listening", StringComparison.Ordinal) && at >= 0) browserWs = line[at..].Trim();
        }
        _ = p.StandardError.ReadToEndAsync();
        _ = p.StandardOutput.ReadToEndAsync();
        Assert.True(browserWs is not null, "chromium did not report its DevTools address");
        var port = new Uri(browserWs!).Port;
        using var http = new HttpClient();
        string? pageWs = null;
        while (pageWs is null && DateTime.UtcNow < until)
        {
            var list = JsonDocument.Parse(http.GetStringAsync($"http://127.0.0.1:{port}/json/list").Result);
            pageWs = list.RootElement.EnumerateArray().Where(t => t.GetProperty("type").GetString() == "page")
                .Select(t => t.GetProperty("webSocketDebuggerUrl").GetString()).FirstOrDefault();
            if (pageWs is null) Thread.Sleep(100);
        }
        Assert.True(pageWs is not null, "chromium has no page target");
        cdp._ws.ConnectAsync(new Uri(pageWs!), CancellationToken.None).Wait(TimeSpan.FromSeconds(30));
        return cdp;
    }

    /// <summary>Sends one command and returns its result object.</summary>
    public JsonElement Send(string method, object? parameters = null) => Send(method, parameters, false)!.Value;

    /// <summary>Sends one command; with <paramref name="duringNavigation"/>, an answer that the page navigated away
    /// (the live page reloads itself after a good build) is null instead of a failure.</summary>
    private JsonElement? Send(string method, object? parameters, bool duringNavigation)
    {
        int id = ++_id;
        var msg = JsonSerializer.Serialize(new Dictionary<string, object?> { ["id"] = id, ["method"] = method, ["params"] = parameters ?? new Dictionary<string, object>() });
        _ws.SendAsync(Encoding.UTF8.GetBytes(msg), WebSocketMessageType.Text, true, CancellationToken.None).Wait();
        var buf = new byte[1 << 16];
        while (true)
        {
            using var ms = new MemoryStream();
            WebSocketReceiveResult r;
            do
            {
                var t = _ws.ReceiveAsync(buf, CancellationToken.None);
                Assert.True(t.Wait(TimeSpan.FromSeconds(60)), $"no DevTools answer to {method}");
                r = t.Result;
                ms.Write(buf, 0, r.Count);
            } while (!r.EndOfMessage);
            var doc = JsonDocument.Parse(ms.ToArray());
            if (!doc.RootElement.TryGetProperty("id", out var got) || got.GetInt32() != id) continue; // an event
            if (doc.RootElement.TryGetProperty("error", out var err))
            {
                string text = err.ToString();
                if (duringNavigation && (text.Contains("navigated or closed", StringComparison.Ordinal) || text.Contains("Cannot find context", StringComparison.Ordinal)))
                    return null;
                Assert.Fail($"{method}: {err}");
            }
            return doc.RootElement.GetProperty("result").Clone();
        }
    }

    /// <summary>The value of a script expression (returned by value; null when it throws or is undefined).</summary>
    public JsonElement? Eval(string expression)
    {
        // Null while the page reloads: callers poll.
        if (Send("Runtime.evaluate", new Dictionary<string, object> { ["expression"] = expression, ["returnByValue"] = true }, true) is not { } r) return null;
        if (r.TryGetProperty("exceptionDetails", out _)) return null;
        return r.GetProperty("result").TryGetProperty("value", out var v) ? v : null;
    }

    public string? EvalString(string expression) => Eval(expression) is { ValueKind: JsonValueKind.String } v ? v.GetString() : null;

    /// <summary>A PNG screenshot of a page rectangle (CSS pixels).</summary>
    public byte[] Screenshot(double x, double y, double w, double h)
    {
        var r = Send("Page.captureScreenshot", new Dictionary<string, object>
        {
            ["format"] = "png",
            ["clip"] = new Dictionary<string, object> { ["x"] = x, ["y"] = y, ["width"] = w, ["height"] = h, ["scale"] = 1 },
        });
        return Convert.FromBase64String(r.GetProperty("data").GetString()!);
    }

    public void Dispose()
    {
        try { _ws.Dispose(); } catch (WebSocketException) { }
        try { if (!_browser.HasExited) _browser.Kill(entireProcessTree: true); _browser.WaitForExit(10_000); } catch (InvalidOperationException) { }
        _browser.Dispose();
        try { Directory.Delete(_profile, true); } catch (IOException) { } catch (UnauthorizedAccessException) { }
    }
}
