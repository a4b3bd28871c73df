using System.CommandLine;
using PartForge.Cli.Hosting;
using PartForge.Design.Presets;
using Spectre.Console;

namespace PartForge.Cli.Commands;

/// <summary><c>partforge presets</c>: the bundled presets, one line each.</summary>
public static class PresetsCommand
{
    public static Command Create()
    {
        var cmd = new Command("presets", "List the bundled presets, one line each (name and description).");
        CommandAction.Set(cmd, (_, s) =>
        {
            var all = PresetLibrary.All;
            if (s.IsTerminal)
            {
                var t = new Table().Border(TableBorder.Simple).AddColumn("preset").AddColumn("description");
                foreach (var p in all) t.AddRow(Markup.Escape(p.Name + (p.Name == PresetLibrary.DefaultName ? " (default)" : "")), Markup.Escape(p.Description));
                s.Console().Write(t);
            }
            else
            {
                int w = all.Max(p => p.Name.Length);
                foreach (var p in all) s.Out.WriteLine(p.Name.PadRight(w) + "  " + p.Description);
            }
            return ExitCodes.Ok;
        });
        return cmd;
    }
}
