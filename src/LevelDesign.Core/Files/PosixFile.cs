using System.Text;
using Tmds.Linux;
using static Tmds.Linux.LibC;

namespace LevelDesign.Core.Files;

/// <summary>
/// The few POSIX calls .NET does not expose: the file type and owner (lstat/stat), fchown, fsync of a directory,
/// access(W_OK) and whether a process is alive. On Linux through Tmds.LibC; elsewhere a weaker answer from
/// System.IO (no owner, devices and FIFOs not told apart from regular files).
/// </summary>
public static unsafe class PosixFile
{
    /// <summary>The status of the path itself (a symbolic link is reported as one).</summary>
    public static FileFacts Lstat(string path) => Status(path, follow: false);

    /// <summary>The status of what the path finally names (links followed); Missing for a dangling link.</summary>
    public static FileFacts Stat(string path) => Status(path, follow: true);

    private static FileFacts Status(string path, bool follow)
    {
        if (!OperatingSystem.IsLinux()) return Portable(path, follow);
        stat st;
        int result;
        fixed (byte* p = Bytes(path)) result = follow ? stat(p, &st) : lstat(p, &st);
        if (result != 0) return FileFacts.Missing;
        int type = (int)st.st_mode & (int)S_IFMT;
        var kind = type == (int)S_IFREG ? FileKind.Regular
            : type == (int)S_IFDIR ? FileKind.Directory
            : type == (int)S_IFLNK ? FileKind.SymbolicLink
            : type == (int)S_IFCHR ? FileKind.CharacterDevice
            : type == (int)S_IFBLK ? FileKind.BlockDevice
            : type == (int)S_IFIFO ? FileKind.Fifo
            : FileKind.Socket;
        return new FileFacts(kind, (int)st.st_mode & 0xFFF, st.st_uid, st.st_gid, st.st_size, st.st_dev, st.st_ino, (long)(ulong)st.st_nlink);
    }

    private static FileFacts Portable(string path, bool follow)
    {
        FileSystemInfo info = Directory.Exists(path) ? new DirectoryInfo(path) : new FileInfo(path);
        if (!follow && info.LinkTarget is not null) return new FileFacts(FileKind.SymbolicLink, 0x1FF, 0, 0, 0, 0, 0);
        if (follow && info.LinkTarget is not null) info = info.ResolveLinkTarget(returnFinalTarget: true) ?? info;
        if (!info.Exists) return FileFacts.Missing;
        int mode = OperatingSystem.IsWindows() ? 0x1B6 : (int)info.UnixFileMode;
        long size = info is FileInfo f ? f.Length : 0;
        return new FileFacts(info is DirectoryInfo ? FileKind.Directory : FileKind.Regular, mode, 0, 0, size, 0, 0);
    }

    /// <summary>Sets the owner of an open file; false (and nothing changed) where the caller may not (EPERM).</summary>
    public static bool TryChown(Microsoft.Win32.SafeHandles.SafeFileHandle handle, uint uid, uint gid)
    {
        if (!OperatingSystem.IsLinux()) return false;
        return fchown((int)handle.DangerousGetHandle(), uid, gid) == 0;
    }

    /// <summary>Flushes a directory's entries (a rename in it) to disk; best effort.</summary>
    public static void SyncDirectory(string directory)
    {
        if (!OperatingSystem.IsLinux()) return;
        int fd;
        fixed (byte* p = Bytes(directory)) fd = open(p, O_RDONLY | O_DIRECTORY | O_CLOEXEC);
        if (fd < 0) return;
        fsync(fd);
        close(fd);
    }

    /// <summary>
    /// Whether this process may write the path, as the kernel judges it (access W_OK): the mode bits for a plain
    /// user, but true for root even without write bits, and false on an immutable file or a read-only mount.
    /// Elsewhere than Linux, the read-only attribute.
    /// </summary>
    public static bool CanWrite(string path)
    {
        if (!OperatingSystem.IsLinux()) return !File.GetAttributes(path).HasFlag(FileAttributes.ReadOnly);
        fixed (byte* p = Bytes(path)) return access(p, W_OK) == 0;
    }

    /// <summary>Whether a process with this id exists (kill with signal 0; EPERM means it exists but is someone else's).</summary>
    public static bool ProcessAlive(int pid)
    {
        if (pid == Environment.ProcessId) return true;
        if (!OperatingSystem.IsLinux()) return true;
        return kill(pid, 0) == 0 || errno == EPERM;
    }

    private static byte[] Bytes(string path) => Encoding.UTF8.GetBytes(path + "\0");
}
