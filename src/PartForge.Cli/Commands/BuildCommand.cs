using System.CommandLine;
using PartForge.Cli.Hosting;
using PartForge.Export.Pipeline;

namespace PartForge.Cli.Commands;

/// <summary><c>partforge build DESIGN [-o DIR] [--formats LIST] [--parts LIST] [--force] [--timings]</c>.</summary>
public static class BuildCommand
{
    public static Command Create()
    {
        var design = new Argument<string>("DESIGN") { Description = "The design file (YAML)." };
        var output = new Option<string>("--output", "-o") { Description = "Output folder (created if needed).", HelpName = "DIR", DefaultValueFactory = _ => "out" };
        var formats = new Option<string?>("--formats") { Description = $"Comma-separated formats to write: {string.Join(",", ExportFormats.All)} (default: all that apply to each part).", HelpName = "LIST" };
        var parts = new Option<string?>("--parts") { Description = $"Comma-separated parts to write: {string.Join(",", ExportFormats.PartNames)} (default: all).", HelpName = "LIST" };
        var force = new Option<bool>("--force") { Description = "Write even if a check fails; the results and the report are then marked failed." };
        var timings = new Option<bool>("--timings") { Description = "Print the wall time of each stage (load, budget, electrical, parts, checks, mesh, previews, write) to standard error." };
        var cmd = new Command("build", "Check a design, then write its parts (STL, 3MF, DXF, SVG), results, report, BOM and previews. A failed check writes nothing.")
        {
            design, output, formats, parts, force, timings,
        };
        CommandAction.Set(cmd, (pr, s) =>
        {
            var r = BuildPipeline.Build(new BuildRequest
            {
                DesignPath = pr.GetValue(design)!,
                OutputDir = pr.GetValue(output) ?? "out",
                Formats = pr.GetValue(formats),
                Parts = pr.GetValue(parts),
                Force = pr.GetValue(force),
                Guard = s.Guard,
            });
            foreach (var p in r.Problems) s.Problem(p);
            if (pr.GetValue(timings) && r.Timings.Count > 0)
                s.Problem("timings: " + string.Join(", ", r.Timings.Select(t => FormattableString.Invariant($"{t.Stage} {t.Ms:0.0} ms")))
                    + FormattableString.Invariant($"; process {(DateTime.Now - System.Diagnostics.Process.GetCurrentProcess().StartTime).TotalMilliseconds:0} ms so far"));
            if (r.Status == PipelineStatus.BadInput) return ExitCodes.BadInput;
            string dir = pr.GetValue(output) ?? "out";
            foreach (var t in r.RemovedTemporaries) s.Detail($"removed a leftover temporary of an earlier build: {Path.Combine(dir, t)}");
            if (r.Written.Count == 0)
            {
                s.Problem($"partforge: a check failed; nothing was written to {dir} (fix the design, or use --force to write it marked failed)");
                return ExitCodes.CheckFailed;
            }
            if (!s.Quiet)
            {
                foreach (var f in r.Written) s.Out.WriteLine(Path.Combine(dir, f));
                if (r.Results != null) s.Out.WriteLine(CheckOutput.Summary(r.Results) + $"; wrote {r.Written.Count} files to {dir}");
            }
            if (r.Status == PipelineStatus.ChecksFailed)
            {
                s.Problem($"partforge: written anyway (--force); the results and the report are marked failed");
                return ExitCodes.CheckFailed;
            }
            return ExitCodes.Ok;
        });
        return cmd;
    }
}
