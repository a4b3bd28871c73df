namespace PartForge.Checks.Rules;

/// <summary>The electrical engine's diagnostics as checks (the one place they become check results): errors fail, warnings warn.</summary>
internal static class ElectricalRules
{
    public static IEnumerable<CheckResult> Run(CheckContext c) => Checks(c.E.Diagnostics);

    public static IEnumerable<CheckResult> Checks(IEnumerable<(string Id, bool IsError, string Key, string Message, PartForge.Electrical.DiagnosticMeasure? Measure)> diagnostics) =>
        diagnostics.Select(d => new CheckResult
        {
            Id = $"{CheckIds.Electrical}-{d.Id}", Part = null, Status = d.IsError ? CheckStatus.Fail : CheckStatus.Warn,
            Value = d.Measure?.Value ?? 0, Limit = d.Measure?.Limit ?? 0, Unit = d.Measure?.Unit ?? "", Margin = d.Measure?.Margin ?? 0,
            Measured = d.Measure != null, Message = d.Message, Where = new CheckLocation(d.Key),
            Basis = "electrical engine diagnostic",
        });
}
