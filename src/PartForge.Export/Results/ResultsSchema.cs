namespace PartForge.Export.Results;

/// <summary>
/// The JSON Schema (draft 2020-12) of the results document, kept beside the writer (Results/results.schema.json,
/// embedded). Strict: no key the writer does not write, so a new key needs its line in the schema (a test
/// validates every preset's document against it). <c>partforge schema --results</c> prints it.
/// </summary>
public static class ResultsSchema
{
    public const string Id = "urn:partforge:results:1";

    private static readonly Lazy<string> Loaded = new(() =>
    {
        using var s = typeof(ResultsSchema).Assembly.GetManifestResourceStream("results.schema.json")
            ?? throw new InvalidOperationException("the results schema is not embedded in the assembly");
        using var r = new StreamReader(s);
        return r.ReadToEnd().Replace("\r\n", "\n");
    });

    /// <summary>The schema text (LF line ends).</summary>
    public static string Text => Loaded.Value;
}
