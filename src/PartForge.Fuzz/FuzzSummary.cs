using System.Globalization;
using System.Text;
using PartForge.Fuzz.Oracle;

namespace PartForge.Fuzz;

/// <summary>Counts over a fuzz run: exits by command and code, broken promises by kind, the slowest cases.</summary>
public sealed class FuzzSummary
{
    private readonly List<CaseOutcome> _failed = new();
    private readonly List<CaseOutcome> _slowest = new();

    public int Cases { get; private set; }
    public SortedDictionary<string, int> CheckExits { get; } = new(StringComparer.Ordinal);
    public SortedDictionary<string, int> BuildExits { get; } = new(StringComparer.Ordinal);
    public SortedDictionary<string, int> ViolationsByKind { get; } = new(StringComparer.Ordinal);
    public SortedDictionary<string, int> NotesByKind { get; } = new(StringComparer.Ordinal);
    public int Hangs => ViolationsByKind.GetValueOrDefault("hang");
    public int Crashes => ViolationsByKind.GetValueOrDefault("exit-3") + ViolationsByKind.GetValueOrDefault("stack-trace") + ViolationsByKind.GetValueOrDefault("exit-code");
    public int FailedCases => _failed.Count;
    public IReadOnlyList<CaseOutcome> Failed => _failed;
    public IReadOnlyList<CaseOutcome> Slowest => _slowest;
    public List<string> FirstNotes { get; } = new();
    public TimeSpan Wall { get; set; }
    public string Runner { get; set; } = "";
    public int Seed { get; set; }

    public void Add(CaseOutcome o)
    {
        Cases++;
        Bump(CheckExits, Code(o.Check.ExitCode));
        if (o.Build != null) Bump(BuildExits, Code(o.Build.ExitCode));
        foreach (var k in o.Violations.Select(v => v.Kind).Distinct()) Bump(ViolationsByKind, k);
        foreach (var n in o.Notes)
        {
            Bump(NotesByKind, n.Contains("control character", StringComparison.Ordinal) ? "control-char-on-stderr" : "long-stderr-line");
            if (FirstNotes.Count < 5) FirstNotes.Add($"case {o.Input.Index}: {n}");
        }
        if (!o.Passed) _failed.Add(o);
        _slowest.Add(o);
        _slowest.Sort((a, b) => b.Elapsed.CompareTo(a.Elapsed));
        if (_slowest.Count > 5) _slowest.RemoveAt(5);
    }

    private static string Code(int? c) => c?.ToString(CultureInfo.InvariantCulture) ?? "hang";

    private static void Bump(SortedDictionary<string, int> d, string k) => d[k] = d.GetValueOrDefault(k) + 1;

    public string Format(int maxFailures = 20)
    {
        var inv = CultureInfo.InvariantCulture;
        var sb = new StringBuilder();
        string Dict(SortedDictionary<string, int> d) => d.Count == 0 ? "none" : string.Join(", ", d.Select(kv => $"{kv.Key}: {kv.Value}"));
        sb.AppendLine(string.Create(inv, $"partforge-fuzz: {Cases} cases, seed {Seed}, {Runner}, {Wall.TotalSeconds:F1} s ({(Cases == 0 ? 0 : Wall.TotalMilliseconds / Cases):F1} ms a case)"));
        sb.AppendLine($"  check exits: {Dict(CheckExits)}");
        sb.AppendLine($"  build exits: {Dict(BuildExits)}");
        sb.AppendLine($"  crashes (exit 3 / stack trace / other code): {Crashes}; hangs: {Hangs}; failing cases: {FailedCases}");
        sb.AppendLine($"  broken promises by kind: {Dict(ViolationsByKind)}");
        sb.AppendLine($"  notes: {Dict(NotesByKind)}");
        foreach (var n in FirstNotes) sb.AppendLine("    " + n);
        sb.AppendLine("  slowest cases:");
        foreach (var o in _slowest)
            sb.AppendLine(string.Create(inv, $"    case {o.Input.Index} ({o.Elapsed.TotalMilliseconds:F0} ms, check {o.Check.ExitCode?.ToString(inv) ?? "hang"}, build {o.Build?.ExitCode?.ToString(inv) ?? "-"}): {Trim(o.Input.Recipe)}"));
        if (_failed.Count > 0)
        {
            sb.AppendLine("  failing cases:");
            foreach (var o in _failed.Take(maxFailures))
            {
                sb.AppendLine($"    case {o.Input.Index}: {Trim(o.Input.Recipe)}");
                foreach (var v in o.Violations) sb.AppendLine("      " + Trim(v.ToString()));
            }
            if (_failed.Count > maxFailures) sb.AppendLine($"    ... and {_failed.Count - maxFailures} more");
        }
        return sb.ToString();
    }

    private static string Trim(string s) => s.Length > 400 ? s[..400] + "..." : s;
}
