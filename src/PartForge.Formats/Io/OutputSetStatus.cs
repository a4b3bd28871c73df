namespace PartForge.Formats.Io;

/// <summary>
/// The result of checking a folder's output set against its manifest. <see cref="ToString"/> is the one line to
/// show: "complete", or "incomplete: crank-bench-rotor.stl differs, crank-bench.3mf is missing".
/// </summary>
public sealed class OutputSetStatus
{
    internal OutputSetStatus(IReadOnlyList<string> problems, OutputManifest? manifest)
    {
        Problems = problems;
        Manifest = manifest;
    }

    /// <summary>True when the manifest exists and every file it lists is there with its size and SHA-256.</summary>
    public bool Complete => Problems.Count == 0;

    /// <summary>What is wrong, one short phrase each, in manifest order; empty when complete.</summary>
    public IReadOnlyList<string> Problems { get; }

    /// <summary>The manifest that was read, or null when there is none or it cannot be read.</summary>
    public OutputManifest? Manifest { get; }

    public override string ToString() => Complete ? "complete" : "incomplete: " + string.Join(", ", Problems);
}
