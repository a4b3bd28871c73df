using System.Globalization;
using PartForge.Design.Keys;
using PartForge.Design.Loading;

namespace PartForge.Cli.Sweep;

/// <summary>
/// One varied key of a sweep: <c>KEY=FROM..TO:STEP</c>, values FROM, FROM+STEP, ... up to TO inclusive
/// (TO itself is included when it lies on the grid, to within 1e-9 of a step).
/// </summary>
public sealed record SweepAxis(string Key, double From, double To, double Step, bool WholeNumbers)
{
    public int Count => (int)Math.Floor((To - From) / Step + 1e-9) + 1;

    /// <summary>The i-th value, rounded to 10 decimals so 0.1 steps do not print as 0.30000000000000004.</summary>
    public double Value(int i) => Math.Round(From + i * Step, 10);

    /// <summary>The i-th value as the design file would spell it.</summary>
    public string Text(int i) => Value(i).ToString("R", CultureInfo.InvariantCulture);

    /// <summary>Parses one --vary argument; on failure returns null and a one-line reason.</summary>
    public static SweepAxis? Parse(string arg, out string? error)
    {
        error = null;
        int eq = arg.IndexOf('=');
        if (eq <= 0) { error = $"--vary '{arg}': expected KEY=FROM..TO:STEP, e.g. coils.turns=100..140:10"; return null; }
        string key = arg[..eq].Trim();
        string rest = arg[(eq + 1)..].Trim();
        int dots = rest.IndexOf("..", StringComparison.Ordinal);
        int colon = rest.LastIndexOf(':');
        if (dots < 0 || colon < dots)
        {
            error = $"--vary '{arg}': expected KEY=FROM..TO:STEP, e.g. coils.turns=100..140:10";
            return null;
        }
        var keyError = DesignSource.CheckKeyPath(key, "--vary");
        if (keyError != null)
        {
            error = $"--vary {key}: {keyError.Message}" + (keyError.Suggestion != null ? "; " + keyError.Suggestion : "");
            return null;
        }
        var spec = SectionSpec.Root.Resolve(key, out _)![^1];
        if (spec.Kind is not (ValueKind.Integer or ValueKind.Number))
        {
            error = $"--vary {key}: only numeric keys can be swept (this key takes {spec.Kind.ToString().ToLowerInvariant()})";
            return null;
        }
        if (!TryNumber(rest[..dots], out double from) || !TryNumber(rest[(dots + 2)..colon], out double to) || !TryNumber(rest[(colon + 1)..], out double step))
        {
            error = $"--vary {key}: FROM, TO and STEP must be finite numbers in '{rest}'";
            return null;
        }
        if (from > to) { error = $"--vary {key}: FROM {Fmt(from)} is larger than TO {Fmt(to)}"; return null; }
        if (!(step > 0)) { error = $"--vary {key}: STEP must be positive (got {Fmt(step)})"; return null; }
        bool whole = spec.Kind == ValueKind.Integer;
        if (whole && (from != Math.Floor(from) || to != Math.Floor(to) || step != Math.Floor(step)))
        {
            error = $"--vary {key}: this key takes whole numbers, so FROM, TO and STEP must be whole";
            return null;
        }
        if ((to - from) / step > SweepPlan.MaxVariants)
        {
            error = $"--vary {key}: {Fmt(Math.Floor((to - from) / step) + 1)} values is more than the limit of {SweepPlan.MaxVariants} variants";
            return null;
        }
        var axis = new SweepAxis(key, from, to, step, whole);
        // Every value must be one the design file accepts, else the sweep would compute rows that cannot load.
        double last = axis.Value(axis.Count - 1);
        if (spec.Range != null && (!spec.InRange(axis.Value(0)) || !spec.InRange(last)))
        {
            error = $"--vary {key}: {Fmt(axis.Value(0))}..{Fmt(last)} goes outside what {key} allows ({spec.AllowedText()})";
            return null;
        }
        return axis;
    }

    private static bool TryNumber(string s, out double v) =>
        double.TryParse(s.Trim(), NumberStyles.Float, CultureInfo.InvariantCulture, out v) && double.IsFinite(v);

    private static string Fmt(double v) => v.ToString("R", CultureInfo.InvariantCulture);
}
