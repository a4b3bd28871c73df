namespace PartForge.Formats.Io;

/// <summary>
/// An output set could not be written, for a reason the user can act on (a full disk, a read-only or
/// forbidden folder, a file where a folder should be). <see cref="Exception.Message"/> is one line that says
/// what to change, e.g. "no space left on the device holding out/; free space or choose another -o"; the
/// system's exception is the <see cref="Exception.InnerException"/>. The command line reports it as a user
/// problem (exit 2), not as a bug.
/// </summary>
public sealed class OutputWriteException : Exception
{
    public OutputWriteException(OutputProblem problem, string folder, string? fileName, string message, Exception? inner = null)
        : base(message, inner)
    {
        Problem = problem;
        Folder = folder;
        FileName = fileName;
    }

    /// <summary>What went wrong, as a closed set.</summary>
    public OutputProblem Problem { get; }

    /// <summary>The output folder as the user gave it.</summary>
    public string Folder { get; }

    /// <summary>The output file concerned, or null when the problem is with the folder itself.</summary>
    public string? FileName { get; }
}
