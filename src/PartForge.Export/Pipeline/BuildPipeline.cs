using PartForge.Checks;
using PartForge.Design.Loading;
using PartForge.Design.Machines;
using PartForge.Design.Parts;
using PartForge.Export.Exporters;
using PartForge.Export.Report;
using PartForge.Export.Results;
using PartForge.Formats.Io;
using PartForge.Geometry;
using PartForge.Parts;

namespace PartForge.Export.Pipeline;

/// <summary>
/// The whole job: load -> stages (electrical, parts, checks; <see cref="Stages"/>) -> gate -> export. The gate:
/// if any check fails, nothing is written (unless forced, and then the results and report say so). Outputs go
/// only into the output folder, as one transaction (all staged, then all renamed, the manifest last), in a fixed
/// order, so two builds give identical files and a folder holds either the previous set or the new one.
/// </summary>
public static class BuildPipeline
{
    /// <summary>Electrical results, parts and checks of a loaded machine (no files). Thread-safe; used by sweeps.</summary>
    public static Evaluation Evaluate(MachineModel machine, CheckOptions? options = null) => Stages.Evaluate(machine, options);

    /// <summary><c>partforge check</c>: load, evaluate, results document; writes nothing.</summary>
    /// <param name="meshes">Mesh the parts for the triangle counts of the results document (check --json); the
    /// human summary does not show them and skips the meshing.</param>
    public static PipelineResult Check(string designPath, bool meshes = true)
    {
        var loaded = DesignLoader.Load(designPath);
        if (!loaded.Success) return Bad(loaded.Errors.Select(e => e.ToString()));
        var (ev, problem) = TryEvaluate(loaded.Machine!, designPath);
        if (ev == null) return Bad([problem!]);
        bool countTriangles = meshes;
        if (meshes && ev.Parts != null && MeshProblem(ev, ev.Parts.Parts, designPath) is { } meshProblem)
        {
            // Failing checks already explain an absurd part (e.g. a winding that overlaps its neighbours): report them
            // without triangle counts; otherwise the part itself is the problem.
            if (!ev.Checks.HasFailures) return Bad([meshProblem]);
            countTriangles = false;
        }
        var doc = ResultsBuilder.Build(ev, countTriangles: countTriangles);
        return new PipelineResult
        {
            Status = ev.Checks.HasFailures ? PipelineStatus.ChecksFailed : PipelineStatus.Ok,
            Problems = FailLines(ev.Checks),
            Evaluation = ev,
            Results = doc,
        };
    }

    /// <summary>
    /// <c>partforge build</c>. The output folder is checked before anything is computed and its transaction begun
    /// (lock taken, leftover temporaries of earlier runs removed) right after the design loads; every planned
    /// file is then staged under a temporary name and the set committed with its manifest last
    /// (<see cref="OutputTransaction"/>). Any failure rolls the set back: the folder keeps its previous set whole.
    /// </summary>
    public static PipelineResult Build(BuildRequest request)
    {
        var clock = new StageClock();
        var problems = new List<string>();
        var formats = ExportFormats.ParseFormats(request.Formats, problems) ?? ExportRegistry.All;
        var partWords = ExportFormats.ParseList(request.Parts, ExportFormats.PartNames, "--parts", problems);
        var folder = OutputFolder.Prepare(request.OutputDir, out var folderProblem);
        if (folderProblem != null) problems.Add(folderProblem);
        var loaded = DesignLoader.Load(request.DesignPath);
        if (!loaded.Success) problems.InsertRange(0, loaded.Errors.Select(e => e.ToString()));
        if (problems.Count > 0) return Bad(problems);
        clock.Lap("load");

        OutputTransaction tx;
        try
        {
            tx = request.Guard?.Begin(folder!.FullPath, folder.Shown) ?? OutputTransaction.Begin(folder!.FullPath, folder.Shown);
        }
        catch (OutputWriteException ex)
        {
            return Bad([ex.Message]);
        }
        using (tx)
        {
            return BuildInto(request, tx, folder, loaded.Machine!, formats, partWords, clock);
        }
    }

    private static PipelineResult BuildInto(BuildRequest request, OutputTransaction tx, OutputFolder folder, MachineModel machine,
        IReadOnlyCollection<ExportFormat> formats, IReadOnlySet<string>? partWords, StageClock clock)
    {
        var problems = new List<string>();
        var (ev, problem) = TryEvaluate(machine, request.DesignPath, clock);
        if (ev == null) return Bad([problem!]);
        HashSet<PartId>? partFilter = null;
        if (partWords != null && ev.Parts != null)
        {
            var ids = ev.Parts.Parts.Select(p => p.Id).ToArray();
            partFilter = new HashSet<PartId>();
            foreach (var w in partWords)
            {
                var chosen = PartNames.Select(w).Where(ids.Contains).ToArray();
                if (chosen.Length == 0) problems.Add($"--parts: this design has no part '{w}'; its parts: {string.Join(", ", ids.Select(i => i.Name))}");
                partFilter.UnionWith(chosen);
            }
            if (problems.Count > 0) return Bad(problems);
        }
        bool failed = ev.Checks.HasFailures;
        if ((failed && !request.Force) || ev.Parts == null)
        {
            return new PipelineResult
            {
                Status = failed ? PipelineStatus.ChecksFailed : PipelineStatus.BadInput,
                Problems = failed ? FailLines(ev.Checks) : ["no parts could be made from this design"],
                Evaluation = ev,
                Results = ResultsBuilder.Build(ev, countTriangles: false),
            };
        }

        var plan = ExportPlan.For(ev, formats, partFilter);
        if (plan.Files.Count == 0) return Bad([NothingToWrite(ev, formats, partFilter)]);
        string manifestName = OutputNames.Manifest(ev.Machine.Name);
        try
        {
            // Refuse links or folders at any output name (and the manifest's) before anything is computed or staged.
            foreach (var name in plan.Files.Select(f => f.Name).Append(manifestName)) folder.PathOf(name);
        }
        catch (OutputRefusedException ex)
        {
            return Bad([ex.Message]);
        }
        if (MeshProblem(ev, plan.MeshedParts(ev.Parts), request.DesignPath) is { } meshProblem) return Bad([meshProblem]);
        clock.Lap("mesh");
        var doc = ResultsBuilder.Build(ev, plan.FilesByPart, forced: failed, countTriangles: plan.WritesResults);
        var context = new ExportContext(ev, doc, failed, RenderPreviews(plan.Previews(), ev.Parts));
        clock.Lap("previews");
        ManifestInfo info;
        try
        {
            info = ManifestInfo.For(OutputNames.Sanitize(ev.Machine.Name), ToolInfo.Version, File.ReadAllBytes(request.DesignPath));
        }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException)
        {
            // The design file is read again for its hash (it was read a moment ago): a user-level problem.
            return new PipelineResult { Status = PipelineStatus.BadInput, Problems = [$"{request.DesignPath}: cannot be read again for the manifest ({ex.Message.ReplaceLineEndings(" ")}); nothing in {folder.Shown} was changed"], Evaluation = ev, Results = doc, OutputFolder = folder.FullPath };
        }
        try
        {
            foreach (var f in plan.Files)
            {
                request.BeforeStage?.Invoke(f.Name);
                tx.Stage(f.Name, s => f.Format.Write(s, f, context));
            }
            tx.Commit(info);
        }
        catch (OutputWriteException ex)
        {
            return new PipelineResult { Status = PipelineStatus.BadInput, Problems = [ex.Message], Evaluation = ev, Results = doc, OutputFolder = folder.FullPath };
        }
        clock.Lap("write");
        return new PipelineResult
        {
            Status = failed ? PipelineStatus.ChecksFailed : PipelineStatus.Ok,
            Problems = failed ? FailLines(ev.Checks) : [],
            Evaluation = ev,
            Results = doc,
            Written = [.. plan.Files.Select(f => f.Name), manifestName],
            RemovedTemporaries = tx.RemovedTemporaries,
            OutputFolder = folder.FullPath,
            Timings = clock.Laps,
        };
    }

    /// <summary>
    /// Why the chosen formats write nothing for the chosen parts: each part's process (printed or cut) and the
    /// formats that would write it, so the message names what to change.
    /// </summary>
    private static string NothingToWrite(Evaluation ev, IReadOnlyCollection<ExportFormat> formats, IReadOnlySet<PartId>? partFilter)
    {
        var parts = ev.Parts!.Parts.Where(p => partFilter == null || partFilter.Contains(p.Id)).ToArray();
        string chosen = string.Join(",", ExportRegistry.All.Where(formats.Contains).Select(f => f.Name));
        var lines = new List<string>();
        foreach (var p in parts)
        {
            var wouldWrite = ExportRegistry.All.Where(f => f.Plan(new ExportScope(ev.Machine, [p], ev.Parts)).Any(x => x.Parts.Contains(p))).Select(f => f.Name);
            string process = p.Process == PartProcess.Print ? "printed, not cut" : "cut, not printed";
            lines.Add($"{p.Name} is {process} (formats that write it: {string.Join(", ", wouldWrite)})");
        }
        return $"--formats {chosen}: nothing to write for --parts {string.Join(",", parts.Select(p => p.Name))}: {string.Join("; ", lines)}; change --formats or --parts";
    }

    /// <summary>
    /// Every preview the planned files show, each rendered once and all of them side by side on the machine's
    /// cores. Each picture is a pure function of its meshes, so the bytes do not depend on the order or the thread.
    /// </summary>
    private static IReadOnlyDictionary<PreviewKey, byte[]> RenderPreviews(IReadOnlyList<PreviewKey> keys, PartSet parts)
    {
        var result = new System.Collections.Concurrent.ConcurrentDictionary<PreviewKey, byte[]>();
        // Longest first (the assembly draws every part; then parts by their triangles), handed out one at a
        // time: a list is otherwise split into fixed ranges, and the assembly left to the end of one range
        // keeps a core busy alone while the other idles.
        var longestFirst = keys.OrderBy(k => k.Part is null ? 0 : 1).ThenByDescending(k => k.Part is { } id ? parts.Get(id).Mesh.TriangleCount : 0)
            .ThenBy(k => k.SortKey, StringComparer.Ordinal).ToArray();
        var queue = System.Collections.Concurrent.Partitioner.Create(longestFirst, loadBalance: true);
        Parallel.ForEach(queue, new ParallelOptions { MaxDegreeOfParallelism = Environment.ProcessorCount }, k =>
            result[k] = k.Part is { } id ? Previews.Part(parts.Get(id)) : Previews.Assembly(parts));
        return result;
    }

    private static (Evaluation? Ev, string? Problem) TryEvaluate(MachineModel d, string file, StageClock? clock = null)
    {
        if (MeshBudget.Check(d, file) is { } tooFine) return (null, tooFine);
        clock?.Lap("budget");
        try
        {
            var ev = Stages.Evaluate(d, null, clock is null ? null : clock.Lap);
            if (ev.Parts is { HasErrors: true } ps)
                return (null, string.Join("; ", ps.Diagnostics.Where(x => x.Severity == Parts.DiagnosticSeverity.Error).Select(x => $"{file}: {x.Part.Name}: {x.Message}")));
            return (ev, null);
        }
        catch (PartsException ex)
        {
            return (null, $"{file}: {ex.Message}");
        }
    }

    /// <summary>
    /// Meshes the parts that will be written or counted (the meshes are made on first use) before anything is
    /// reported or written, so that a part the mesher refuses for its size (beyond the float32-safe coordinate
    /// range) is a design problem (exit 2, nothing written), not a failure halfway through the export. Parts
    /// that no planned file needs are not meshed at all.
    /// </summary>
    private static string? MeshProblem(Evaluation ev, IEnumerable<PartModel> parts, string file)
    {
        if (ev.Parts == null) return null;
        var list = parts.ToArray();
        // Mesh the parts side by side on the machine's cores, heaviest first and never more than half of the
        // estimated work at once (MeshSchedule; each mesh is made once, thread-safe, and is a pure function of
        // its part); then report in part order, so the first problem named is always the same one.
        MeshSchedule.MeshAll(list, ev.Machine.ChordalToleranceMm);
        foreach (var p in list)
        {
            try
            {
                if (p.Mesh.TriangleCount == 0)
                    return $"{file}: {p.Name}: the part has no volume at the mesh grid (a dimension below {Precision.DefaultGridMm} mm); enlarge it";
            }
            catch (PartsException ex)
            {
                return $"{file}: {ex.Message}";
            }
        }
        return null;
    }

    private static IReadOnlyList<string> FailLines(CheckReport r) =>
        r.Checks.Where(c => c.Status == CheckStatus.Fail).Select(c => $"check {c.Id} failed on {c.PartName}: {c.Message}").ToArray();

    private static PipelineResult Bad(IEnumerable<string> problems) => new() { Status = PipelineStatus.BadInput, Problems = problems.ToArray() };

    /// <summary>Stage laps of one run.</summary>
    private sealed class StageClock
    {
        private readonly System.Diagnostics.Stopwatch _sw = System.Diagnostics.Stopwatch.StartNew();
        private readonly List<(string, double)> _laps = new();

        public IReadOnlyList<(string Stage, double Ms)> Laps => _laps;

        public void Lap(string stage)
        {
            _laps.Add((stage, Math.Round(_sw.Elapsed.TotalMilliseconds, 2)));
            _sw.Restart();
        }
    }
}
