using System.Runtime.CompilerServices;

namespace PartForge.Formats.Tests.Golden;

/// <summary>
/// Small expected files stored beside the tests, compared byte for byte. To regenerate them on purpose
/// (after an intended format change), run the tests with PF_REGENERATE_GOLDEN=1 and review the diff.
/// </summary>
internal static class GoldenFile
{
    public const string RegenerateVariable = "PF_REGENERATE_GOLDEN";

    public static void AssertMatches(string name, byte[] actual)
    {
        string path = Path.Combine(Folder(), name);
        if (Environment.GetEnvironmentVariable(RegenerateVariable) == "1")
        {
            File.WriteAllBytes(path, actual);
            return;
        }
        Assert.True(File.Exists(path), $"golden file {path} is missing; run once with {RegenerateVariable}=1 to create it");
        byte[] expected = File.ReadAllBytes(path);
        if (expected.AsSpan().SequenceEqual(actual)) return;
        int at = 0;
        while (at < expected.Length && at < actual.Length && expected[at] == actual[at]) at++;
        string Around(byte[] b) => System.Text.Encoding.UTF8.GetString(b, Math.Max(0, at - 60), Math.Min(b.Length, at + 60) - Math.Max(0, at - 60));
        Assert.Fail($"{name} differs from the golden file at byte {at} (expected {expected.Length} bytes, got {actual.Length}).\n" +
                    $"expected: ...{Around(expected)}...\nactual:   ...{Around(actual)}...");
    }

    private static string Folder([CallerFilePath] string here = "")
    {
        string beside = Path.GetDirectoryName(here) ?? "";
        if (Directory.Exists(beside)) return beside;
        // Built elsewhere: walk up from the test output to the repository's test folder.
        for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
        {
            string candidate = Path.Combine(dir.FullName, "tests", "PartForge.Formats.Tests", "Golden");
            if (Directory.Exists(candidate)) return candidate;
        }
        throw new DirectoryNotFoundException("cannot find tests/PartForge.Formats.Tests/Golden");
    }
}
