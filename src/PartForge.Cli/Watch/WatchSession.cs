using System.Diagnostics;
using System.Security.Cryptography;
using PartForge.Design.Loading;
using PartForge.Export.Pipeline;

namespace PartForge.Cli.Watch;

/// <summary>
/// <c>partforge watch</c>'s loop: waits for the design file to change (a file-system watcher, and a poll of its
/// size and time every 200 ms in case the watcher misses a save), lets a burst of writes settle (debounce), then
/// builds into the output folder with the previous build's meshes and previews (<see cref="BuildCache"/>). A save
/// that does not load keeps the last good build on disk and reports its errors with line and column. Every
/// build is forced past failing checks so the report can show them (it then carries its FAILED banner).
/// </summary>
public sealed class WatchSession : IDisposable
{
    private readonly string _design, _output;
    private readonly BuildCache _cache = new();
    private readonly SemaphoreSlim _changed = new(0);
    private readonly FileSystemWatcher? _watcher;
    private byte[]? _lastHash;
    private (long Length, DateTime Time) _lastSeen;
    private int _builds;

    /// <summary>Quiet time after the last change before building, ms.</summary>
    public const int DebounceMs = 25;

    /// <summary>Poll period of the fallback, ms.</summary>
    public const int PollMs = 200;

    public event Action<WatchState>? Built;

    /// <summary>Told the JSON of the new electrical figures (report row key and shown value) as soon as the
    /// electrical stage of a save is done, before the parts are meshed and written.</summary>
    public event Action<string>? Figures;

    public WatchState State { get; private set; } = new(0, false, ["not built yet"], 0);

    public string OutputFolder => _output;

    public WatchSession(string design, string output)
    {
        _design = Path.GetFullPath(design);
        _output = Path.GetFullPath(output);
        try
        {
            _watcher = new FileSystemWatcher(Path.GetDirectoryName(_design)!, Path.GetFileName(_design))
            {
                NotifyFilter = NotifyFilters.LastWrite | NotifyFilters.Size | NotifyFilters.FileName | NotifyFilters.CreationTime,
            };
            _watcher.Changed += (_, _) => Poke();
            _watcher.Created += (_, _) => Poke();
            _watcher.Renamed += (_, _) => Poke();
            _watcher.EnableRaisingEvents = true;
        }
        catch (Exception ex) when (ex is IOException or ArgumentException or PlatformNotSupportedException)
        {
            _watcher = null; // the poll still sees every save
        }
    }

    private void Poke() => _changed.Release();

    /// <summary>Builds once now, then on every change until cancelled.</summary>
    public void Run(CancellationToken stop, Action<string> log)
    {
        BuildNow(log);
        using var poll = new Timer(_ => { if (Seen() != _lastSeen) Poke(); }, null, PollMs, PollMs);
        while (!stop.IsCancellationRequested)
        {
            try { _changed.Wait(stop); } catch (OperationCanceledException) { break; }
            // Debounce: wait until no change has come for DebounceMs.
            while (_changed.Wait(DebounceMs)) { }
            BuildNow(log);
        }
    }

    private (long, DateTime) Seen()
    {
        try { var f = new FileInfo(_design); return f.Exists ? (f.Length, f.LastWriteTimeUtc) : (-1, default); }
        catch (IOException) { return (-1, default); }
    }

    /// <summary>One build of the file as it is now (skipped when its bytes equal the last build's).</summary>
    public void BuildNow(Action<string> log)
    {
        _lastSeen = Seen();
        byte[] bytes;
        try { bytes = File.ReadAllBytes(_design); }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException)
        {
            Publish(new WatchState(_builds, false, [$"{_design}: cannot be read ({ex.Message})"], 0), log);
            return;
        }
        var hash = SHA256.HashData(bytes);
        if (_lastHash is not null && hash.AsSpan().SequenceEqual(_lastHash)) return;
        _lastHash = hash;
        var clock = Stopwatch.StartNew();
        if (Figures is not null) EarlyFigures();
        var r = BuildPipeline.Build(new BuildRequest { DesignPath = _design, OutputDir = _output, Force = true, Cache = _cache });
        double ms = clock.Elapsed.TotalMilliseconds;
        if (r.Status == PipelineStatus.BadInput || r.Written.Count == 0)
        {
            Publish(new WatchState(_builds, false, Located(r.Problems), ms), log);
            return;
        }
        _builds++;
        log(FormattableString.Invariant($"build {_builds}: {r.Written.Count} files in {ms:0} ms ({(r.Status == PipelineStatus.ChecksFailed ? "checks failed, written marked failed" : "checks pass")}; meshes reused: {(_cache.LastReusedParts.Count == 0 ? "none" : string.Join(", ", _cache.LastReusedParts))}, previews reused {_cache.LastReusedPreviews}; {string.Join(", ", r.Timings.Select(t => FormattableString.Invariant($"{t.Stage} {t.Ms:0}")))} ms)"));
        Publish(new WatchState(_builds, true, [], ms), log);
    }

    /// <summary>
    /// The electrical figures of the save, sent ahead of the full build so the page's numbers change at once
    /// (the same rows, keys and formatting as the report's electrical table, from the same stage code). A save that
    /// does not load or resolve sends nothing here; the full build then reports it.
    /// </summary>
    private void EarlyFigures()
    {
        var loaded = DesignLoader.Load(_design);
        if (!loaded.Success) return;
        var e = PartForge.Electrical.ElectricalEngine.Evaluate(loaded.Machine!);
        if (e.Coil?.Outline is null) return;
        var rows = PartForge.Export.Report.ElectricalView.From(loaded.Machine!, e).Rows.Where(r => r.Key.Length > 0);
        var sb = new System.Text.StringBuilder("{\"build\":").Append(_builds + 1).Append(",\"rows\":{");
        bool first = true;
        foreach (var r in rows)
        {
            if (!first) sb.Append(',');
            first = false;
            sb.Append('"').Append(r.Key).Append("\":\"").Append(r.Value.Replace("\\", "\\\\", StringComparison.Ordinal).Replace("\"", "\\\"", StringComparison.Ordinal)).Append('"');
        }
        Figures?.Invoke(sb.Append("}}").ToString());
    }

    /// <summary>The problems of a save that did not build, design errors as "line L, column C: ...".</summary>
    private IReadOnlyList<string> Located(IReadOnlyList<string> problems)
    {
        var loaded = DesignLoader.Load(_design);
        if (loaded.Success) return problems;
        return loaded.Errors.Select(e => (e.Line > 0 ? $"line {e.Line}, column {e.Column}: " : "") + e).ToArray();
    }

    private void Publish(WatchState s, Action<string> log)
    {
        State = s;
        if (!s.Ok) foreach (var p in s.Problems) log("error: " + p);
        Built?.Invoke(s);
    }

    public void Dispose()
    {
        _watcher?.Dispose();
        _changed.Dispose();
    }
}
