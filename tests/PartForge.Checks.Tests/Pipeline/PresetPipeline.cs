using PartForge.Design.Loading;
using PartForge.Electrical;
using PartForge.Geometry;
using PartForge.Parts;

namespace PartForge.Checks.Tests.Pipeline;

/// <summary>Runs the real stages (loader, electrical engine, part builders) on a preset for the checker tests.</summary>
internal static class PresetPipeline
{
    public static string PresetsDir
    {
        get
        {
            var dir = new DirectoryInfo(AppContext.BaseDirectory);
            while (dir is not null && !Directory.Exists(Path.Combine(dir.FullName, "presets"))) dir = dir.Parent;
            return dir is null ? throw new DirectoryNotFoundException("presets/") : Path.Combine(dir.FullName, "presets");
        }
    }

    public static IEnumerable<string> PresetNames() =>
        Directory.GetFiles(PresetsDir, "*.yaml").Select(Path.GetFileNameWithoutExtension).OrderBy(n => n, StringComparer.Ordinal)!;

    public static Design.Model.Design Load(string preset, params (string Key, string Value)[] overrides)
    {
        var path = Path.Combine(PresetsDir, preset + ".yaml");
        var r = DesignLoader.LoadText(File.ReadAllText(path), path, overrides);
        if (r.Design is null) throw new InvalidOperationException(string.Join("; ", r.Errors.Select(e => e.ToString())));
        return r.Design;
    }

    public static (ElectricalResult E, PartSet Parts) Stages(Design.Model.Design d)
    {
        var e = ElectricalEngine.Evaluate(PartForge.Design.Machines.MachineModel.From(d));
        var parts = PartsBuilder.Build(PartForge.Design.Machines.MachineModel.From(d), e, Precision.FromChordalTolerance(d.Mesh.ChordalTolerance));
        return (e, parts);
    }

    public static CheckReport Check(Design.Model.Design d, CheckOptions? options = null)
    {
        var (e, parts) = Stages(d);
        return CheckRunner.Run(PartForge.Design.Machines.MachineModel.From(d), e, parts, options);
    }
}
