using PartForge.Checks;
using PartForge.Design.Loading;
using PartForge.Electrical;
using PartForge.Export.Bom;
using PartForge.Export.Report;
using PartForge.Export.Results;
using PartForge.Formats.Cutting;
using PartForge.Formats.Dxf;
using PartForge.Formats.Stl;
using PartForge.Formats.Svg;
using PartForge.Formats.ThreeMf;
using PartForge.Geometry;
using PartForge.Parts;

namespace PartForge.Export.Pipeline;

/// <summary>
/// The whole job: load -> electrical -> parts -> checks -> gate -> export. The gate: if any check fails,
/// nothing is written (unless forced, and then the results and report say so). Outputs go only into the
/// output folder, each through an atomic write, in a fixed order, so two builds give identical files.
/// </summary>
public static class BuildPipeline
{
    /// <summary>Electrical results, parts and checks of a loaded design (no files). Thread-safe; used by sweeps.</summary>
    public static Evaluation Evaluate(Design.Model.Design design, CheckOptions? options = null) => Evaluate(design, options, null);

    private static Evaluation Evaluate(Design.Model.Design design, CheckOptions? options, StageClock? clock)
    {
        var electrical = ElectricalEngine.Evaluate(design);
        clock?.Lap("electrical");
        if (electrical.Coil?.Outline == null)
        {
            // Without a resolved coil there is nothing to build or measure: the electrical errors are the checks.
            var fails = electrical.Diagnostics.Where(x => x.Severity == Electrical.DiagnosticSeverity.Error).Select(x => new CheckResult
            {
                Id = x.Id, Part = "former", Status = CheckStatus.Fail, Value = 0, Limit = 0, Unit = "", Margin = 0,
                Message = x.Key.Length > 0 ? $"{x.Key}: {x.Message}" : x.Message,
            }).ToList();
            if (fails.Count == 0)
                fails.Add(new CheckResult
                {
                    Id = "coil-unresolved", Part = "former", Status = CheckStatus.Fail, Value = 0, Limit = 0, Unit = "", Margin = 0,
                    Message = "the coil could not be resolved from the coils section, so no parts can be made",
                });
            return new Evaluation(design, electrical, null, new CheckReport(fails));
        }
        var parts = PartsBuilder.Build(design, electrical, Precision.FromChordalTolerance(design.Mesh.ChordalTolerance));
        clock?.Lap("parts");
        var checks = CheckRunner.Run(design, electrical, parts, options);
        clock?.Lap("checks");
        return new Evaluation(design, electrical, parts, checks);
    }

    /// <summary><c>partforge check</c>: load, evaluate, results document; writes nothing.</summary>
    /// <param name="meshes">Mesh the parts for the triangle counts of the results document (check --json); the
    /// human summary does not show them and skips the meshing.</param>
    public static PipelineResult Check(string designPath, bool meshes = true)
    {
        var loaded = DesignLoader.Load(designPath);
        if (!loaded.Success) return Bad(loaded.Errors.Select(e => e.ToString()));
        var (ev, problem) = TryEvaluate(loaded.Design!, designPath);
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

    /// <summary><c>partforge build</c>.</summary>
    public static PipelineResult Build(BuildRequest request)
    {
        var clock = new StageClock();
        var problems = new List<string>();
        var formats = ExportFormats.ParseList(request.Formats, ExportFormats.All, "--formats", problems) ?? ExportFormats.All.ToHashSet();
        var partFilter = ExportFormats.ParseList(request.Parts, ExportFormats.PartNames, "--parts", problems);
        var folder = OutputFolder.Prepare(request.OutputDir, out var folderProblem);
        if (folderProblem != null) problems.Add(folderProblem);
        var loaded = DesignLoader.Load(request.DesignPath);
        if (!loaded.Success) problems.InsertRange(0, loaded.Errors.Select(e => e.ToString()));
        if (problems.Count > 0) return Bad(problems);
        clock.Lap("load");

        var (ev, problem) = TryEvaluate(loaded.Design!, request.DesignPath, clock);
        if (ev == null) return Bad([problem!]);
        if (partFilter != null && ev.Parts != null)
        {
            var names = ev.Parts.Parts.Select(p => p.Name).ToArray();
            foreach (var n in partFilter.Where(n => !names.Contains(n)))
                problems.Add($"--parts: this design has no part '{n}'; its parts: {string.Join(", ", names)}");
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
        if (MeshProblem(ev, plan.MeshedParts(ev.Parts), request.DesignPath) is { } meshProblem) return Bad([meshProblem]);
        clock.Lap("mesh");
        var doc = ResultsBuilder.Build(ev, plan.FilesByPart, forced: failed, countTriangles: plan.WritesResults);
        var previews = RenderPreviews(plan, ev.Parts);
        clock.Lap("previews");
        var written = new List<string>();
        try
        {
            foreach (var f in plan.Files) folder.PathOf(f.Name); // refuse links or folders at any output name before writing anything
            folder.Create();
            foreach (var f in plan.Files)
            {
                WriteOne(folder, f, ev, doc, failed, previews);
                written.Add(f.Name);
            }
        }
        catch (OutputRefusedException ex)
        {
            return new PipelineResult { Status = PipelineStatus.BadInput, Problems = [ex.Message], Evaluation = ev, Results = doc, Written = written, OutputFolder = folder.FullPath };
        }
        catch (UnauthorizedAccessException)
        {
            return new PipelineResult { Status = PipelineStatus.BadInput, Problems = [$"{request.OutputDir}: permission denied"], Evaluation = ev, Results = doc, Written = written, OutputFolder = folder.FullPath };
        }
        clock.Lap("write");
        return new PipelineResult
        {
            Status = failed ? PipelineStatus.ChecksFailed : PipelineStatus.Ok,
            Problems = failed ? FailLines(ev.Checks) : [],
            Evaluation = ev,
            Results = doc,
            Written = written,
            OutputFolder = folder.FullPath,
            Timings = clock.Laps,
        };
    }

    private static void WriteOne(OutputFolder folder, ExportPlan.FileSpec f, Evaluation ev, ResultsDocument doc, bool forced, IReadOnlyDictionary<string, byte[]> previews)
    {
        var d = ev.Design;
        var parts = ev.Parts!;
        switch (f.Format)
        {
            case "stl":
                folder.Write(f.Name, s => StlWriter.WriteBinary(s, f.Part!.Mesh, StlWriter.SafeName(d.Name + "-" + f.Part.Name)));
                break;
            case "3mf" when f.Assembly:
                var placed = AssemblyThreeMf.Objects(parts);
                folder.Write(f.Name, s => ThreeMfWriter.Write(s, AssemblyThreeMf.Title(d.Name), placed));
                break;
            case "3mf":
                var objects = f.Parts.Select(p => ThreeMfObject.At(p.Name, p.Mesh)).ToArray();
                folder.Write(f.Name, s => ThreeMfWriter.Write(s, d.Name, objects));
                break;
            case "dxf":
                var contours = d.Process.DxfContours == "entities" ? DxfContours.Entities : DxfContours.Polyline;
                folder.Write(f.Name, s => DxfWriter.Write(s, CutSheetOf(d, f.Part!), contours));
                break;
            case "svg":
                folder.Write(f.Name, s => SvgWriter.Write(s, CutSheetOf(d, f.Part!)));
                break;
            case "png":
                folder.Write(f.Name, previews[f.Part?.Name ?? AssemblyPreview]);
                break;
            case "json":
                folder.Write(f.Name, ResultsJson.ToUtf8(doc));
                break;
            case "csv":
            {
                var e = ElectricalView.From(d, ev.Electrical);
                folder.Write(f.Name, BomCsv.WriteUtf8(BomBuilder.Build(d, e.TotalWireM, e.WireGramsPerMetre, ReportBuilder.BomParts(parts))));
                break;
            }
            case "html":
            {
                var e = ElectricalView.From(d, ev.Electrical);
                var shown = parts.Parts.Where(p => p.Process == PartProcess.Print).Select(p => (p.Name, previews[p.Name])).ToArray();
                folder.WriteText(f.Name, HtmlReport.Render(ReportBuilder.Build(d, e, parts, ev.Checks, forced, shown)));
                break;
            }
            default:
                throw new InvalidOperationException($"no writer for format {f.Format}");
        }
    }

    private const string AssemblyPreview = "\0assembly";

    /// <summary>
    /// Every preview the planned files show (a part's PNG, the assembly PNG, the report's pictures of the
    /// printed parts), each rendered once and all of them side by side on the machine's cores. Each picture is
    /// a pure function of its meshes, so the bytes do not depend on the order or the thread.
    /// </summary>
    private static IReadOnlyDictionary<string, byte[]> RenderPreviews(ExportPlan plan, PartSet parts)
    {
        var keys = new SortedSet<string>(StringComparer.Ordinal);
        foreach (var f in plan.Files)
        {
            if (f.Format == "png") keys.Add(f.Part?.Name ?? AssemblyPreview);
            if (f.Format == "html") foreach (var p in parts.Parts.Where(p => p.Process == PartProcess.Print)) keys.Add(p.Name);
        }
        var result = new System.Collections.Concurrent.ConcurrentDictionary<string, byte[]>(StringComparer.Ordinal);
        Parallel.ForEach(keys, new ParallelOptions { MaxDegreeOfParallelism = Environment.ProcessorCount }, k =>
            result[k] = k == AssemblyPreview ? Previews.Assembly(parts) : Previews.Part(parts.Get(k)));
        return result;
    }

    private static CutSheet CutSheetOf(Design.Model.Design d, PartModel p) =>
        new(p.Name, p.CutProfile ?? throw new InvalidOperationException($"cut part {p.Name} has no cut profile"), p.Marks, d.Process.Kerf);

    private static (Evaluation? Ev, string? Problem) TryEvaluate(Design.Model.Design d, string file, StageClock? clock = null)
    {
        if (MeshBudget.Check(d, file) is { } tooFine) return (null, tooFine);
        clock?.Lap("budget");
        try
        {
            var ev = Evaluate(d, null, clock);
            if (ev.Parts is { HasErrors: true } ps)
                return (null, string.Join("; ", ps.Diagnostics.Where(x => x.Severity == Parts.DiagnosticSeverity.Error).Select(x => $"{file}: {x.Part}: {x.Message}")));
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
        MeshSchedule.MeshAll(list, ev.Design.Mesh.ChordalTolerance);
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
        r.Checks.Where(c => c.Status == CheckStatus.Fail).Select(c => $"check {c.Id} failed on {c.Part}: {c.Message}").ToArray();

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
