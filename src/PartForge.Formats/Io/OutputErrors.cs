using System.Runtime.InteropServices;

namespace PartForge.Formats.Io;

/// <summary>
/// Turns the system's file errors into <see cref="OutputWriteException"/>s with one line that says what to
/// change. On Unix the runtime puts the errno into <see cref="Exception.HResult"/> of a plain
/// <see cref="IOException"/> (checked on Linux: ENOSPC gives HResult 28, EROFS 30, EISDIR 21); permission
/// errors arrive as <see cref="UnauthorizedAccessException"/>, a missing parent as
/// <see cref="DirectoryNotFoundException"/>. On Windows the HResult is 0x8007xxxx with the Win32 error code.
/// </summary>
internal static class OutputErrors
{
    // Linux errno values (asm-generic/errno-base.h and errno.h; macOS differs only in EDQUOT = 69).
    private const int ENOSPC = 28, EROFS = 30, EISDIR = 21, ENOTDIR = 20, EACCES = 13, EPERM = 1, EAGAIN = 11;
    private static readonly int EDQUOT = OperatingSystem.IsMacOS() ? 69 : 122;

    // Win32 error codes: ERROR_HANDLE_DISK_FULL 39, ERROR_DISK_FULL 112, ERROR_WRITE_PROTECT 19,
    // ERROR_SHARING_VIOLATION 32, ERROR_LOCK_VIOLATION 33, ERROR_ACCESS_DENIED 5.
    private static bool Win32(Exception ex, params int[] codes) =>
        OperatingSystem.IsWindows() && (ex.HResult & 0xFFFF0000) == 0x80070000 && codes.Contains(ex.HResult & 0xFFFF);

    /// <summary>The exception for a failed operation on <paramref name="fileName"/> (or the folder itself when null).</summary>
    public static OutputWriteException Classify(Exception ex, string folder, string? fileName)
    {
        if (ex is OutputWriteException own) return own;
        string where = fileName == null ? folder : Path.Combine(folder, fileName);
        int errno = OperatingSystem.IsWindows() ? 0 : ex.HResult;
        if (ex is IOException && (errno == ENOSPC || Win32(ex, 39, 112)))
            return new(OutputProblem.NoSpace, folder, fileName, $"no space left on the device holding {folder}; free space or choose another -o", ex);
        if (ex is IOException && errno == EDQUOT)
            return new(OutputProblem.QuotaExceeded, folder, fileName, $"the disk quota for {folder} is used up; free space or choose another -o", ex);
        if (ex is IOException && (errno == EROFS || Win32(ex, 19)))
            return new(OutputProblem.ReadOnly, folder, fileName, $"{folder} is on a read-only file system; choose another -o", ex);
        if (ex is UnauthorizedAccessException || ex is IOException && errno is EACCES or EPERM)
            return new(OutputProblem.PermissionDenied, folder, fileName, $"permission denied writing {where}; choose a folder you may write to with -o", ex);
        if (ex is IOException && errno == EISDIR)
            return new(OutputProblem.NameTaken, folder, fileName, $"{where} is a folder; an output file cannot replace it (remove it or choose another -o)", ex);
        if (ex is DirectoryNotFoundException || ex is IOException && errno == ENOTDIR)
            return new(OutputProblem.NotAFolder, folder, fileName, $"{folder} cannot be used as a folder (a part of the path is a file or was removed); give a folder with -o", ex);
        if (ex is IOException && (errno == EAGAIN || Win32(ex, 32, 33)))
            return new(OutputProblem.Busy, folder, fileName, $"another build is writing to {folder}; wait for it to finish or choose another -o", ex);
        return new(OutputProblem.Other, folder, fileName, $"cannot write {where}: {ex.Message.ReplaceLineEndings(" ")}; choose another -o", ex);
    }

    /// <summary>True for the exceptions a file system operation throws for a reason outside the program.</summary>
    public static bool IsFileSystem(Exception ex) => ex is IOException or UnauthorizedAccessException;

    /// <summary>
    /// Flushes a folder's entries (the renames and removals in it) to the device, where the system allows it:
    /// fsync on a descriptor of the folder (Linux, macOS). Windows has no such call and journals its metadata;
    /// file systems that refuse fsync on a folder (EINVAL, some network and user-space file systems) give no
    /// such guarantee and are passed over, as the call is then not available at all.
    /// </summary>
    public static void SyncFolder(string fullPath, string folder)
    {
        if (OperatingSystem.IsWindows()) return;
        int fd = Native.open(fullPath, 0 /* O_RDONLY */);
        if (fd < 0)
        {
            int err = Marshal.GetLastPInvokeError();
            throw Classify(new IOException($"cannot open the folder to flush it (errno {err})", err), folder, null);
        }
        try
        {
            if (Native.fsync(fd) != 0)
            {
                int err = Marshal.GetLastPInvokeError();
                const int EINVAL = 22, ENOTSUP = 95, EOPNOTSUPP_MAC = 45;
                if (err is not (EINVAL or ENOTSUP or EOPNOTSUPP_MAC))
                    throw Classify(new IOException($"cannot flush the folder to the device (errno {err})", err), folder, null);
            }
        }
        finally
        {
            // A read-only descriptor of a folder holds no data; closing it cannot lose any.
            _ = Native.close(fd);
        }
    }

    private static class Native
    {
        [DllImport("libc", SetLastError = true)]
        public static extern int open([MarshalAs(UnmanagedType.LPUTF8Str)] string path, int flags);

        [DllImport("libc", SetLastError = true)]
        public static extern int fsync(int fd);

        [DllImport("libc", SetLastError = true)]
        public static extern int close(int fd);
    }
}
