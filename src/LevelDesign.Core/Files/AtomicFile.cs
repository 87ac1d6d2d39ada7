using System.Text;
using System.Text.RegularExpressions;

namespace LevelDesign.Core.Files;

/// <summary>
/// The one writer of every file this tool produces (device saves, --out, exports, the autosave). A regular file is
/// replaced so that at every instant the directory holds a complete file and a complete backup: the new text goes
/// to a temporary created exclusively (O_CREAT|O_EXCL: never through a planted link) in the same directory,
/// flushed, given the old file's mode and owner, and renamed over the file; the previous version is copied the same
/// way (temporary, flush, rename) to PATH.bak first. A file with other hard links is written in place instead (a
/// rename would detach it from them), once its complete backup is on disk. A character device or FIFO the user
/// names is written into, like stdout, and never replaced or backed up. Temporaries left by a killed run of this
/// tool are removed on the next write beside them.
/// </summary>
public static class AtomicFile
{
    /// <summary>Ending of this tool's temporaries: .NAME.PID.RANDOM.ldtmp (the process id tells a stale one).</summary>
    public const string TemporarySuffix = ".ldtmp";

    /// <summary>Age after which a temporary of an earlier version (no process id in its name) is taken as left by a killed save.</summary>
    public static readonly TimeSpan OldTemporaryAge = TimeSpan.FromMinutes(1);

    public static void Write(string path, string text, AtomicWrite? how = null) => Write(path, new UTF8Encoding(false).GetBytes(text), how);

    public static void Write(string path, byte[] bytes, AtomicWrite? how = null)
    {
        how ??= AtomicWrite.UserFile;
        var (target, facts) = Destination(path, how);
        if (facts.Kind is FileKind.CharacterDevice or FileKind.Fifo && how.FollowLinks) WriteInto(path, target, bytes);
        else Replace(path, target, facts, bytes, how);
    }

    /// <summary>
    /// Checks a destination before any work is done: null when it can be written, else the reason, naming the path as
    /// given (a missing or unwritable directory, a directory, a block device, a read-only file, a dangling link).
    /// </summary>
    public static string? Problem(string path, AtomicWrite? how = null)
    {
        how ??= AtomicWrite.UserFile;
        try
        {
            var (target, facts) = Destination(path, how);
            if (facts.Kind is FileKind.Missing or FileKind.Regular) ProbeDirectory(path, Directory(target));
            return null;
        }
        catch (FileWriteException e)
        {
            return e.Message;
        }
    }

    /// <summary>Whether two paths name the same file (same device and inode, links followed).</summary>
    public static bool SameFile(string a, string b)
    {
        var fa = PosixFile.Stat(a);
        var fb = PosixFile.Stat(b);
        if (fa.Inode != 0 && fb.Inode != 0) return fa.SameFileAs(fb);
        return string.Equals(System.IO.Path.GetFullPath(a), System.IO.Path.GetFullPath(b), StringComparison.Ordinal);
    }

    /// <summary>Whether the file exists and this process may not write it (judged by the kernel: root may write a 0444 file).</summary>
    public static bool IsReadOnly(string path) => PosixFile.Stat(path).Kind == FileKind.Regular && !PosixFile.CanWrite(path);

    /// <summary>The file finally written (links followed when allowed) and its status; refuses what must not be written.</summary>
    private static (string Target, FileFacts Facts) Destination(string path, AtomicWrite how)
    {
        if (string.IsNullOrWhiteSpace(path)) throw new FileWriteException("no file name given");
        string full;
        try { full = System.IO.Path.GetFullPath(path); }
        catch (Exception e) when (e is ArgumentException or NotSupportedException or PathTooLongException) { throw new FileWriteException($"{path}: not a usable file name ({e.Message})"); }
        if (full.EndsWith('/') || full.EndsWith(System.IO.Path.DirectorySeparatorChar)) throw new FileWriteException($"{path}: give a file name, not a directory");
        var facts = PosixFile.Lstat(full);
        if (facts.Kind == FileKind.SymbolicLink && how.FollowLinks)
        {
            FileSystemInfo? final;
            try { final = new FileInfo(full).ResolveLinkTarget(returnFinalTarget: true); }
            catch (IOException e) { throw new FileWriteException($"{path}: cannot follow the symbolic link ({e.Message})"); }
            facts = final is null ? FileFacts.Missing : PosixFile.Lstat(final.FullName);
            if (!facts.Exists) throw new FileWriteException($"{path} is a symbolic link to {final?.FullName}, which does not exist; give the real file or remove the link");
            full = final!.FullName;
        }
        switch (facts.Kind)
        {
            case FileKind.Directory:
                throw new FileWriteException($"{path} is a directory; give a file name");
            case FileKind.BlockDevice or FileKind.Socket when how.FollowLinks:
                throw new FileWriteException($"{path} is {facts.KindText}; refusing to write to it");
            case FileKind.Regular when how.FollowLinks && !PosixFile.CanWrite(full):
                throw new FileWriteException($"{path} is read-only (mode {Convert.ToString(facts.Mode, 8)}); save under another name or change its permissions");
        }
        string directory = Directory(full);
        var parent = PosixFile.Stat(directory);
        string shown = System.IO.Path.GetDirectoryName(path) is { Length: > 0 } d ? d : ".";
        if (!parent.Exists) throw new FileWriteException($"{path}: no such directory {shown}");
        if (parent.Kind != FileKind.Directory) throw new FileWriteException($"{path}: {shown} is not a directory");
        return (full, facts);
    }

    private static string Directory(string full) => System.IO.Path.GetDirectoryName(full) ?? ".";

    /// <summary>Creates and removes a temporary in the directory: the one sure test that a new file can be made there.</summary>
    private static void ProbeDirectory(string path, string directory)
    {
        string temporary = TemporaryName(directory, System.IO.Path.GetFileName(path));
        try
        {
            using (new FileStream(temporary, new FileStreamOptions { Mode = FileMode.CreateNew, Access = FileAccess.Write })) { }
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            throw Reworded(e, path, temporary);
        }
        finally
        {
            TryDelete(temporary);
        }
    }

    private static void Replace(string path, string target, FileFacts facts, byte[] bytes, AtomicWrite how)
    {
        string directory = Directory(target), name = System.IO.Path.GetFileName(target);
        RemoveStaleTemporaries(directory, name);
        if (facts.Kind == FileKind.Regular && facts.Links > 1 && how.FollowLinks)
        {
            WriteInPlace(path, target, facts, bytes, how);
            return;
        }
        // the mode and owner to keep: those of the file it stands beside (autosave), else of the file it replaces
        FileFacts? keep = how.ModeFrom is string from && PosixFile.Stat(from) is { Kind: FileKind.Regular } source ? source
            : facts.Kind == FileKind.Regular ? facts : null;
        string temporary = TemporaryName(directory, name);
        try
        {
            WriteTemporary(temporary, keep, stream => stream.Write(bytes));
            if (how.Backup && facts.Kind == FileKind.Regular) Backup(path, target, facts);
            File.Move(temporary, target, overwrite: true);
            PosixFile.SyncDirectory(directory);
        }
        catch (Exception e) when (WriteFailed(e) && e is not FileWriteException)
        {
            throw Reworded(e, path, temporary);
        }
        finally
        {
            TryDelete(temporary);
        }
    }

    /// <summary>
    /// Writes a file that has other hard links into its own inode, so every name keeps seeing it (a rename would leave
    /// the other names on the old text). Not atomic: the backup is made first, crash-safe and flushed with its folder,
    /// so a kill mid-write leaves a complete PATH.bak to recover from. Mode and owner are untouched.
    /// </summary>
    private static void WriteInPlace(string path, string target, FileFacts facts, byte[] bytes, AtomicWrite how)
    {
        if (how.Backup)
        {
            Backup(path, target, facts);
            PosixFile.SyncDirectory(Directory(System.IO.Path.GetFullPath(path) + ".bak"));
        }
        try
        {
            using var stream = new FileStream(target, FileMode.Open, FileAccess.Write, FileShare.ReadWrite, bufferSize: 0);
            stream.Write(bytes);
            stream.SetLength(bytes.Length);   // after the write: a shorter text drops the old tail only once it is in place
            stream.Flush(flushToDisk: true);
        }
        catch (Exception e) when (WriteFailed(e))
        {
            throw Reworded(e, path, target);
        }
    }

    /// <summary>Copies the current file to PATH.bak through its own temporary, so a kill leaves the old backup or the new one, whole.</summary>
    private static void Backup(string path, string target, FileFacts facts)
    {
        string backup = System.IO.Path.GetFullPath(path) + ".bak";
        string directory = Directory(backup), name = System.IO.Path.GetFileName(backup);
        RemoveStaleTemporaries(directory, name);
        string temporary = TemporaryName(directory, name);
        try
        {
            using (var source = new FileStream(target, FileMode.Open, FileAccess.Read, FileShare.ReadWrite))
                WriteTemporary(temporary, facts, stream => source.CopyTo(stream));
            File.Move(temporary, backup, overwrite: true);
        }
        catch (Exception e) when (WriteFailed(e))
        {
            throw new FileWriteException($"{path}: not saved, because the previous version could not be kept as {path}.bak: {Reworded(e, path + ".bak", temporary).Message}", e);
        }
        finally
        {
            TryDelete(temporary);
        }
    }

    /// <summary>Creates the temporary exclusively, writes and flushes it to disk, then gives it the kept owner and mode.</summary>
    private static void WriteTemporary(string temporary, FileFacts? keep, Action<Stream> write)
    {
        var options = new FileStreamOptions { Mode = FileMode.CreateNew, Access = FileAccess.Write, Share = FileShare.None };
        // owner-only until the final mode is set, so the text is never readable by more people than the original allows
        if (keep is not null && !OperatingSystem.IsWindows()) options.UnixCreateMode = UnixFileMode.UserRead | UnixFileMode.UserWrite;
        using var stream = new FileStream(temporary, options);
        write(stream);
        stream.Flush(flushToDisk: true);
        if (keep is FileFacts k && !OperatingSystem.IsWindows())
        {
            // owner first: chown clears setuid/setgid, which the mode then puts back
            PosixFile.TryChown(stream.SafeFileHandle, k.Uid, k.Gid);
            File.SetUnixFileMode(stream.SafeFileHandle, (UnixFileMode)k.Mode);
        }
    }

    /// <summary>Writes into a character device or FIFO the way a shell redirection does: no temporary, no rename, no backup.</summary>
    private static void WriteInto(string path, string target, byte[] bytes)
    {
        try
        {
            using var stream = new FileStream(target, FileMode.Open, FileAccess.Write, FileShare.ReadWrite, bufferSize: 0);
            stream.Write(bytes);
        }
        catch (Exception e) when (WriteFailed(e))
        {
            throw Reworded(e, path, target);
        }
    }

    private static string TemporaryName(string directory, string name) =>
        System.IO.Path.Combine(directory, $".{name}.{Environment.ProcessId}.{Guid.NewGuid():N}{TemporarySuffix}");

    /// <summary>
    /// Removes this tool's temporaries for NAME whose process is gone (a killed save), and those of earlier versions
    /// (.NAME.GUID.tmp, no process id) once they are <see cref="OldTemporaryAge"/> old: a save takes well under a
    /// second, so a minute-old one belongs to no running save. Anything else is left alone.
    /// </summary>
    public static void RemoveStaleTemporaries(string directory, string name)
    {
        var ours = new Regex($@"^\.{Regex.Escape(name)}\.(\d+)\.[0-9a-f]{{32}}{Regex.Escape(TemporarySuffix)}$");
        var older = new Regex($@"^\.{Regex.Escape(name)}\.[0-9a-f]{{32}}\.tmp$");
        try
        {
            foreach (string file in System.IO.Directory.EnumerateFiles(directory, ".*"))
            {
                string fileName = System.IO.Path.GetFileName(file);
                bool stale = ours.Match(fileName) is { Success: true } m
                    ? !(int.TryParse(m.Groups[1].Value, out int pid) && PosixFile.ProcessAlive(pid))
                    : older.IsMatch(fileName) && File.GetLastWriteTimeUtc(file) < DateTime.UtcNow - OldTemporaryAge;
                if (stale && PosixFile.Lstat(file).Kind is FileKind.Regular or FileKind.SymbolicLink) TryDelete(file);
            }
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            // an unreadable directory: the write itself will say so
        }
    }

    /// <summary>
    /// A failed write: an I/O error (ENOSPC included), a permission, or EFBIG (past the file system's or the process's
    /// file-size limit, ulimit -f), which .NET reports as an ArgumentOutOfRangeException.
    /// </summary>
    private static bool WriteFailed(Exception e) => e is IOException or UnauthorizedAccessException or ArgumentOutOfRangeException;

    /// <summary>The failure said in terms of the user's path; the temporary's name never reaches the message.</summary>
    private static FileWriteException Reworded(Exception e, string path, string temporary)
    {
        if (e is FileWriteException f) return f;
        string shown = System.IO.Path.GetDirectoryName(path) is { Length: > 0 } d ? d : ".";
        string why = e switch
        {
            UnauthorizedAccessException => $"permission denied (cannot create or replace a file in {shown})",
            DirectoryNotFoundException => $"no such directory {shown}",
            ArgumentOutOfRangeException => "the file would be larger than the file system or this process's file-size limit (ulimit -f) allows",
            _ => e.Message.Replace(temporary, path),
        };
        return new FileWriteException($"cannot write {path}: {why}", e);
    }

    private static void TryDelete(string file)
    {
        try { if (PosixFile.Lstat(file).Exists) File.Delete(file); }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException) { }
    }
}
