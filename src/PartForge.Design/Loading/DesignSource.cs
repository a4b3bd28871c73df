using PartForge.Design.Keys;

namespace PartForge.Design.Loading;

/// <summary>
/// A design file parsed once (YAML syntax checked, limits enforced), ready to be mapped and validated, with or
/// without overrides, any number of times and from several threads at once. Sweeps parse once and call
/// <see cref="Load(IReadOnlyList{DesignOverride})"/> per variant.
/// </summary>
public sealed class DesignSource
{
    private readonly YMapping? _root;
    private readonly IReadOnlyList<DesignError> _parseErrors;

    internal DesignSource(string fileName, YMapping? root, IReadOnlyList<DesignError> parseErrors)
    {
        FileName = fileName;
        _root = root;
        _parseErrors = parseErrors;
    }

    /// <summary>The name errors are reported under.</summary>
    public string FileName { get; }

    /// <summary>Errors found before mapping (missing file, syntax, limits); empty when the YAML is readable.</summary>
    public IReadOnlyList<DesignError> ParseErrors => _parseErrors;

    /// <summary>Maps and validates the design as written.</summary>
    public DesignLoadResult Load() => Load([]);

    /// <summary>Maps and validates the design with the given keys replaced (or added) first.</summary>
    public DesignLoadResult Load(IReadOnlyList<DesignOverride> overrides)
    {
        if (_root == null) return DesignLoadResult.Failed(_parseErrors);
        var ctx = new MapContext(FileName);
        var root = _root;
        foreach (var o in overrides)
        {
            var applied = ApplyOverride(root, o, ctx);
            if (applied != null) root = applied;
        }
        var design = (Model.Design)NodeMapper.MapSection(SectionSpec.Root, root, "", ctx);
        // The rules run beside the mapping errors (each leaves out what it would judge on a key that failed to
        // map), so one run reports every mistake; they are listed in file order, unplaced ones last.
        DesignRules.Apply(design, ctx);
        if (ctx.Errors.Count > 0)
        {
            var errs = InFileOrder(ctx.Errors);
            if (errs.Count > LoadLimits.MaxErrors)
            {
                int more = errs.Count - LoadLimits.MaxErrors;
                errs = errs.Take(LoadLimits.MaxErrors).ToList();
                errs.Add(new DesignError { File = FileName, Message = $"and {more} more errors", Kind = "limit" });
            }
            return DesignLoadResult.Failed(errs);
        }
        return DesignLoadResult.Ok(design, Machines.MachineModel.From(design));
    }

    /// <summary>Errors by line and column (stable), those without a place in the file (overrides, whole file) last.</summary>
    private static List<DesignError> InFileOrder(List<DesignError> errors) =>
        errors.Select((e, i) => (e, i))
            .OrderBy(x => x.e.Line > 0 ? 0 : 1).ThenBy(x => x.e.Line).ThenBy(x => x.e.Column).ThenBy(x => x.i)
            .Select(x => x.e).ToList();

    /// <summary>Checks that a key path names a key of the design file; null if it does, else the error.</summary>
    public static DesignError? CheckKeyPath(string keyPath, string fileName = "override")
    {
        var ctx = new MapContext(fileName);
        return ResolvePath(keyPath, ctx) == null ? ctx.Errors[0] : null;
    }

    private static IReadOnlyList<KeySpec>? ResolvePath(string keyPath, MapContext ctx)
    {
        var chain = SectionSpec.Root.Resolve(keyPath, out int bad);
        if (chain == null)
        {
            var parts = keyPath.Split('.');
            var section = SectionSpec.Root;
            for (int i = 0; i < bad; i++) section = section.Find(parts[i])!.Section!;
            string prefix = string.Join('.', parts.Take(bad));
            string? near = bad < parts.Length && parts[bad].Length > 0 ? KeySuggester.ForKey(parts[bad], section, prefix) : null;
            ctx.Add(new DesignError
            {
                File = ctx.File, KeyPath = keyPath, FromOverride = true, Kind = "unknown-key",
                Message = bad == 0 ? "is not a known key" : $"'{parts[bad]}' is not a key of {prefix}",
                Allowed = "keys here: " + string.Join(", ", section.Keys.Select(k => k.Key)),
                Suggestion = near,
            });
            return null;
        }
        if (chain[^1].Kind == ValueKind.Section)
        {
            ctx.Add(new DesignError
            {
                File = ctx.File, KeyPath = keyPath, FromOverride = true, Kind = "type",
                Message = "is a section; give a key inside it",
                Allowed = "keys here: " + string.Join(", ", chain[^1].Section!.Keys.Select(k => keyPath + "." + k.Key)),
            });
            return null;
        }
        return chain;
    }

    private static YMapping? ApplyOverride(YMapping root, DesignOverride o, MapContext ctx)
    {
        if (ResolvePath(o.KeyPath, ctx) == null) return null;
        var value = new YScalar(o.Value.Trim(), false, 0, 0) { FromOverride = true };
        return Replace(root, o.KeyPath.Split('.'), 0, value);
    }

    /// <summary>Copy-on-write replacement of one key's value along a path; the original tree is shared, never changed.</summary>
    private static YMapping Replace(YMapping map, string[] parts, int i, YScalar value)
    {
        var entries = map.Entries.ToList();
        int idx = entries.FindIndex(e => e.Key is YScalar k && k.Text == parts[i]);
        YNode newValue;
        if (i == parts.Length - 1) newValue = value;
        else
        {
            var child = idx >= 0 && entries[idx].Value is YMapping cm ? cm : new YMapping([], 0, 0) { FromOverride = true };
            newValue = Replace(child, parts, i + 1, value);
        }
        if (idx >= 0) entries[idx] = entries[idx] with { Value = newValue };
        else entries.Add(new YEntry(new YScalar(parts[i], false, 0, 0) { FromOverride = true }, newValue));
        return map with { Entries = entries };
    }
}
