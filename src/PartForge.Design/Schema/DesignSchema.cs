using System.Globalization;
using System.Text;
using System.Text.Json;
using PartForge.Design.Keys;

namespace PartForge.Design.Schema;

/// <summary>
/// JSON Schema (draft 2020-12) of the design file, generated from the same model reflection the loader uses:
/// types, ranges, word lists, patterns, descriptions, defaults, required keys, no unknown keys. A YAML
/// language server can use it for completion and checking in an editor. Rules that involve several keys are
/// expressed where JSON Schema can say them (the size keys of each magnet shape, awg xor diameter); the rest
/// are the loader's.
/// </summary>
public static class DesignSchema
{
    public const string Id = "urn:partforge:design:1";

    /// <summary>The schema as indented JSON text (LF line ends, deterministic).</summary>
    public static string Generate()
    {
        using var ms = new MemoryStream();
        using (var w = new Utf8JsonWriter(ms, new JsonWriterOptions { Indented = true, NewLine = "\n" }))
        {
            w.WriteStartObject();
            w.WriteString("$schema", "https://json-schema.org/draft/2020-12/schema");
            w.WriteString("$id", Id);
            w.WriteString("title", "PartForge design file");
            w.WriteString("description", "Design of a small axial-flux permanent-magnet machine. Lengths in mm, angles in degrees, speeds in rpm.");
            WriteSection(w, SectionSpec.Root, "");
            w.WriteEndObject();
        }
        return Encoding.UTF8.GetString(ms.ToArray()) + "\n";
    }

    private static void WriteSection(Utf8JsonWriter w, SectionSpec spec, string path)
    {
        w.WriteString("type", "object");
        w.WriteBoolean("additionalProperties", false);
        var required = spec.Keys.Where(k => k.IsRequired).Select(k => k.Key).ToArray();
        if (required.Length > 0)
        {
            w.WriteStartArray("required");
            foreach (var r in required) w.WriteStringValue(r);
            w.WriteEndArray();
        }
        w.WriteStartObject("properties");
        foreach (var k in spec.Keys)
        {
            w.WriteStartObject(k.Key);
            if (k.Doc != null) w.WriteString("description", k.Doc);
            if (k.Kind == ValueKind.Section)
            {
                WriteSection(w, k.Section!, path.Length == 0 ? k.Key : path + "." + k.Key);
            }
            else WriteLeaf(w, k);
            w.WriteEndObject();
        }
        w.WriteEndObject();
        WriteConditions(w, path);
    }

    private static void WriteLeaf(Utf8JsonWriter w, KeySpec k)
    {
        string type = k.Kind switch
        {
            ValueKind.Integer => "integer",
            ValueKind.Number => "number",
            ValueKind.Boolean => "boolean",
            _ => "string",
        };
        w.WriteString("type", type);
        if (k.OneOf != null)
        {
            w.WriteStartArray("enum");
            foreach (var v in k.OneOf)
            {
                if (k.Kind == ValueKind.Integer) w.WriteNumberValue(int.Parse(v, CultureInfo.InvariantCulture));
                else w.WriteStringValue(v);
            }
            w.WriteEndArray();
        }
        if (k.PatternText != null) w.WriteString("pattern", k.PatternText);
        if (k.Range is { } r && k.Kind is ValueKind.Integer or ValueKind.Number)
        {
            Number(w, r.MinExclusive ? "exclusiveMinimum" : "minimum", r.Min, k.Kind);
            Number(w, r.MaxExclusive ? "exclusiveMaximum" : "maximum", r.Max, k.Kind);
        }
        switch (k.Default)
        {
            case int i: w.WriteNumber("default", i); break;
            case double d: w.WriteNumber("default", d); break;
            case bool b: w.WriteBoolean("default", b); break;
            case string s: w.WriteString("default", s); break;
        }
    }

    private static void Number(Utf8JsonWriter w, string name, double v, ValueKind kind)
    {
        if (kind == ValueKind.Integer || v == Math.Floor(v) && Math.Abs(v) < 1e15) w.WriteNumber(name, (long)v);
        else w.WriteNumber(name, v);
    }

    /// <summary>Multi-key rules JSON Schema can state.</summary>
    private static void WriteConditions(Utf8JsonWriter w, string path)
    {
        if (path == "magnets")
        {
            var shapes = Machines.Magnets.MagnetShapes.Kinds.Select(k => (Shape: k.Word, Keys: k.Keys)).ToArray();
            var all = Machines.Magnets.MagnetShapes.AllKeys;
            string def = (string)SectionSpec.For(typeof(Model.Magnets)).Find("shape")!.Default!;
            w.WriteStartArray("allOf");
            foreach (var (shape, keys) in shapes)
            {
                w.WriteStartObject();
                w.WriteStartObject("if");
                w.WriteStartObject("properties");
                w.WriteStartObject("shape");
                w.WriteString("const", shape);
                w.WriteEndObject();
                w.WriteEndObject();
                if (shape != def)
                {
                    w.WriteStartArray("required");
                    w.WriteStringValue("shape");
                    w.WriteEndArray();
                }
                w.WriteEndObject();
                w.WriteStartObject("then");
                w.WriteStartArray("required");
                foreach (var k in keys) w.WriteStringValue(k);
                w.WriteEndArray();
                w.WriteStartObject("properties");
                foreach (var k in all.Except(keys)) w.WriteBoolean(k, false);
                w.WriteEndObject();
                w.WriteEndObject();
                w.WriteEndObject();
            }
            w.WriteEndArray();
        }
        else if (path == "coils.wire")
        {
            w.WriteStartArray("oneOf");
            foreach (var k in new[] { "awg", "diameter" })
            {
                w.WriteStartObject();
                w.WriteStartArray("required");
                w.WriteStringValue(k);
                w.WriteEndArray();
                w.WriteEndObject();
            }
            w.WriteEndArray();
        }
    }
}
