namespace PartForge.Export.Report;

/// <summary>One row of the check table: as the checker reported it, in its units.</summary>
public sealed record ReportCheck(string Id, string Part, string Status, double Value, double Limit, string Unit, double Margin, string Message, string Basis, string Counterpart = "");
