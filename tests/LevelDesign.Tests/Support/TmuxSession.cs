using System.Diagnostics;

namespace LevelDesign.Tests.Support;

/// <summary>
/// The real terminal UI (dotnet leveldesign.dll FILE) in a detached tmux session on a private tmux server, as
/// tests/ui-smoke.sh runs it: keys are sent, the screen is read back, and the UI's process can be killed.
/// </summary>
public sealed class TmuxSession : IDisposable
{
    private readonly string _server = $"ld-test-{Environment.ProcessId}-{Guid.NewGuid():N}";
    private const string Name = "ui";

    public static bool Available { get; } = Array.Exists(
        (Environment.GetEnvironmentVariable("PATH") ?? "").Split(':'), d => d.Length > 0 && File.Exists(Path.Combine(d, "tmux")));

    /// <summary>Process id of the UI itself (the pane execs it).</summary>
    public int ProcessId { get; }

    /// <summary>
    /// Starts the UI on <paramref name="file"/> in <paramref name="directory"/>, WIDTH×HEIGHT, without colours;
    /// <paramref name="limits"/> (shell words ending in an exec, e.g. <see cref="FileSizeLimit.ShellPrefix"/>) go first.
    /// </summary>
    public TmuxSession(string directory, string file, int width = 100, int height = 30, string limits = "exec")
    {
        string command = $"cd '{directory}' && {limits} env NO_COLOR=1 TERM=xterm-256color dotnet '{Executable.DllPath}' '{file}'";
        Tmux("new-session", "-d", "-s", Name, "-x", width.ToString(), "-y", height.ToString(), command);
        ProcessId = int.Parse(Tmux("list-panes", "-t", Name, "-F", "#{pane_pid}").Trim());
    }

    public string Screen() => Tmux("capture-pane", "-t", Name, "-p");

    /// <summary>Waits until the screen shows <paramref name="text"/>; false after <paramref name="seconds"/>.</summary>
    public bool WaitFor(string text, double seconds = 40)
    {
        var clock = Stopwatch.StartNew();
        while (clock.Elapsed.TotalSeconds < seconds)
        {
            if (Screen().Contains(text, StringComparison.Ordinal)) return true;
            Thread.Sleep(100);
        }
        return false;
    }

    /// <summary>Sends tmux key names (Enter, End, BSpace, C-s) or literal text, then lets the UI take them.</summary>
    public void Keys(params string[] keys)
    {
        Tmux(["send-keys", "-t", Name, .. keys]);
        Thread.Sleep(300);
    }

    /// <summary>Sends keys and returns at once (for a kill timed from the key).</summary>
    public void KeysNow(params string[] keys) => Tmux(["send-keys", "-t", Name, .. keys]);

    /// <summary>SIGKILL to the UI's process.</summary>
    public void Kill()
    {
        try
        {
            using var process = Process.GetProcessById(ProcessId);
            process.Kill();
            process.WaitForExit(10_000);
        }
        catch (ArgumentException) { }   // already gone
    }

    public void Dispose()
    {
        Kill();
        try { Tmux("kill-server"); }
        catch (InvalidOperationException) { }
    }

    private string Tmux(params string[] args)
    {
        var start = new ProcessStartInfo("tmux") { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        start.ArgumentList.Add("-L");
        start.ArgumentList.Add(_server);
        foreach (string a in args) start.ArgumentList.Add(a);
        using var p = Process.Start(start)!;
        string output = p.StandardOutput.ReadToEnd();
        string error = p.StandardError.ReadToEnd();
        p.WaitForExit();
        if (p.ExitCode != 0) throw new InvalidOperationException($"tmux {string.Join(' ', args)}: {error}");
        return output;
    }
}
