using System.Collections.Concurrent;
using System.Reflection;
using PartForge.Design.Model;

namespace PartForge.Design.Keys;

/// <summary>
/// The keys of one section of the design file: the public init properties of one model class, in declaration
/// order. Built once per class from the class's shape (<see cref="ModelShapes"/>, written at compile time) and
/// the attributes on its properties, and cached.
/// </summary>
public sealed class SectionSpec
{
    private static readonly ConcurrentDictionary<Type, SectionSpec> Cache = new();
    private readonly Dictionary<string, KeySpec> _byKey;
    private readonly Func<object> _create;

    private SectionSpec(Type type)
    {
        var shape = ModelShapes.Find(type)
            ?? throw new InvalidOperationException($"{type.Name} is not a class of the design model (reachable from Design through its properties)");
        Type = type;
        Doc = type.GetCustomAttribute<DocAttribute>()?.Text;
        _create = shape.Create;
        var defaults = shape.Create();
        Keys = shape.Properties
            .Select(p => new KeySpec(p.Property, p.IsNullableReference, defaults))
            .ToArray();
        _byKey = Keys.ToDictionary(k => k.Key, StringComparer.Ordinal);
        if (_byKey.Count != Keys.Count) throw new InvalidOperationException($"design model class {type.Name} has two properties with the same key");
    }

    /// <summary>The section of the whole file (the Design class).</summary>
    public static SectionSpec Root => For(typeof(Model.Design));

    public static SectionSpec For(Type type) => Cache.GetOrAdd(type, t => new SectionSpec(t));

    public Type Type { get; }
    public string? Doc { get; }
    public IReadOnlyList<KeySpec> Keys { get; }

    public KeySpec? Find(string key) => _byKey.GetValueOrDefault(key);

    /// <summary>A new instance of the section's class with every default.</summary>
    internal object CreateDefault() => _create();

    /// <summary>
    /// Resolves a dotted key path such as "rotor.bolt_circle.hole" from this section. Returns the spec chain, or
    /// null with the index of the first segment that does not exist.
    /// </summary>
    public IReadOnlyList<KeySpec>? Resolve(string keyPath, out int badSegment)
    {
        var parts = keyPath.Split('.');
        var chain = new List<KeySpec>(parts.Length);
        var section = this;
        for (int i = 0; i < parts.Length; i++)
        {
            var k = section?.Find(parts[i]);
            if (k == null) { badSegment = i; return null; }
            chain.Add(k);
            section = k.Section;
        }
        badSegment = -1;
        return chain;
    }

    /// <summary>Every leaf key path below this section, e.g. "rotor.bolt_circle.hole".</summary>
    public IEnumerable<(string Path, KeySpec Key)> LeafPaths(string prefix = "")
    {
        foreach (var k in Keys)
        {
            string p = prefix.Length == 0 ? k.Key : prefix + "." + k.Key;
            if (k.Kind == ValueKind.Section)
                foreach (var x in k.Section!.LeafPaths(p)) yield return x;
            else yield return (p, k);
        }
    }
}
