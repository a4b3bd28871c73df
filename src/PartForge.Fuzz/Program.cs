using System.Globalization;
using PartForge.Fuzz;
using PartForge.Fuzz.Mutations;
using PartForge.Fuzz.Oracle;
using PartForge.Fuzz.Running;

// partforge-fuzz [--cases N] [--seed S] [--only I] [--timeout SECONDS] [--build-fraction F] [--max-minutes M] [--exe] [--work DIR] [--dump DIR]
// Seeded mutation fuzzing of `partforge check --json` and `partforge build` from the presets; prints a summary.
// Exit 0 when every case kept every promise, 1 when some case broke one, 2 on a bad option.
var inv = CultureInfo.InvariantCulture;
var stdout = Console.Out;
var stderr = Console.Error; // kept: an in-process case that hangs leaves Console redirected
int cases = 1000, seed = 1, only = -1;
double timeoutS = 30, buildFraction = 0.25, maxMinutes = 0;
bool exe = false;
string? work = null, dump = null;
try
{
    for (int i = 0; i < args.Length; i++)
    {
        string Next() => i + 1 < args.Length ? args[++i] : throw new FormatException($"{args[i]} needs a value");
        switch (args[i])
        {
            case "--cases": cases = int.Parse(Next(), inv); break;
            case "--seed": seed = int.Parse(Next(), inv); break;
            case "--only": only = int.Parse(Next(), inv); break;
            case "--timeout": timeoutS = double.Parse(Next(), inv); break;
            case "--build-fraction": buildFraction = double.Parse(Next(), inv); break;
            case "--exe": exe = true; break;
            case "--max-minutes": maxMinutes = double.Parse(Next(), inv); break;
            case "--work": work = Next(); break;
            case "--dump": dump = Next(); break;
            case "-h" or "--help":
                Console.WriteLine("partforge-fuzz [--cases N] [--seed S] [--only INDEX] [--timeout SECONDS] [--build-fraction 0..1] [--max-minutes M] [--exe] [--work DIR] [--dump DIR]");
                Console.WriteLine("  Mutates the presets (seeded), runs check --json and build on each case, prints a summary.");
                Console.WriteLine("  --exe runs the partforge executable next to this program instead of in-process.");
                Console.WriteLine("  --dump DIR writes each case's design file to DIR instead of running it.");
                return 0;
            default: throw new FormatException($"unknown option {args[i]}");
        }
    }
    if (cases < 1 || timeoutS <= 0 || buildFraction is < 0 or > 1) throw new FormatException("--cases must be >= 1, --timeout > 0, --build-fraction 0..1");
}
catch (Exception ex) when (ex is FormatException or OverflowException)
{
    Console.Error.WriteLine("partforge-fuzz: " + ex.Message);
    return 2;
}

var seeds = SeedLoader.Load();
var indices = only >= 0 ? new[] { only } : Enumerable.Range(0, cases).ToArray();
if (dump != null)
{
    Directory.CreateDirectory(dump);
    var m = new Mutator(seeds);
    foreach (int i in indices)
    {
        var input = m.Make(i, seed);
        File.WriteAllBytes(Path.Combine(dump, $"case-{i:D6}.yaml"), input.Bytes);
        stdout.WriteLine($"case {i}: {input.Recipe}");
    }
    return 0;
}

ICliRunner runner = exe
    ? ProcessCli.Find(AppContext.BaseDirectory) ?? throw new InvalidOperationException("no partforge executable next to partforge-fuzz")
    : new InProcessCli();
string root = work ?? Path.Combine(Path.GetTempPath(), $"partforge-fuzz-{Environment.ProcessId}");
Directory.CreateDirectory(root);
var oracle = new CaseOracle(runner, root, TimeSpan.FromSeconds(timeoutS)) { BuildFraction = buildFraction };
var fallback = exe ? null : ProcessCli.Find(AppContext.BaseDirectory) is { } pc ? new CaseOracle(pc, root, TimeSpan.FromSeconds(timeoutS)) { BuildFraction = buildFraction } : null;
var session = new FuzzSession(seeds, oracle, fallback);
var clock = System.Diagnostics.Stopwatch.StartNew();
IEnumerable<int> Bounded()
{
    foreach (int i in indices)
    {
        if (maxMinutes > 0 && clock.Elapsed.TotalMinutes >= maxMinutes)
        {
            stderr.WriteLine($"partforge-fuzz: stopped after {maxMinutes} minutes at case {i}");
            yield break;
        }
        yield return i;
    }
}
var summary = session.Run(seed, Bounded(), (i, o) =>
{
    if (!o.Passed) stderr.WriteLine($"case {i}: {string.Join("; ", o.Violations)}  [{o.Input.Recipe}]");
    if ((i + 1) % 500 == 0) stderr.WriteLine($"... {i + 1} cases");
});
stdout.Write(summary.Format());
if (summary.FailedCases == 0 && work == null)
{
    try { Directory.Delete(root, recursive: true); } catch (IOException) { }
}
else stdout.WriteLine($"  failing case folders kept under {root}");
return summary.FailedCases == 0 ? 0 : 1;
