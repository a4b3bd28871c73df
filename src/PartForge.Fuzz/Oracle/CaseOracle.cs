using System.Text.Json;
using System.Text.RegularExpressions;
using PartForge.Fuzz.Mutations;
using PartForge.Fuzz.Running;

namespace PartForge.Fuzz.Oracle;

/// <summary>
/// Runs one fuzz case (<c>check DESIGN --json</c>, then <c>build DESIGN -o OUT</c>) in a private folder and
/// judges it against the command line's promises:
/// exit 0, 1 or 2 only (never 3, never a hang); on failure at least one line on stderr, and on bad input a
/// line that names the file; no stack trace anywhere; the results document is valid JSON without NaN or
/// Infinity (neither as a token nor spelled out in a message); on exit 1 or 2 nothing is written to the output
/// folder; nothing is ever written outside it; a foreign file already in it is never touched; no temporary
/// file is left behind after a successful build.
/// </summary>
public sealed class CaseOracle
{
    private static readonly Regex StackFrame = new(@"^\s*at [\w.`<>\[\],| ]+\(.*\)( in .*)?$|--- End of (inner exception|stack trace)", RegexOptions.Multiline | RegexOptions.CultureInvariant);
    private static readonly Regex NonFiniteWord = new(@"(?<![A-Za-z])(NaN|-?Infinity|∞)(?![A-Za-z])", RegexOptions.CultureInvariant);
    private const string ForeignName = "keep-me.txt";
    private const string ForeignText = "a file of the user's that partforge must leave alone\n";

    public CaseOracle(ICliRunner runner, string workRoot, TimeSpan timeout)
    {
        Runner = runner;
        WorkRoot = workRoot;
        Timeout = timeout;
    }

    public ICliRunner Runner { get; }
    public string WorkRoot { get; }
    public TimeSpan Timeout { get; }

    /// <summary>Share of cases whose check passes that are also built with every format (the expensive part).</summary>
    public double BuildFraction { get; init; } = 1.0;

    /// <summary>Keep the folder of a failing case (design file and outputs) for inspection.</summary>
    public bool KeepFailures { get; init; } = true;

    public CaseOutcome Run(FuzzInput input)
    {
        string dir = Path.Combine(WorkRoot, $"case-{input.Index:D6}");
        if (Directory.Exists(dir)) Directory.Delete(dir, recursive: true);
        Directory.CreateDirectory(dir);
        string fileName = $"{input.BasePreset}-fuzz.yaml";
        string design = Path.Combine(dir, fileName);
        File.WriteAllBytes(design, input.Bytes);
        string outDir = Path.Combine(dir, "out");
        bool foreign = (input.Seed & 1) == 1;
        if (foreign)
        {
            Directory.CreateDirectory(outDir);
            File.WriteAllText(Path.Combine(outDir, ForeignName), ForeignText);
        }
        var before = Snapshot(dir);

        var violations = new List<Violation>();
        var notes = new List<string>();
        var check = Runner.Run(["check", design, "--json"], Timeout);
        JudgeCommon("check", check, fileName, violations, notes);
        if (check.ExitCode is 0 or 1) JudgeResultsJson("check", check.Stdout, check.ExitCode.Value, violations);
        JudgeNothingWritten("check", dir, before, violations);

        CliRun? build = null;
        bool doBuild = !check.TimedOut && (check.ExitCode != 0 || (input.Seed % 1000) < BuildFraction * 1000);
        if (doBuild)
        {
            build = Runner.Run(["build", design, "-o", outDir], Timeout);
            JudgeCommon("build", build, fileName, violations, notes);
            if (check.ExitCode is 1 or 2 && build.ExitCode is { } be && be != check.ExitCode)
                violations.Add(new Violation("inconsistent-exit", "build", $"check exited {check.ExitCode} but build exited {be}"));
            if (!build.TimedOut) JudgeBuildOutputs(build, dir, outDir, before, foreign, violations);
        }

        var outcome = new CaseOutcome(input, check, build, violations, notes);
        if (violations.Count == 0 || !KeepFailures) TryDelete(dir);
        else File.WriteAllText(Path.Combine(dir, "recipe.txt"), input.Recipe + "\n" + string.Join("\n", violations) + "\n");
        return outcome;
    }

    private static void JudgeCommon(string cmd, CliRun run, string fileName, List<Violation> v, List<string> notes)
    {
        if (run.TimedOut)
        {
            v.Add(new Violation("hang", cmd, $"no exit after {run.Elapsed.TotalSeconds:F1} s"));
            return;
        }
        int code = run.ExitCode!.Value;
        if (code == 3) v.Add(new Violation("exit-3", cmd, FirstLine(run.Stderr)));
        else if (code is not (0 or 1 or 2)) v.Add(new Violation("exit-code", cmd, $"exit {code}: {FirstLine(run.Stderr)}"));
        if (StackFrame.IsMatch(run.Stderr) || StackFrame.IsMatch(run.Stdout))
            v.Add(new Violation("stack-trace", cmd, FirstLine(StackFrame.Match(run.Stderr + "\n" + run.Stdout).Value)));
        var lines = run.Stderr.Split('\n', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries);
        if (code is 1 or 2 && lines.Length == 0)
            v.Add(new Violation("no-message", cmd, $"exit {code} with nothing on stderr"));
        if (code == 2 && lines.Length > 0 && !lines.Any(l => l.Contains(fileName, StringComparison.Ordinal)))
            v.Add(new Violation("message-without-file", cmd, FirstLine(run.Stderr)));
        if (run.Stderr.Any(c => c < 0x20 && c != '\n' && c != '\t' && c != '\r' || c == 0x1B || c == 0x7F))
            notes.Add($"{cmd}: a control character on stderr: {Escape(FirstLine(run.Stderr.Split('\n').First(l => l.Any(c => c < 0x20 && c != '\t' && c != '\r' || c == 0x7F))))}");
        if (lines.Any(l => l.Length > 2000)) notes.Add($"{cmd}: a stderr line of {lines.Max(l => l.Length)} characters");
    }

    private static void JudgeResultsJson(string cmd, string json, int exit, List<Violation> v)
    {
        try
        {
            using var doc = JsonDocument.Parse(json);
            var root = doc.RootElement;
            if (root.ValueKind != JsonValueKind.Object || !root.TryGetProperty("format", out var f) || f.GetString() != "partforge-results/1")
                v.Add(new Violation("bad-json", cmd, "the results document has no \"format\": \"partforge-results/1\""));
            if (root.ValueKind == JsonValueKind.Object && root.TryGetProperty("summary", out var s) && s.TryGetProperty("status", out var st))
            {
                string status = st.GetString() ?? "";
                bool ok = exit == 0 ? status is "pass" or "warn" : status == "fail";
                if (!ok) v.Add(new Violation("status-mismatch", cmd, $"exit {exit} but summary.status \"{status}\""));
            }
            foreach (var (path, text) in Strings(root, "$"))
            {
                if (NonFiniteWord.IsMatch(text))
                {
                    v.Add(new Violation("nan-in-json", cmd, $"{path} = \"{Escape(text.Length > 120 ? text[..120] + "..." : text)}\""));
                    break;
                }
            }
        }
        catch (JsonException ex)
        {
            string where = json.Length == 0 ? "stdout is empty" : ex.Message;
            bool nan = NonFiniteWord.IsMatch(json);
            v.Add(new Violation(nan ? "nan-in-json" : "bad-json", cmd, where));
        }
    }

    private static IEnumerable<(string Path, string Text)> Strings(JsonElement e, string path)
    {
        switch (e.ValueKind)
        {
            case JsonValueKind.String:
                yield return (path, e.GetString() ?? "");
                break;
            case JsonValueKind.Object:
                foreach (var p in e.EnumerateObject())
                    foreach (var x in Strings(p.Value, path + "." + p.Name)) yield return x;
                break;
            case JsonValueKind.Array:
                int i = 0;
                foreach (var item in e.EnumerateArray())
                    foreach (var x in Strings(item, $"{path}[{i++}]")) yield return x;
                break;
        }
    }

    private void JudgeBuildOutputs(CliRun build, string dir, string outDir, Dictionary<string, string> before, bool foreign, List<Violation> v)
    {
        var after = Snapshot(dir);
        string outPrefix = outDir + Path.DirectorySeparatorChar;
        foreach (var (path, hash) in after)
        {
            bool inside = path.StartsWith(outPrefix, StringComparison.Ordinal);
            bool changed = !before.TryGetValue(path, out var old) || old != hash;
            if (changed && !inside) v.Add(new Violation("wrote-outside", "build", Path.GetRelativePath(dir, path)));
        }
        foreach (var path in before.Keys.Where(p => !after.ContainsKey(p)))
            v.Add(new Violation(path.StartsWith(outPrefix, StringComparison.Ordinal) ? "foreign-file-touched" : "deleted-outside", "build", Path.GetRelativePath(dir, path) + " was removed"));
        string foreignPath = Path.Combine(outDir, ForeignName);
        if (foreign && (!after.TryGetValue(foreignPath, out var fh) || fh != before[foreignPath]))
            v.Add(new Violation("foreign-file-touched", "build", ForeignName + " changed or removed"));
        var written = after.Keys.Where(p => p.StartsWith(outPrefix, StringComparison.Ordinal) && !before.ContainsKey(p)).ToList();
        int code = build.ExitCode!.Value;
        if (code is 1 or 2 && written.Count > 0)
            v.Add(new Violation("wrote-on-failure", "build", $"exit {code} but wrote {string.Join(", ", written.Take(5).Select(Path.GetFileName))}"));
        if (code == 0)
        {
            if (written.Count == 0) v.Add(new Violation("wrote-nothing", "build", "exit 0 but no file in the output folder"));
            foreach (var t in written.Where(p => Path.GetFileName(p).StartsWith('.') || p.EndsWith(".tmp", StringComparison.Ordinal) || p.Contains(".tmp", StringComparison.Ordinal)))
                v.Add(new Violation("temp-left", "build", Path.GetFileName(t)));
            foreach (var res in written.Where(p => p.EndsWith("-results.json", StringComparison.Ordinal)))
                JudgeResultsJson("build " + Path.GetFileName(res), File.ReadAllText(res), 0, v);
        }
    }

    private static void JudgeNothingWritten(string cmd, string dir, Dictionary<string, string> before, List<Violation> v)
    {
        var after = Snapshot(dir);
        foreach (var (path, hash) in after)
            if (!before.TryGetValue(path, out var old) || old != hash)
                v.Add(new Violation("wrote-outside", cmd, Path.GetRelativePath(dir, path)));
    }

    /// <summary>Every file under the folder (symbolic links not followed) with a content hash.</summary>
    public static Dictionary<string, string> Snapshot(string dir)
    {
        var map = new Dictionary<string, string>(StringComparer.Ordinal);
        if (!Directory.Exists(dir)) return map;
        var opts = new EnumerationOptions { RecurseSubdirectories = true, AttributesToSkip = FileAttributes.ReparsePoint, IgnoreInaccessible = true };
        foreach (var f in Directory.EnumerateFiles(dir, "*", opts))
        {
            var info = new FileInfo(f);
            map[f] = info.LinkTarget != null ? "link:" + info.LinkTarget : Convert.ToHexString(System.Security.Cryptography.SHA256.HashData(File.ReadAllBytes(f)));
        }
        return map;
    }

    private static string FirstLine(string s)
    {
        var l = s.Split('\n').FirstOrDefault(x => x.Trim().Length > 0) ?? "";
        return l.Length > 300 ? l[..300] + "..." : l.TrimEnd('\r');
    }

    private static string Escape(string s) => string.Concat(s.Select(c => c < 0x20 || c == 0x7F ? $"\\x{(int)c:X2}" : c.ToString()));

    private static void TryDelete(string dir)
    {
        try { Directory.Delete(dir, recursive: true); } catch (IOException) { } catch (UnauthorizedAccessException) { }
    }
}
