using System.CommandLine;
using PartForge.Cli.Hosting;
using PartForge.Design.Schema;
using PartForge.Export.Results;

namespace PartForge.Cli.Commands;

/// <summary><c>partforge schema [-o FILE] [--results] [--overwrite]</c>: the JSON Schema (2020-12) of the design file, or of the results document.</summary>
public static class SchemaCommand
{
    public static Command Create()
    {
        var output = new Option<string?>("--output", "-o") { Description = "Write the schema to this file instead of stdout.", HelpName = "FILE" };
        var results = new Option<bool>("--results") { Description = "The schema of the results document (check --json, <name>-results.json) instead of the design file's." };
        var overwrite = new Option<bool>("--overwrite", "--force") { Description = "Replace the file if it exists." };
        var cmd = new Command("schema", "Print the JSON Schema (2020-12) of the design file, for an editor's YAML language server, or of the results document.")
        {
            output, results, overwrite,
        };
        CommandAction.Set(cmd, (pr, s) =>
        {
            string text = pr.GetValue(results) ? ResultsSchema.Text : DesignSchema.Generate();
            string? path = pr.GetValue(output);
            if (path == null || path == "-") s.Out.Write(text);
            else
            {
                if (Directory.Exists(path)) throw new UsageException($"{path} is a folder; give a file name with -o");
                if (File.Exists(path) && !pr.GetValue(overwrite)) throw new UsageException($"{path} exists; not overwritten (use --overwrite to replace it)");
                TextFiles.WriteAtomic(path, text);
                s.Info($"wrote {path}");
            }
            return ExitCodes.Ok;
        });
        return cmd;
    }
}
