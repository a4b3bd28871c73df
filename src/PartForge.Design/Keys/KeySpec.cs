using System.Globalization;
using System.Reflection;
using System.Text.RegularExpressions;
using PartForge.Design.Model;

namespace PartForge.Design.Keys;

/// <summary>
/// One key of the design file, derived by reflection from a property of the design model and its attributes
/// (see Model/Annotations.cs). The loader, the JSON Schema and the `init` template all read these, so adding a
/// key to the file is adding a property to the model.
/// </summary>
public sealed class KeySpec
{
    private static readonly Regex UnitFromDoc = new(@",\s*(mm|rpm|V rms|V|ohm|C|degrees|electrical degrees)(\.|\s*\(|;)", RegexOptions.CultureInvariant);

    internal KeySpec(PropertyInfo property, bool isNullableReference, object defaults)
    {
        Property = property;
        Key = property.GetCustomAttribute<KeyAttribute>()?.Name ?? SnakeCase(property.Name);
        var type = property.PropertyType;
        var under = Nullable.GetUnderlyingType(type);
        IsOptional = under != null || (!type.IsValueType && isNullableReference);
        ClrType = under ?? type;
        Kind = ClrType == typeof(int) ? ValueKind.Integer
            : ClrType == typeof(double) ? ValueKind.Number
            : ClrType == typeof(string) ? ValueKind.Text
            : ClrType == typeof(bool) ? ValueKind.Boolean
            : ClrType.IsClass ? ValueKind.Section
            : throw new InvalidOperationException($"design model property {property.DeclaringType?.Name}.{property.Name} has an unsupported type {type.Name}");
        IsRequired = property.GetCustomAttribute<RequiredKeyAttribute>() != null;
        Range = property.GetCustomAttribute<RangeAttribute>();
        OneOf = property.GetCustomAttribute<OneOfAttribute>()?.Values;
        var pattern = property.GetCustomAttribute<PatternAttribute>()?.Regex;
        PatternText = pattern;
        Pattern = pattern == null ? null : new Regex(pattern, RegexOptions.CultureInvariant, TimeSpan.FromSeconds(1));
        Doc = property.GetCustomAttribute<DocAttribute>()?.Text ?? ClrType.GetCustomAttribute<DocAttribute>()?.Text;
        Default = Kind == ValueKind.Section ? null : property.GetValue(defaults);
        if (Doc != null && (Kind == ValueKind.Number || Kind == ValueKind.Integer))
        {
            var m = UnitFromDoc.Match(Doc);
            if (m.Success) Unit = m.Groups[1].Value;
        }
    }

    /// <summary>The YAML key (snake_case of the property name unless [Key] says otherwise).</summary>
    public string Key { get; }

    /// <summary>The model property the key maps to.</summary>
    public PropertyInfo Property { get; }

    /// <summary>The property type without Nullable&lt;&gt;.</summary>
    public Type ClrType { get; }

    public ValueKind Kind { get; }

    /// <summary>Nullable in the model: the key may be left out and then stays null ("none" / "derived").</summary>
    public bool IsOptional { get; }

    /// <summary>The key must be present in the file.</summary>
    public bool IsRequired { get; }

    public RangeAttribute? Range { get; }
    public IReadOnlyList<string>? OneOf { get; }
    public Regex? Pattern { get; }
    public string? PatternText { get; }
    public string? Doc { get; }

    /// <summary>The value a key takes when the file leaves it out (null for sections and nullable keys without one).</summary>
    public object? Default { get; }

    /// <summary>Unit of a numeric key, taken from its documentation (", mm." etc.), or null.</summary>
    public string? Unit { get; }

    /// <summary>The nested section, for Kind == Section.</summary>
    public SectionSpec? Section => Kind == ValueKind.Section ? SectionSpec.For(ClrType) : null;

    /// <summary>"what is allowed", in words, e.g. "0 to 5 mm", "one of: disc, block, arc".</summary>
    public string AllowedText()
    {
        string unit = Unit == null ? "" : " " + Unit;
        if (OneOf != null) return "one of: " + string.Join(", ", OneOf);
        if (Pattern != null) return Doc ?? ("text matching " + PatternText);
        switch (Kind)
        {
            case ValueKind.Boolean: return "true or false";
            case ValueKind.Section: return "a section of keys";
            case ValueKind.Text: return "text";
        }
        string whole = Kind == ValueKind.Integer ? "a whole number " : "";
        if (Range == null) return Kind == ValueKind.Integer ? "a whole number" : "a finite number";
        string lo = Format(Range.Min), hi = Format(Range.Max);
        if (Range.Min == Range.Max) return whole + lo + unit;
        if (Range.MinExclusive && Range.MaxExclusive) return $"{whole}more than {lo} and less than {hi}{unit}";
        if (Range.MinExclusive) return $"{whole}more than {lo}, up to {hi}{unit}";
        if (Range.MaxExclusive) return $"{whole}{lo} or more, less than {hi}{unit}";
        return $"{whole}{lo} to {hi}{unit}";
    }

    /// <summary>True when the number lies in the key's range.</summary>
    public bool InRange(double value)
    {
        if (!double.IsFinite(value)) return false;
        if (Range == null) return true;
        bool lo = Range.MinExclusive ? value > Range.Min : value >= Range.Min;
        bool hi = Range.MaxExclusive ? value < Range.Max : value <= Range.Max;
        return lo && hi;
    }

    /// <summary>Invariant, round-trip, no exponent for ordinary magnitudes.</summary>
    public static string Format(double v)
    {
        if (double.IsNaN(v)) return ".nan";
        if (double.IsPositiveInfinity(v)) return ".inf";
        if (double.IsNegativeInfinity(v)) return "-.inf";
        string r = v.ToString("R", CultureInfo.InvariantCulture);
        if (r.Contains('E') && Math.Abs(v) >= 1e-6 && Math.Abs(v) < 1e15) r = v.ToString("0.###############", CultureInfo.InvariantCulture);
        return r;
    }

    /// <summary>PitchRadius -> pitch_radius.</summary>
    public static string SnakeCase(string name)
    {
        var sb = new System.Text.StringBuilder(name.Length + 4);
        for (int i = 0; i < name.Length; i++)
        {
            char c = name[i];
            if (char.IsUpper(c))
            {
                if (i > 0) sb.Append('_');
                sb.Append(char.ToLowerInvariant(c));
            }
            else sb.Append(c);
        }
        return sb.ToString();
    }

    public override string ToString() => Key;
}
