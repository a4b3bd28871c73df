namespace PartForge.Design.Model;

// Attributes that describe the design file on the model itself, so that the loader, the validator, the JSON
// Schema and the `init` template are all derived from one place. A YAML key is the snake_case form of the
// property name unless [Key] says otherwise.

/// <summary>One-line documentation of a key; shown in the schema and in the `init` template.</summary>
[AttributeUsage(AttributeTargets.Property | AttributeTargets.Class)]
public sealed class DocAttribute(string text) : Attribute
{
    public string Text { get; } = text;
}

/// <summary>Overrides the YAML key derived from the property name.</summary>
[AttributeUsage(AttributeTargets.Property)]
public sealed class KeyAttribute(string name) : Attribute
{
    public string Name { get; } = name;
}

/// <summary>The key must be present in the file.</summary>
[AttributeUsage(AttributeTargets.Property)]
public sealed class RequiredKeyAttribute : Attribute;

/// <summary>Numeric range. Bounds are inclusive unless the matching Exclusive flag is set.</summary>
[AttributeUsage(AttributeTargets.Property)]
public sealed class RangeAttribute(double min, double max) : Attribute
{
    public double Min { get; } = min;
    public double Max { get; } = max;
    public bool MinExclusive { get; init; }
    public bool MaxExclusive { get; init; }
}

/// <summary>A string key that takes one of a fixed set of words.</summary>
[AttributeUsage(AttributeTargets.Property)]
public sealed class OneOfAttribute(params string[] values) : Attribute
{
    public IReadOnlyList<string> Values { get; } = values;
}

/// <summary>A string key that must match a regular expression (described in words in Doc).</summary>
[AttributeUsage(AttributeTargets.Property)]
public sealed class PatternAttribute(string regex) : Attribute
{
    public string Regex { get; } = regex;
}
