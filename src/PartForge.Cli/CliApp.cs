using System.CommandLine;
using System.CommandLine.Help;
using System.CommandLine.Invocation;
using PartForge.Cli.Commands;
using PartForge.Cli.Hosting;

namespace PartForge.Cli;

/// <summary>The command tree of <c>partforge</c>. A command is a static class with <c>Create()</c>; register it with one line below.</summary>
public static class CliApp
{
    public static RootCommand BuildRoot()
    {
        var root = new RootCommand("PartForge: from the design of a small axial-flux machine to printable, checked parts.");
        root.Options.Add(GlobalOptions.Verbose);
        root.Options.Add(GlobalOptions.Quiet);
        root.Subcommands.Add(CheckCommand.Create());
        root.Subcommands.Add(BuildCommand.Create());
        root.Subcommands.Add(InitCommand.Create());
        root.Subcommands.Add(PresetsCommand.Create());
        root.Subcommands.Add(SchemaCommand.Create());
        root.Subcommands.Add(SweepCommand.Create());
        root.Subcommands.Add(WatchCommand.Create());
        root.Subcommands.Add(SimulateCommand.Create());
        root.SetAction(pr =>
        {
            CommandAction.Err.WriteLine("partforge: give a command: check, build, init, presets, schema, sweep, watch (see partforge --help)");
            return ExitCodes.BadInput;
        });
        return root;
    }

    /// <summary>Parses and runs; command-line mistakes exit 2 with one line per problem.</summary>
    public static int Run(string[] args)
    {
        var root = BuildRoot();
        var pr = root.Parse(args);
        if (pr.Errors.Count > 0 && pr.Action is not HelpAction)
        {
            foreach (var e in pr.Errors) CommandAction.Err.WriteLine("partforge: " + e.Message.ReplaceLineEndings(" "));
            CommandAction.Err.WriteLine("partforge: see 'partforge --help'");
            return ExitCodes.BadInput;
        }
        var config = new InvocationConfiguration { Output = CommandAction.Out, Error = CommandAction.Err, EnableDefaultExceptionHandler = false };
        return pr.Invoke(config);
    }
}
