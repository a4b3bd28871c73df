namespace PartForge.Fuzz.Oracle;

/// <summary>One broken promise of the command line for one case, e.g. kind "exit-3" on command "check".</summary>
public sealed record Violation(string Kind, string Command, string Detail)
{
    public override string ToString() => $"{Command}: {Kind}: {Detail}";
}
