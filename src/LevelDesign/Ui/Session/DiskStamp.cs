namespace LevelDesign.Ui.Session;

/// <summary>Last-write time and length of a file, to notice that it changed on disk since it was loaded.</summary>
public readonly record struct DiskStamp(DateTime WriteTimeUtc, long Length)
{
    public static DiskStamp? Of(string path)
    {
        var info = new FileInfo(path);
        return info.Exists ? new DiskStamp(info.LastWriteTimeUtc, info.Length) : null;
    }
}
