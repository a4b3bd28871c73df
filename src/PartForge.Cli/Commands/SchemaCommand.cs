using System.CommandLine;
using PartForge.Cli.Hosting;
using PartForge.Design.Schema;

namespace PartForge.Cli.Commands;

/// <summary><c>partforge schema [-o FILE]</c>: the JSON Schema (2020-12) of the design file.</summary>
public static class SchemaCommand
{
    public static Command Create()
    {
        var output = new Option<string?>("--output", "-o") { Description = "Write the schema to this file instead of stdout.", HelpName = "FILE" };
        var cmd = new Command("schema", "Print the JSON Schema (2020-12) of the design file, for an editor's YAML language server.") { output };
        CommandAction.Set(cmd, (pr, s) =>
        {
            string text = DesignSchema.Generate();
            string? path = pr.GetValue(output);
            if (path == null || path == "-") s.Out.Write(text);
            else
            {
                TextFiles.WriteAtomic(path, text);
                s.Info($"wrote {path}");
            }
            return ExitCodes.Ok;
        });
        return cmd;
    }
}
