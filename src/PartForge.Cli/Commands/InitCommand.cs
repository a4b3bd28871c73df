using System.CommandLine;
using PartForge.Cli.Hosting;
using PartForge.Design.Presets;

namespace PartForge.Cli.Commands;

/// <summary><c>partforge init [-o FILE] [--preset NAME] [--overwrite]</c>: a starter design file with every key.</summary>
public static class InitCommand
{
    public static Command Create()
    {
        var output = new Option<string?>("--output", "-o") { Description = "File to write (default: <preset>.yaml here; '-' for stdout).", HelpName = "FILE" };
        var preset = new Option<string?>("--preset", "-p") { Description = $"Bundled preset to start from (default: {PresetLibrary.DefaultName}; see 'partforge presets').", HelpName = "NAME" };
        var force = new Option<bool>("--overwrite", "--force", "-f") { Description = "Replace the file if it exists." };
        var cmd = new Command("init", "Write a starter design file from a bundled preset, with every key and its default.") { output, preset, force };
        CommandAction.Set(cmd, (pr, s) =>
        {
            string name = pr.GetValue(preset) ?? PresetLibrary.DefaultName;
            var p = PresetLibrary.Find(name)
                ?? throw new UsageException($"no preset named '{name}'; presets: {string.Join(", ", PresetLibrary.All.Select(x => x.Name))}");
            string text = DesignTemplate.Render(p);
            string path = pr.GetValue(output) ?? p.Name + ".yaml";
            if (path == "-")
            {
                s.Out.Write(text);
                return ExitCodes.Ok;
            }
            if (Directory.Exists(path)) throw new UsageException($"{path} is a folder; give a file name with -o");
            if (File.Exists(path) && !pr.GetValue(force)) throw new UsageException($"{path} exists; not overwritten (use --overwrite to replace it)");
            TextFiles.WriteAtomic(path, text);
            s.Info($"wrote {path} (preset {p.Name}); next: partforge check {path}");
            return ExitCodes.Ok;
        });
        return cmd;
    }
}
