using System.Text;
using LevelDesign.Core.Files;

namespace LevelDesign.Core.DeviceFiles;

/// <summary>
/// Reads the text of a device file with bounds: only a regular file (a FIFO, a device such as /dev/zero or a
/// directory is refused before it is opened), and only up to <see cref="MaxBytes"/> (checked before reading and
/// again while reading, in case the file grows). Problems come back as one located error, never an exception.
/// </summary>
public static class DeviceFileText
{
    /// <summary>Largest device file read: 4 MiB, far above any real device (a few kB) or level list (docs/device-format.md).</summary>
    public const long MaxBytes = 4L * 1024 * 1024;

    public static string? Read(string path, out DeviceFileError? error)
    {
        error = null;
        var facts = PosixFile.Stat(path);
        string? why = facts.Kind switch
        {
            FileKind.Missing => PosixFile.Lstat(path).Kind == FileKind.SymbolicLink ? "it is a symbolic link to a file that does not exist"
                : Directory.Exists(Path.GetDirectoryName(Path.GetFullPath(path)) ?? ".") ? "no such file" : "no such directory",
            FileKind.Regular => null,
            _ => $"it is {facts.KindText}, not a regular file; give a device file (.toml)",
        };
        if (why is null && facts.Size > MaxBytes) why = TooLarge(facts.Size);
        if (why is not null) return Fail(path, why, out error);
        try
        {
            using var stream = new FileStream(path, FileMode.Open, FileAccess.Read, FileShare.ReadWrite);
            var buffer = new MemoryStream();
            var chunk = new byte[81920];
            int n;
            while ((n = stream.Read(chunk)) > 0)
            {
                buffer.Write(chunk, 0, n);
                if (buffer.Length > MaxBytes) return Fail(path, TooLarge(buffer.Length) + " (it grew while being read)", out error);
            }
            buffer.Position = 0;
            using var reader = new StreamReader(buffer, Encoding.UTF8, detectEncodingFromByteOrderMarks: true);
            return reader.ReadToEnd();
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or ArgumentException or NotSupportedException)
        {
            return Fail(path, e is UnauthorizedAccessException ? "permission denied" : e.Message, out error);
        }
    }

    private static string TooLarge(long size) =>
        $"the file is {size / 1048576.0:0.0} MB; device files are limited to {MaxBytes / 1048576} MB (see docs/device-format.md)";

    private static string? Fail(string path, string why, out DeviceFileError error)
    {
        error = new DeviceFileError(path, 0, 0, "file", $"cannot read the device file: {why}");
        return null;
    }
}
