namespace PartForge.Cli.Hosting;

/// <summary>Process exit codes of the contract.</summary>
public static class ExitCodes
{
    /// <summary>Success; checks passed or only warned.</summary>
    public const int Ok = 0;

    /// <summary>A check failed (the build wrote nothing unless --force).</summary>
    public const int CheckFailed = 1;

    /// <summary>Bad input: a design error, a bad option, an unknown preset, a file that exists.</summary>
    public const int BadInput = 2;

    /// <summary>An internal error (a bug).</summary>
    public const int Internal = 3;
}
