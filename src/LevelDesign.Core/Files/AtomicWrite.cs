namespace LevelDesign.Core.Files;

/// <summary>How <see cref="AtomicFile"/> treats a path.</summary>
/// <param name="Backup">keep the previous regular file as PATH.bak (itself written crash-safe)</param>
/// <param name="FollowLinks">
/// true for a file the user named (a device file, --out): a symbolic link is written through to its target and a
/// character device or FIFO is written into like stdout. false for files this tool owns beside another (the
/// autosave): whatever is at the path (a planted link, a FIFO) is replaced, never written through.
/// </param>
/// <param name="ModeFrom">a new file takes this file's permission bits and owner (the autosave copies the device file's)</param>
public sealed record AtomicWrite(bool Backup, bool FollowLinks, string? ModeFrom = null)
{
    /// <summary>A file the user named: links followed, special files written into, previous version kept as .bak.</summary>
    public static readonly AtomicWrite UserFile = new(Backup: true, FollowLinks: true);

    /// <summary>A file kept beside <paramref name="original"/>: never through a link, no backup, the original's mode.</summary>
    public static AtomicWrite Sidecar(string original) => new(Backup: false, FollowLinks: false, ModeFrom: original);
}
