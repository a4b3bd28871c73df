namespace PartForge.Checks.Rules;

/// <summary>The electrical engine's diagnostics as checks: errors fail, warnings warn.</summary>
internal static class ElectricalRules
{
    public static IEnumerable<CheckResult> Run(CheckContext c) =>
        c.E.Diagnostics.Select(d => new CheckResult
        {
            Id = $"{CheckIds.Electrical}-{d.Id}", Part = "machine", Status = d.IsError ? CheckStatus.Fail : CheckStatus.Warn,
            Value = 0, Limit = 0, Unit = "", Margin = 0, Message = d.Message, Where = new CheckLocation(d.Key),
            Basis = "electrical engine diagnostic",
        });
}
