namespace LevelDesign.Core.Files;

/// <summary>What a path names, as lstat/stat tell it (S_IFMT), or that nothing is there.</summary>
public enum FileKind
{
    Missing,
    Regular,
    Directory,
    SymbolicLink,
    CharacterDevice,
    BlockDevice,
    Fifo,
    Socket,
}
