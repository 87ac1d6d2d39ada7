using System.Diagnostics;

namespace LevelDesign.Tests.Support;

/// <summary>Runs the executable, waits for its first "progress" line on stderr, sends SIGINT (Ctrl-C) and collects the result.</summary>
public static class InterruptedRun
{
    public static CommandResult AfterFirstProgress(params string[] args)
    {
        using var process = Process.Start(Executable.StartInfo(args))!;
        process.StandardInput.Close();
        var stdout = process.StandardOutput.ReadToEndAsync();
        string? line;
        do line = process.StandardError.ReadLine();
        while (line is not null && !line.StartsWith("progress", StringComparison.Ordinal));
        if (line is null) throw new InvalidOperationException("the command ended before reporting progress");
        using (var kill = Process.Start("kill", ["-INT", process.Id.ToString()])) kill.WaitForExit();
        string stderr = process.StandardError.ReadToEnd();
        if (!process.WaitForExit(TimeSpan.FromMinutes(2))) throw new TimeoutException("no exit within 2 minutes of Ctrl-C");
        return new CommandResult(process.ExitCode, stdout.Result, stderr);
    }
}
