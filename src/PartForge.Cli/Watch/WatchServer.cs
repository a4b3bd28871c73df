using System.Net;
using System.Net.Sockets;
using System.Text;

namespace PartForge.Cli.Watch;

/// <summary>
/// A small HTTP/1.1 server on 127.0.0.1 only (a raw socket listener: nothing beyond the base library, safe for
/// the native executable). It serves the output folder read-only (GET and HEAD, no listing, nothing outside the
/// folder), <c>/events</c> as server-sent events (one <c>build</c> event per save, the current state first), and
/// adds to the report page, as it is served, a script that reloads it after a good build (keeping the 3D view's
/// camera) and shows a broken save's errors over it. The files on disk stay exactly what <c>build</c> writes.
/// </summary>
public sealed class WatchServer : IDisposable
{
    private readonly TcpListener _listener;
    private readonly string _root;
    private readonly Func<WatchState> _state;
    private readonly List<StreamWriter> _clients = [];
    private readonly CancellationTokenSource _stop = new();

    public int Port { get; }

    private const string ReportSuffix = "-report.html";

    public WatchServer(string root, int port, Func<WatchState> state)
    {
        _root = Path.GetFullPath(root);
        _state = state;
        _listener = new TcpListener(IPAddress.Loopback, port);
        _listener.Start();
        Port = ((IPEndPoint)_listener.LocalEndpoint).Port;
        _ = Task.Run(AcceptLoop);
    }

    /// <summary>Tells every open page the new state.</summary>
    public void Publish(WatchState s) => Send("event: build\ndata: " + s.Json() + "\n\n");

    /// <summary>Tells every open page the new electrical figures (ahead of the build).</summary>
    public void PublishFigures(string json) => Send("event: figures\ndata: " + json + "\n\n");

    private void Send(string msg)
    {
        lock (_clients)
        {
            for (int i = _clients.Count - 1; i >= 0; i--)
            {
                try { _clients[i].Write(msg); _clients[i].Flush(); }
                catch (Exception ex) when (ex is IOException or ObjectDisposedException) { _clients.RemoveAt(i); }
            }
        }
    }

    private async Task AcceptLoop()
    {
        while (!_stop.IsCancellationRequested)
        {
            TcpClient c;
            try { c = await _listener.AcceptTcpClientAsync(_stop.Token); }
            catch (Exception ex) when (ex is OperationCanceledException or ObjectDisposedException or SocketException) { return; }
            _ = Task.Run(() => Serve(c));
        }
    }

    private async Task Serve(TcpClient client)
    {
        bool keep = false;
        try
        {
            client.NoDelay = true;
            var stream = client.GetStream();
            var head = await ReadHead(stream);
            if (head is null) return;
            var parts = head.Split(' ');
            if (parts.Length < 3) { await Respond(stream, 400, "text/plain", "bad request"u8.ToArray(), false); return; }
            string method = parts[0], target = parts[1];
            if (method != "GET" && method != "HEAD") { await Respond(stream, 405, "text/plain", "only GET and HEAD"u8.ToArray(), false); return; }
            string path = Uri.UnescapeDataString(target.Split('?')[0]);
            if (path == "/events")
            {
                var w = new StreamWriter(stream, new UTF8Encoding(false)) { NewLine = "\n" };
                await w.WriteAsync("HTTP/1.1 200 OK\r\nContent-Type: text/event-stream\r\nCache-Control: no-store\r\nConnection: keep-alive\r\n\r\nretry: 300\n\n");
                await w.WriteAsync("event: build\ndata: " + _state().Json() + "\n\n");
                await w.FlushAsync();
                lock (_clients) _clients.Add(w);
                keep = true;
                _ = Task.Run(async () => { await Drain(stream); lock (_clients) _clients.Remove(w); client.Dispose(); });
                return;
            }
            if (path == "/state") { await Respond(stream, 200, "application/json", Encoding.UTF8.GetBytes(_state().Json()), method == "HEAD"); return; }
            if (path == "/")
            {
                var report = Directory.Exists(_root) ? Directory.GetFiles(_root, "*" + ReportSuffix).Order(StringComparer.Ordinal).FirstOrDefault() : null;
                if (report is null) { await Respond(stream, 503, "text/plain", "no report yet: the design has not built"u8.ToArray(), method == "HEAD"); return; }
                await Redirect(stream, "/" + Uri.EscapeDataString(Path.GetFileName(report)));
                return;
            }
            string rel = path.TrimStart('/');
            string full = Path.GetFullPath(Path.Combine(_root, rel));
            if (rel.Length == 0 || rel.Contains('\\') || !full.StartsWith(_root + Path.DirectorySeparatorChar, StringComparison.Ordinal) || !File.Exists(full))
            {
                await Respond(stream, 404, "text/plain", "not found"u8.ToArray(), method == "HEAD");
                return;
            }
            byte[] body;
            try { body = await File.ReadAllBytesAsync(full); }
            catch (IOException) { await Respond(stream, 503, "text/plain", "being written, try again"u8.ToArray(), method == "HEAD"); return; }
            if (full.EndsWith(ReportSuffix, StringComparison.Ordinal)) body = WithLiveScript(body, _state().Build);
            await Respond(stream, 200, ContentType(full), body, method == "HEAD");
        }
        catch (Exception ex) when (ex is IOException or SocketException or ObjectDisposedException) { }
        finally { if (!keep) client.Dispose(); }
    }

    private static async Task Drain(NetworkStream s)
    {
        var buf = new byte[256];
        try { while (await s.ReadAsync(buf) > 0) { } } catch (Exception ex) when (ex is IOException or ObjectDisposedException or SocketException) { }
    }

    private static async Task<string?> ReadHead(NetworkStream s)
    {
        var buf = new byte[8192];
        int n = 0;
        while (n < buf.Length)
        {
            int k = await s.ReadAsync(buf.AsMemory(n));
            if (k == 0) return null;
            n += k;
            var text = Encoding.ASCII.GetString(buf, 0, n);
            int end = text.IndexOf("\r\n\r\n", StringComparison.Ordinal);
            if (end >= 0) return text[..text.IndexOf("\r\n", StringComparison.Ordinal)];
        }
        return null;
    }

    private static async Task Respond(NetworkStream s, int code, string type, byte[] body, bool headOnly)
    {
        string reason = code switch { 200 => "OK", 400 => "Bad Request", 404 => "Not Found", 405 => "Method Not Allowed", _ => "Service Unavailable" };
        var head = Encoding.ASCII.GetBytes($"HTTP/1.1 {code} {reason}\r\nContent-Type: {type}\r\nContent-Length: {body.Length}\r\nCache-Control: no-store\r\nConnection: close\r\n\r\n");
        await s.WriteAsync(head);
        if (!headOnly) await s.WriteAsync(body);
        await s.FlushAsync();
    }

    private static async Task Redirect(NetworkStream s, string to)
    {
        var head = Encoding.ASCII.GetBytes($"HTTP/1.1 302 Found\r\nLocation: {to}\r\nContent-Length: 0\r\nConnection: close\r\n\r\n");
        await s.WriteAsync(head);
    }

    private static string ContentType(string file) => Path.GetExtension(file).ToLowerInvariant() switch
    {
        ".html" => "text/html; charset=utf-8",
        ".json" => "application/json",
        ".csv" => "text/csv; charset=utf-8",
        ".svg" => "image/svg+xml",
        ".png" => "image/png",
        ".stl" => "model/stl",
        ".3mf" => "model/3mf",
        ".dxf" => "image/vnd.dxf",
        _ => "application/octet-stream",
    };

    /// <summary>The live script, placed before the report's closing body tag.</summary>
    public static byte[] WithLiveScript(byte[] html, int build)
    {
        string text = Encoding.UTF8.GetString(html);
        int at = text.LastIndexOf("</body>", StringComparison.Ordinal);
        if (at < 0) return html;
        string script = LiveScript.Replace("BUILD_NUMBER", build.ToString(System.Globalization.CultureInfo.InvariantCulture), StringComparison.Ordinal);
        return Encoding.UTF8.GetBytes(text[..at] + script + text[at..]);
    }

    private const string LiveScript = """
<div id="pf-live" style="position:fixed;top:0;left:0;right:0;z-index:10"></div>
<script>
(function () {
  var build = BUILD_NUMBER, box = document.getElementById('pf-live');
  try { var s = sessionStorage.getItem('pf-view'); if (s && window.pfView) window.pfView.restore(JSON.parse(s)); } catch (e) { }
  var es = new EventSource('/events');
  es.addEventListener('figures', function (ev) {
    var d = JSON.parse(ev.data);
    Object.keys(d.rows).forEach(function (k) {
      var td = document.querySelector('tr[data-key="' + k + '"] td.num');
      if (td) td.textContent = d.rows[k];
    });
    document.body.setAttribute('data-live', 'figures-' + d.build);
  });
  es.addEventListener('build', function (ev) {
    var d = JSON.parse(ev.data);
    if (d.ok) {
      document.body.setAttribute('data-live', 'build-' + d.build);
      if (d.build !== build) { try { if (window.pfView) sessionStorage.setItem('pf-view', JSON.stringify(window.pfView.state())); } catch (e) { } es.close(); location.reload(); }
      else box.textContent = '';
      return;
    }
    box.textContent = '';
    var p = document.createElement('div');
    p.id = 'pf-live-errors';
    p.style.cssText = 'background:#8c1d18;color:#fff;padding:8px 12px;font:14px/1.4 sans-serif;white-space:pre-wrap';
    p.textContent = 'The last save of the design file did not build; this page still shows the last good build.\n' + d.problems.join('\n');
    box.appendChild(p);
  });
})();
</script>

""";

    public void Dispose()
    {
        _stop.Cancel();
        _listener.Stop();
        lock (_clients) { foreach (var c in _clients) { try { c.Dispose(); } catch (IOException) { } } _clients.Clear(); }
        _stop.Dispose();
    }
}
