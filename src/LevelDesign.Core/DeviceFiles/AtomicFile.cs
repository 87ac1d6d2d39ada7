using System.Text;

namespace LevelDesign.Core.DeviceFiles;

/// <summary>
/// Replaces a file so that a crash never leaves it half written: write a temporary file beside it, flush it to
/// disk, copy the previous version to PATH.bak, then rename the temporary file over the original.
/// </summary>
public static class AtomicFile
{
    public static void Write(string path, string text)
    {
        string full = System.IO.Path.GetFullPath(path);
        string directory = System.IO.Path.GetDirectoryName(full) ?? ".";
        string temporary = System.IO.Path.Combine(directory, $".{System.IO.Path.GetFileName(full)}.{Guid.NewGuid():N}.tmp");
        try
        {
            using (var stream = new FileStream(temporary, FileMode.CreateNew, FileAccess.Write))
            {
                var bytes = new UTF8Encoding(false).GetBytes(text);
                stream.Write(bytes);
                stream.Flush(flushToDisk: true);
            }
            if (File.Exists(full)) File.Copy(full, full + ".bak", overwrite: true);
            File.Move(temporary, full, overwrite: true);
        }
        finally
        {
            if (File.Exists(temporary)) File.Delete(temporary);
        }
    }
}
