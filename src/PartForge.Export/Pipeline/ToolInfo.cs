using System.Reflection;

namespace PartForge.Export.Pipeline;

/// <summary>The program's version as the manifest records it: the one version of Directory.Build.props, without a source-revision suffix.</summary>
public static class ToolInfo
{
    public static string Version { get; } = Read();

    private static string Read()
    {
        string v = typeof(ToolInfo).Assembly.GetCustomAttribute<AssemblyInformationalVersionAttribute>()?.InformationalVersion
            ?? typeof(ToolInfo).Assembly.GetName().Version?.ToString(3) ?? "0";
        int plus = v.IndexOf('+');
        return plus < 0 ? v : v[..plus];
    }
}
