namespace PartForge.Export.Report;

/// <summary>A plain table for the report (winding table, part list): headers and rows of cell text.</summary>
public sealed record ReportTable(string Title, IReadOnlyList<string> Headers, IReadOnlyList<IReadOnlyList<string>> Rows);
