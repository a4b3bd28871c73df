namespace PartForge.Formats.Tests.Stl;

/// <summary>A fact that is skipped, with the reason, only when the external reference reader is not installed.</summary>
public sealed class ReaderFactAttribute : FactAttribute
{
    public ReaderFactAttribute(string executable, string? pythonModule = null)
    {
        if (!File.Exists(executable)) Skip = $"reference reader {executable} is not installed (the test script installs it with apt-get)";
        else if (pythonModule is not null && !ExternalTool.PythonHas(pythonModule))
            Skip = $"python module '{pythonModule}' is not installed for {executable} (apt-get install python3-{pythonModule})";
    }
}
