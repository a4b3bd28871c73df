namespace PartForge.Export.Report;

/// <summary>One labelled value of a summary table; Key is the results-document key when there is one.</summary>
public sealed record ReportRow(string Label, string Value, string Unit, string Key = "");
