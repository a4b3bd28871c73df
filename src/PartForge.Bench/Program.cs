using System.Diagnostics;
using System.Globalization;
using System.Reflection;
using PartForge.Bench;

// partforge-bench [--list] [--runs N] [NAME...]
// Runs each case once to warm up, then N timed runs (default 20); prints min, median and max wall time.
var names = new List<string>();
int runs = 20;
bool list = false;
for (int i = 0; i < args.Length; i++)
{
    if (args[i] == "--list") list = true;
    else if (args[i] == "--runs" && i + 1 < args.Length && int.TryParse(args[++i], NumberStyles.Integer, CultureInfo.InvariantCulture, out int r) && r > 0) runs = r;
    else if (args[i].StartsWith('-')) { Console.Error.WriteLine($"partforge-bench: unknown option {args[i]}"); return 2; }
    else names.Add(args[i]);
}

var cases = Assembly.GetExecutingAssembly().GetTypes()
    .Where(t => typeof(IBenchCase).IsAssignableFrom(t) && t is { IsClass: true, IsAbstract: false })
    .Select(t => (IBenchCase)Activator.CreateInstance(t)!)
    .OrderBy(c => c.Name, StringComparer.Ordinal)
    .ToList();

if (list)
{
    foreach (var c in cases) Console.WriteLine($"{c.Name,-24} {c.Description}");
    return 0;
}

var unknown = names.Where(n => cases.All(c => c.Name != n)).ToList();
if (unknown.Count > 0)
{
    foreach (var n in unknown) Console.Error.WriteLine($"partforge-bench: no case named '{n}' (see --list)");
    return 2;
}

var inv = CultureInfo.InvariantCulture;
Console.WriteLine($"# {Environment.ProcessorCount} cores, .NET {Environment.Version}, {runs} timed runs after one warm-up");
foreach (var c in cases.Where(c => names.Count == 0 || names.Contains(c.Name)))
{
    c.Setup();
    var figures = c.Run();
    var times = new double[runs];
    for (int i = 0; i < runs; i++)
    {
        var sw = Stopwatch.StartNew();
        figures = c.Run();
        times[i] = sw.Elapsed.TotalMilliseconds;
    }
    Array.Sort(times);
    string extra = string.Join(", ", figures.Select(kv => $"{kv.Key} {kv.Value.ToString("G6", inv)}"));
    Console.WriteLine(string.Create(inv, $"{c.Name,-24} min {times[0],9:F2} ms  median {times[runs / 2],9:F2} ms  max {times[^1],9:F2} ms  {extra}"));
}
return 0;
