namespace PartForge.Checks.Rules;

/// <summary>The electrical engine's diagnostics as checks (the one place they become check results): errors fail, warnings warn.</summary>
internal static class ElectricalRules
{
    public static IEnumerable<CheckResult> Run(CheckContext c) => Checks(c.E.Diagnostics);

    public static IEnumerable<CheckResult> Checks(IEnumerable<(string Id, bool IsError, string Key, string Message)> diagnostics) =>
        diagnostics.Select(d => new CheckResult
        {
            Id = $"{CheckIds.Electrical}-{d.Id}", Part = null, Status = d.IsError ? CheckStatus.Fail : CheckStatus.Warn,
            Value = 0, Limit = 0, Unit = "", Margin = 0, Message = d.Message, Where = new CheckLocation(d.Key),
            Basis = "electrical engine diagnostic",
        });
}
