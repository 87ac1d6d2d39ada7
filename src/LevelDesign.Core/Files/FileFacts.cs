namespace LevelDesign.Core.Files;

/// <summary>
/// The status of one path: kind, permission bits (with setuid/setgid/sticky, without the type), owner, size, and
/// the device and inode that identify the file whatever name it is reached by, and how many names (hard links) it has.
/// </summary>
public readonly record struct FileFacts(FileKind Kind, int Mode, uint Uid, uint Gid, long Size, ulong Device, ulong Inode, long Links = 1)
{
    public static readonly FileFacts Missing = new(FileKind.Missing, 0, 0, 0, 0, 0, 0, 0);

    public bool Exists => Kind != FileKind.Missing;

    /// <summary>A human name for the kind, for messages ("a FIFO (named pipe)").</summary>
    public string KindText => Kind switch
    {
        FileKind.Regular => "a regular file",
        FileKind.Directory => "a directory",
        FileKind.SymbolicLink => "a symbolic link",
        FileKind.CharacterDevice => "a character device",
        FileKind.BlockDevice => "a block device",
        FileKind.Fifo => "a FIFO (named pipe)",
        FileKind.Socket => "a socket",
        _ => "missing",
    };

    /// <summary>The same file as <paramref name="other"/> (same device and inode), whatever the names.</summary>
    public bool SameFileAs(FileFacts other) => Exists && other.Exists && Device == other.Device && Inode == other.Inode && Inode != 0;
}
