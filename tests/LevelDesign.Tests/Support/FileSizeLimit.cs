using System.Diagnostics;

namespace LevelDesign.Tests.Support;

/// <summary>
/// Runs the tool with a real kernel write failure and no root: RLIMIT_FSIZE (ulimit -f 1, 1 KiB) makes every write
/// past 1 KiB fail with EFBIG, as a full disk fails it with ENOSPC (a full file system itself would need a mount).
/// SIGXFSZ is ignored so the write returns the error instead of ending the process, and the runtime's W^X double
/// mapping (a memfd it sizes past the limit) is turned off, or the runtime would not start.
/// </summary>
public static class FileSizeLimit
{
    /// <summary>Shell words that put the limit on the command that follows.</summary>
    public const string ShellPrefix = "trap '' XFSZ; ulimit -f 1; exec env DOTNET_EnableWriteXorExecute=0";

    /// <summary>Files up to this size can still be written.</summary>
    public const int Bytes = 1024;

    /// <summary>`dotnet leveldesign.dll ARGS` in <paramref name="directory"/> under the limit.</summary>
    public static CommandResult Run(string directory, params string[] args)
    {
        var start = new ProcessStartInfo("bash") { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false, WorkingDirectory = directory };
        foreach (string a in (string[])["-c", ShellPrefix + " \"$@\"", "bash", "dotnet", Executable.DllPath, .. args]) start.ArgumentList.Add(a);
        using var process = Process.Start(start)!;
        var stdout = process.StandardOutput.ReadToEndAsync();
        var stderr = process.StandardError.ReadToEndAsync();
        if (!process.WaitForExit(TimeSpan.FromMinutes(2)))
        {
            process.Kill(entireProcessTree: true);
            throw new TimeoutException("leveldesign under a file-size limit did not finish within 2 minutes");
        }
        return new CommandResult(process.ExitCode, stdout.Result, stderr.Result);
    }
}
