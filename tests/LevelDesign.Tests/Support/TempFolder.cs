using System.Diagnostics;

namespace LevelDesign.Tests.Support;

/// <summary>A temporary folder for file-safety tests, with the special files they need made inside it (never /dev).</summary>
public sealed class TempFolder : IDisposable
{
    public string Path { get; } = Directory.CreateTempSubdirectory("ld-files-").FullName;

    public string File(string name) => System.IO.Path.Combine(Path, name);

    /// <summary>A FIFO (named pipe) in this folder, made with mkfifo(1).</summary>
    public string Fifo(string name)
    {
        string path = File(name);
        Run("mkfifo", path);
        return path;
    }

    public static bool IsRoot => Environment.UserName == "root";

    private readonly List<string> _immutable = [];

    /// <summary>
    /// Makes a file this process may not write: mode 0444, and for root (whom the kernel lets write any mode) also the
    /// immutable attribute (chattr +i, undone on dispose). False when that is not possible here (root without chattr
    /// or on a file system without the attribute); the caller then skips what needs an unwritable file.
    /// </summary>
    public bool MakeUnwritable(string path)
    {
        System.IO.File.SetUnixFileMode(path, UnixFileMode.UserRead | UnixFileMode.GroupRead | UnixFileMode.OtherRead);
        if (!IsRoot) return true;
        try { Run("chattr", "+i", path); }
        catch (Exception e) when (e is InvalidOperationException or System.ComponentModel.Win32Exception) { return false; }
        _immutable.Add(path);
        return true;
    }

    public static void Run(string program, params string[] args)
    {
        var start = new ProcessStartInfo(program) { RedirectStandardError = true, UseShellExecute = false };
        foreach (var a in args) start.ArgumentList.Add(a);
        using var p = Process.Start(start)!;
        p.WaitForExit();
        if (p.ExitCode != 0) throw new InvalidOperationException($"{program} {string.Join(' ', args)}: {p.StandardError.ReadToEnd()}");
    }

    /// <summary>This tool's temporaries left in the folder (none may survive a finished save).</summary>
    public string[] Temporaries() => Directory.GetFiles(Path, "*" + Core.Files.AtomicFile.TemporarySuffix, SearchOption.TopDirectoryOnly);

    public void Dispose()
    {
        foreach (string f in _immutable) Run("chattr", "-i", f);
        try { Directory.Delete(Path, recursive: true); }
        catch (IOException) { }
    }
}
