using System.Security.Cryptography;

namespace PartForge.Formats.Io;

/// <summary>
/// Checks an output folder against the manifest of one design (<c>&lt;design&gt;-manifest.json</c>): the set is
/// complete when the manifest is there and readable and every file it lists has the listed size and SHA-256.
/// Files the manifest does not list (other designs' outputs, the user's own files) are not looked at.
/// </summary>
public static class OutputSetCheck
{
    /// <summary>
    /// The state of <paramref name="designName"/>'s set in <paramref name="folder"/>. With
    /// <paramref name="designSha256"/> it also tells whether the set was made from that design file.
    /// Never throws for what is in the folder; a problem reading a file is reported as that file's problem.
    /// </summary>
    public static OutputSetStatus Verify(string folder, string designName, string? designSha256 = null)
    {
        string manifestName = OutputManifest.FileNameFor(designName);
        string manifestPath = Path.Combine(folder, manifestName);
        if (!File.Exists(manifestPath))
            return new([$"no {manifestName} (the set was never completed, or a build is writing it or stopped part-way)"], null);
        OutputManifest manifest;
        try
        {
            manifest = OutputManifest.Parse(File.ReadAllBytes(manifestPath));
        }
        catch (Exception ex) when (ex is FormatException or IOException or UnauthorizedAccessException)
        {
            return new([$"{manifestName} {(ex is FormatException ? ex.Message : "cannot be read: " + ex.Message.ReplaceLineEndings(" "))}"], null);
        }
        var problems = new List<string>();
        if (designSha256 != null && !string.Equals(designSha256, manifest.DesignSha256, StringComparison.OrdinalIgnoreCase))
            problems.Add("it was made from another design file (its design_sha256 differs)");
        foreach (var f in manifest.Files)
        {
            string path = Path.Combine(folder, f.Name);
            if (Directory.Exists(path)) { problems.Add($"{f.Name} is a folder"); continue; }
            if (!File.Exists(path)) { problems.Add($"{f.Name} is missing"); continue; }
            try
            {
                using var fs = new FileStream(path, FileMode.Open, FileAccess.Read, FileShare.ReadWrite | FileShare.Delete, 1 << 16, FileOptions.SequentialScan);
                if (fs.Length != f.SizeBytes || !string.Equals(Convert.ToHexStringLower(SHA256.HashData(fs)), f.Sha256, StringComparison.OrdinalIgnoreCase))
                    problems.Add($"{f.Name} differs");
            }
            catch (Exception ex) when (ex is IOException or UnauthorizedAccessException)
            {
                problems.Add($"{f.Name} cannot be read ({ex.Message.ReplaceLineEndings(" ")})");
            }
        }
        return new(problems, manifest);
    }
}
