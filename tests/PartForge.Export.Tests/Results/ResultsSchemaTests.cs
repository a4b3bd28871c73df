using System.Text.Json.Nodes;
using Json.Schema;
using PartForge.Design.Loading;
using PartForge.Export.Pipeline;
using PartForge.Export.Results;
using ReportPipeline = PartForge.Export.Tests.Report.Pipeline;

namespace PartForge.Export.Tests.Results;

/// <summary>Every results document the tool writes validates against its published JSON Schema (checked by an
/// independent validator, JsonSchema.Net, draft 2020-12), and the schema is strict enough to catch a stray key.</summary>
public class ResultsSchemaTests
{
    private static readonly JsonSchema Schema = JsonSchema.FromText(ResultsSchema.Text);

    private static EvaluationResults Check(string json) =>
        Schema.Evaluate(System.Text.Json.JsonDocument.Parse(json).RootElement, new EvaluationOptions { OutputFormat = OutputFormat.List });

    private static string Errors(EvaluationResults r) =>
        string.Join("; ", (r.Details ?? []).Where(d => d.Errors is { Count: > 0 }).Take(8).Select(d => d.InstanceLocation + ": " + string.Join(", ", d.Errors!.Values)));

    public static IEnumerable<object[]> Presets() => ReportPipeline.Presets();

    [Theory]
    [MemberData(nameof(Presets))]
    public void Every_presets_results_document_validates(string preset)
    {
        var doc = ResultsBuilder.Build(ReportPipeline.Evaluate(preset));
        var r = Check(ResultsJson.Serialize(doc));
        Assert.True(r.IsValid, preset + ": " + Errors(r));
        // A document of a build that did not measure the parts validates too.
        Assert.True(Check(ResultsJson.Serialize(ResultsBuilder.Build(ReportPipeline.Evaluate(preset), countTriangles: false))).IsValid, preset + " (not measured)");
    }

    [Fact]
    public void A_machine_whose_coil_cannot_be_resolved_gives_a_valid_document()
    {
        // Invented: a keystone window wider than the pitch diameter: the electrical engine refuses the coil.
        string text = File.ReadAllText(Path.Combine(ReportPipeline.RepoRoot(), "presets", "wind-duo.yaml")).Replace("core: { width: 6 }", "core: { width: 130 }");
        var loaded = DesignLoader.LoadText(text, "w.yaml");
        Assert.True(loaded.Success, string.Join("; ", loaded.Errors));
        var ev = Stages.Evaluate(loaded.Machine!);
        Assert.Null(ev.Parts);
        var r = Check(ResultsJson.Serialize(ResultsBuilder.Build(ev)));
        Assert.True(r.IsValid, Errors(r));
    }

    [Fact]
    public void The_schema_refuses_a_key_it_does_not_describe()
    {
        string json = ResultsJson.Serialize(ResultsBuilder.Build(ReportPipeline.Evaluate("crank-bench")));
        var node = JsonNode.Parse(json)!;
        node["electrical"]!["phase"]!["unexpected_v"] = 1;
        Assert.False(Check(node.ToJsonString()).IsValid);
        node = JsonNode.Parse(json)!;
        node["checks"]![0]!.AsObject().Remove("counterpart");
        Assert.False(Check(node.ToJsonString()).IsValid);
    }
}
