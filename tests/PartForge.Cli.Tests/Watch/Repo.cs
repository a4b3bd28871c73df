namespace PartForge.Cli.Tests.Watch;

/// <summary>The repository root (the folder holding PartForge.sln), found upward from the test assembly.</summary>
internal static class Repo
{
    public static string Root { get; } = Find();

    private static string Find()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir != null && !File.Exists(Path.Combine(dir.FullName, "PartForge.sln"))) dir = dir.Parent;
        return dir!.FullName;
    }
}
