namespace PartForge.Formats.Io;

/// <summary>Why an output set could not be written: each kind has its own one-line message and fix.</summary>
public enum OutputProblem
{
    /// <summary>The device holding the folder is full (ENOSPC, or a full disk on Windows).</summary>
    NoSpace,

    /// <summary>The user's disk quota is used up (EDQUOT).</summary>
    QuotaExceeded,

    /// <summary>The folder is on a file system mounted read-only (EROFS).</summary>
    ReadOnly,

    /// <summary>The folder, or a file in it, may not be written by this user (EACCES, EPERM).</summary>
    PermissionDenied,

    /// <summary>The folder path, or one of its parents, is a file.</summary>
    NotAFolder,

    /// <summary>The folder is inside a kernel file system (/proc, /sys) that holds no ordinary files.</summary>
    VirtualFileSystem,

    /// <summary>A folder stands where an output file would go.</summary>
    NameTaken,

    /// <summary>Another build holds the folder's lock file.</summary>
    Busy,

    /// <summary>Any other input/output error; the message carries the system's own words.</summary>
    Other,
}
