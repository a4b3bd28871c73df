namespace PartForge.Checks;

/// <summary>Outcome of one check. Ordered by severity so that the worst of several is the maximum.</summary>
public enum CheckStatus
{
    Pass = 0,
    Warn = 1,
    Fail = 2,
}
