using System.Text.Json;
using System.Text.Json.Nodes;
using Json.Schema;
using PartForge.Design.Presets;
using PartForge.Design.Schema;
using YamlDotNet.RepresentationModel;

namespace PartForge.Design.Tests.Schema;

/// <summary>The generated schema checked by an independent validator (JsonSchema.Net, draft 2020-12).</summary>
public class DesignSchemaTests
{
    private static readonly JsonSchema Schema = JsonSchema.FromText(DesignSchema.Generate());

    /// <summary>YAML to JSON with YAML 1.2 core-schema scalars (plain numbers and booleans become JSON numbers/booleans).</summary>
    private static JsonNode? ToJson(YamlNode node) => node switch
    {
        YamlMappingNode m => new JsonObject(m.Children.Select(kv => KeyValuePair.Create(((YamlScalarNode)kv.Key).Value!, ToJson(kv.Value)))),
        YamlSequenceNode s => new JsonArray(s.Children.Select(ToJson).ToArray()),
        YamlScalarNode sc when sc.Style == YamlDotNet.Core.ScalarStyle.Plain && long.TryParse(sc.Value, out long l) => JsonValue.Create(l),
        YamlScalarNode sc when sc.Style == YamlDotNet.Core.ScalarStyle.Plain && double.TryParse(sc.Value, System.Globalization.NumberStyles.Float, System.Globalization.CultureInfo.InvariantCulture, out double d) => JsonValue.Create(d),
        YamlScalarNode sc when sc.Style == YamlDotNet.Core.ScalarStyle.Plain && sc.Value is "true" or "false" => JsonValue.Create(sc.Value == "true"),
        YamlScalarNode sc => JsonValue.Create(sc.Value),
        _ => null,
    };

    private static JsonElement Json(string yaml)
    {
        var ys = new YamlStream();
        ys.Load(new StringReader(yaml));
        return JsonSerializer.SerializeToElement(ToJson(ys.Documents[0].RootNode));
    }

    private static EvaluationResults Evaluate(string yaml) => Schema.Evaluate(Json(yaml), new EvaluationOptions { OutputFormat = OutputFormat.List });

    [Fact]
    public void Schema_declares_draft_2020_12_and_forbids_unknown_keys()
    {
        var doc = JsonNode.Parse(DesignSchema.Generate())!;
        Assert.Equal("https://json-schema.org/draft/2020-12/schema", (string?)doc["$schema"]);
        Assert.False((bool)doc["additionalProperties"]!);
        Assert.Equal("integer", (string?)doc["properties"]!["machine"]!["properties"]!["poles"]!["type"]);
        Assert.Equal(0.15, (double)doc["properties"]!["rotor"]!["properties"]!["pocket_clearance"]!["default"]!);
        Assert.Equal(DesignSchema.Generate(), DesignSchema.Generate());
    }

    [Fact]
    public void Every_preset_and_every_init_template_validates()
    {
        foreach (var p in PresetLibrary.All)
        {
            Assert.True(Evaluate(p.Text).IsValid, p.Name);
            Assert.True(Evaluate(DesignTemplate.Render(p)).IsValid, p.Name + " (template)");
        }
    }

    [Theory]
    [InlineData("poles: 12", "pols: 12")]                  // unknown key
    [InlineData("poles: 12", "poles: 12.5")]               // not an integer
    [InlineData("poles: 12", "poles: 400")]                // out of range
    [InlineData("layout: single-rotor", "layout: triple")] // not in the word list
    [InlineData("name: crank-bench", "name: Crank Bench")] // pattern
    [InlineData("pocket_clearance: 0.15", "pocket_clearance: -0.2")]
    [InlineData("shape: disc", "shape: block")]            // block needs length and width, forbids diameter
    public void Bad_designs_fail_the_schema(string from, string to)
    {
        string text = PresetLibrary.Find("crank-bench")!.Text;
        Assert.Contains(from, text);
        Assert.False(Evaluate(text.Replace(from, to)).IsValid, to);
    }

    [Fact]
    public void Missing_required_keys_fail_the_schema()
    {
        Assert.False(Evaluate("machine:\n  poles: 12\n").IsValid);
    }
}
