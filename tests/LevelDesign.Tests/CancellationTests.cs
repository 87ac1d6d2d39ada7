using System.Diagnostics;
using LevelDesign.Tests.Support;

namespace LevelDesign.Tests;

/// <summary>Ctrl-C (SIGINT) during a sweep stops it cleanly: exit 130 and the finished points are still written.</summary>
public sealed class CancellationTests
{
    [Fact]
    public void InterruptedSweepKeepsComputedPoints()
    {
        if (!OperatingSystem.IsLinux() && !OperatingSystem.IsMacOS()) return; // SIGINT is sent with kill(1)
        var start = new ProcessStartInfo("dotnet")
        {
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            RedirectStandardInput = true,
            UseShellExecute = false,
            WorkingDirectory = RepositoryPaths.Root,
        };
        foreach (var a in new[] { Executable.DllPath, "sweep", "devices/pair.toml", "--vary", "qc_flux=0mA:1mA:5000", "--csv" })
            start.ArgumentList.Add(a);
        using var process = Process.Start(start)!;
        process.StandardInput.Close();
        var stdout = process.StandardOutput.ReadToEndAsync();
        // Wait for the first point, then interrupt.
        string? line;
        do line = process.StandardError.ReadLine();
        while (line is not null && !line.StartsWith("progress"));
        Assert.NotNull(line);
        using (var kill = Process.Start("kill", ["-INT", process.Id.ToString()])) kill.WaitForExit();
        string stderr = process.StandardError.ReadToEnd();
        Assert.True(process.WaitForExit(TimeSpan.FromMinutes(2)));
        Assert.Equal(130, process.ExitCode);
        Assert.Contains("cancelled", stderr);
        var rows = stdout.Result.TrimEnd().Split('\n');
        Assert.InRange(rows.Length - 1, 1, 4999); // header + at least one finished point, fewer than all
    }
}
