using System.CommandLine;
using PartForge.Cli.Hosting;
using PartForge.Export.Pipeline;
using PartForge.Export.Results;

namespace PartForge.Cli.Commands;

/// <summary><c>partforge check DESIGN [--json]</c>: validate, compute, run every check; write nothing.</summary>
public static class CheckCommand
{
    public static Command Create()
    {
        var design = new Argument<string>("DESIGN") { Description = "The design file (YAML)." };
        var json = new Option<bool>("--json") { Description = "Print the results document (JSON) on stdout instead of the summary." };
        var cmd = new Command("check", "Load and validate a design, compute its electrical results and run every check. Writes no files.") { design, json };
        CommandAction.Set(cmd, (pr, s) =>
        {
            bool asJson = pr.GetValue(json);
            var r = BuildPipeline.Check(pr.GetValue(design)!, meshes: asJson);
            return Report(s, r, asJson);
        });
        return cmd;
    }

    internal static int Report(CliSession s, PipelineResult r, bool json)
    {
        if (r.Status == PipelineStatus.BadInput || r.Results == null)
        {
            foreach (var p in r.Problems) s.Problem(p);
            return ExitCodes.BadInput;
        }
        if (json) s.Out.Write(ResultsJson.Serialize(r.Results));
        else CheckOutput.Print(s, r.Results);
        foreach (var p in r.Problems) s.Problem(p);
        return r.Status == PipelineStatus.ChecksFailed ? ExitCodes.CheckFailed : ExitCodes.Ok;
    }
}
