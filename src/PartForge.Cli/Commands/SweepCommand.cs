using System.CommandLine;
using System.Diagnostics;
using System.Runtime.CompilerServices;
using PartForge.Cli.Hosting;
using PartForge.Cli.Sweep;
using PartForge.Design.Loading;
using Spectre.Console;

namespace PartForge.Cli.Commands;

/// <summary>
/// <c>partforge sweep DESIGN --vary KEY=FROM..TO:STEP [--vary ...] [--csv FILE] [--target KEY=VALUE] [--json]</c>:
/// evaluates every combination of the varied keys (electrical results and checks, nothing exported) on all
/// cores and prints the key results of each variant. Exit 0 when the sweep ran (whatever the variants'
/// status), 2 for bad input (checked before any variant runs: the axes against the schema, the base design apart
/// from the varied keys, the CSV path) and when no variant is a valid design, 3 for an internal error.
/// </summary>
public static class SweepCommand
{
    public static Command Create() => Create(() => new PipelineEvaluator());

    public static Command Create(Func<ISweepEvaluator> evaluator)
    {
        var design = new Argument<string>("DESIGN") { Description = "The design file (YAML) to vary." };
        var vary = new Option<string[]>("--vary")
        {
            Description = $"KEY=FROM..TO:STEP, a numeric design key and its range (TO included when on the grid); repeat for more keys. Every combination is evaluated, at most {SweepPlan.MaxVariants} variants.",
            Arity = ArgumentArity.OneOrMore,
            Required = true,
        };
        var csv = new Option<string?>("--csv") { Description = "Also write every variant and all its results to this CSV file." };
        var target = new Option<string?>("--target") { Description = $"KEY=VALUE: sort the variants by closeness of a result to a value, e.g. electrical.phase.emf_rms_v=12. Results: {string.Join(", ", SweepMetrics.All)}." };
        var json = new Option<bool>("--json") { Description = "Print the sweep as a JSON document instead of a table." };
        var cmd = new Command("sweep", "Evaluate every combination of varied design keys (electrical results and checks, no files) and tabulate the key results.")
        {
            design, vary, csv, target, json,
        };
        CommandAction.Set(cmd, (pr, s) => Run(s, pr.GetValue(design)!, pr.GetValue(vary) ?? [], pr.GetValue(csv), pr.GetValue(target),
            pr.GetValue(json), evaluator()));
        return cmd;
    }

    public static int Run(CliSession s, string designPath, IReadOnlyList<string> varies, string? csvPath, string? targetArg, bool json, ISweepEvaluator evaluator)
    {
        var errors = new List<string>();
        var plan = SweepPlan.Parse(varies, errors);
        SweepTarget? target = null;
        if (targetArg != null)
        {
            target = SweepTarget.Parse(targetArg, out var terr);
            if (terr != null) errors.Add(terr);
        }
        if (errors.Count > 0 || plan == null)
        {
            foreach (var e in errors) s.Problem("partforge sweep: " + e);
            return ExitCodes.BadInput;
        }
        var source = DesignLoader.ParseFile(designPath);
        if (source.ParseErrors.Count > 0)
        {
            foreach (var e in source.ParseErrors) s.Problem(e.ToString());
            return ExitCodes.BadInput;
        }
        // The base design must be valid apart from what the sweep varies: otherwise every row would be
        // "invalid" for the same reason. An error that names a varied key may be cured by the sweep's values.
        var baseDesign = source.Load();
        if (!baseDesign.Success)
        {
            var varied = plan.Axes.Select(a => a.Key).ToArray();
            bool AboutVaried(DesignError e) => varied.Any(k => e.KeyPath == k ||
                string.Join(" ", e.Message, e.Allowed, e.Suggestion).Contains(k, StringComparison.Ordinal));
            var fatal = baseDesign.Errors.Where(e => !AboutVaried(e)).ToList();
            if (fatal.Count > 0)
            {
                foreach (var e in baseDesign.Errors) s.Problem(e.ToString());
                s.Problem($"partforge sweep: the base design {designPath} is invalid ({fatal.Count} error{(fatal.Count == 1 ? "" : "s")} not on a varied key); fix it first");
                return ExitCodes.BadInput;
            }
        }
        string name = baseDesign.Design?.Name ?? Path.GetFileNameWithoutExtension(designPath);

        // The CSV's folder and permissions are checked, and its temporary file made, before any variant runs;
        // its rows are written as they finish (in plan order), so memory does not grow with them for the file.
        using var csv = csvPath != null ? StreamedTextFile.Open(csvPath) : null;
        using var onInterrupt = s.Guard is { } guard && csv != null ? guard.Token.Register(csv.Abort) : default;
        csv?.Write(SweepOutput.CsvHeader(plan));

        var done = new StrongBox<long>();
        var sw = Stopwatch.StartNew();
        var cancel = s.Guard?.Token ?? CancellationToken.None;
        long total = plan.Count;
        var counts = new Dictionary<string, long>(StringComparer.Ordinal);
        string? firstReason = null;
        // A plain table with no --target is written as the rows finish and no row is kept (memory flat in the
        // row count); sorting (--target), the JSON document and the terminal's table need every row, kept compact.
        bool streamTable = target == null && !json && !s.IsTerminal;
        var table = streamTable ? new SweepOutput.StreamedTable(s.Out, plan) : null;
        var kept = streamTable ? null : new List<SweepRow>((int)Math.Min(total, SweepPlan.MaxVariants));
        void Take(SweepRow row)
        {
            counts[row.Outcome.Status] = counts.GetValueOrDefault(row.Outcome.Status) + 1;
            firstReason ??= row.Outcome.Reason;
            csv?.Write(SweepOutput.CsvLine(plan, row));
            if (table != null) table.Row(row);
            else kept!.Add(row);
        }
        var work = Task.Run(() => SweepRunner.Stream(source, plan, evaluator, Take, done, cancel: cancel));
        if (!s.Quiet) ShowProgress(s, work, done, total);
        // An exception in a variant is a bug: it propagates to CommandAction (one line, exit 3).
        work.GetAwaiter().GetResult();
        csv?.Commit();

        if (kept != null)
        {
            IReadOnlyList<SweepRow> shown = target != null ? target.Sort(kept) : kept;
            if (json) SweepOutput.Json(s.Out, name, plan, shown, target);
            else if (s.IsTerminal) TerminalTable(s, plan, shown, target);
            else SweepOutput.PlainTable(s.Out, plan, shown, target);
        }

        if (!s.Quiet)
        {
            s.Err.WriteLine($"sweep: {total} variants in {sw.Elapsed.TotalSeconds.ToString("0.00", System.Globalization.CultureInfo.InvariantCulture)} s: " +
                            string.Join(", ", new[] { "pass", "warn", "fail", "invalid" }.Select(k => $"{counts.GetValueOrDefault(k)} {k}")));
        }
        if (counts.GetValueOrDefault("invalid") == total)
        {
            s.Problem($"partforge sweep: no variant is a valid design (the first: {firstReason}); change the --vary ranges");
            return ExitCodes.BadInput;
        }
        return ExitCodes.Ok;
    }

    private static void ShowProgress(CliSession s, Task work, StrongBox<long> done, long total)
    {
        if (!Console.IsErrorRedirected && CommandAction.Err == Console.Error)
        {
            var err = AnsiConsole.Create(new AnsiConsoleSettings { Out = new AnsiConsoleOutput(Console.Error) });
            err.Progress().AutoClear(true).Columns(new TaskDescriptionColumn(), new ProgressBarColumn(), new PercentageColumn(), new RemainingTimeColumn())
               .Start(ctx =>
               {
                   var t = ctx.AddTask("sweep", maxValue: total);
                   while (!work.IsCompleted)
                   {
                       t.Value = Interlocked.Read(ref done.Value);
                       ((IAsyncResult)work).AsyncWaitHandle.WaitOne(100);
                   }
                   t.Value = total;
               });
            return;
        }
        // Not a terminal: a plain line at every tenth.
        long next = Math.Max(1, total / 10);
        while (!work.IsCompleted)
        {
            ((IAsyncResult)work).AsyncWaitHandle.WaitOne(200);
            long d = Interlocked.Read(ref done.Value);
            if (d >= next && d < total)
            {
                s.Err.WriteLine($"sweep: {d}/{total} variants");
                next = (d / Math.Max(1, total / 10) + 1) * Math.Max(1, total / 10);
            }
        }
        s.Err.WriteLine($"sweep: {total}/{total} variants");
    }

    private static void TerminalTable(CliSession s, SweepPlan plan, IReadOnlyList<SweepRow> rows, SweepTarget? target)
    {
        var (head, cells) = SweepOutput.TableCells(plan, rows, target);
        var table = new Table().Border(TableBorder.Rounded);
        for (int i = 0; i < head.Length; i++)
        {
            var col = new TableColumn(Markup.Escape(head[i]));
            if (i < head.Length - 2) col.RightAligned();
            table.AddColumn(col);
        }
        foreach (var c in cells)
        {
            var row = c.Select(Markup.Escape).ToArray();
            string status = c[^2];
            string colour = status switch { "pass" => "green", "warn" => "yellow", "fail" => "red", _ => "grey" };
            row[^2] = $"[{colour}]{Markup.Escape(status)}[/]";
            table.AddRow(row);
        }
        s.Console().Write(table);
    }
}
