using PartForge.Design.Loading;
using PartForge.Export.Pipeline;

namespace PartForge.Export.Tests.Report;

/// <summary>Carries a bundled preset through the stages, as the build command does.</summary>
internal static class Pipeline
{
    public static string RepoRoot()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir != null && !File.Exists(Path.Combine(dir.FullName, "PartForge.sln"))) dir = dir.Parent;
        return dir!.FullName;
    }

    private static readonly Dictionary<string, Evaluation> Cache = new();

    public static Evaluation Evaluate(string preset)
    {
        lock (Cache)
        {
            if (Cache.TryGetValue(preset, out var ev)) return ev;
            var loaded = DesignLoader.Load(Path.Combine(RepoRoot(), "presets", preset + ".yaml"));
            Assert.True(loaded.Success, string.Join("; ", loaded.Errors));
            var d = loaded.Design!;
            ev = BuildPipeline.Evaluate(PartForge.Design.Machines.MachineModel.From(d));
            Assert.NotNull(ev.Parts);
            Cache[preset] = ev;
            return ev;
        }
    }

    /// <summary>The preset's design file as written (the values a builder measures against).</summary>
    public static Design.Model.Design Design(string preset)
    {
        var loaded = DesignLoader.Load(Path.Combine(RepoRoot(), "presets", preset + ".yaml"));
        Assert.True(loaded.Success, string.Join("; ", loaded.Errors));
        return loaded.Design!;
    }

    public static IEnumerable<object[]> Presets() =>
        Directory.GetFiles(Path.Combine(RepoRoot(), "presets"), "*.yaml").Select(f => new object[] { Path.GetFileNameWithoutExtension(f) }).OrderBy(a => (string)a[0], StringComparer.Ordinal);
}
