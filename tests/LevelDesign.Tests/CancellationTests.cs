using LevelDesign.Tests.Support;

namespace LevelDesign.Tests;

/// <summary>Ctrl-C (SIGINT) during a sweep stops it cleanly: exit 130 and the finished points are still written.</summary>
public sealed class CancellationTests
{
    [Fact]
    public void InterruptedSweepKeepsComputedPoints()
    {
        if (!OperatingSystem.IsLinux() && !OperatingSystem.IsMacOS()) return; // SIGINT is sent with kill(1)
        var r = InterruptedRun.AfterFirstProgress("sweep", "devices/pair.toml", "--vary", "qc_flux=0mA:1mA:5000", "--csv");
        Assert.Equal(130, r.ExitCode);
        Assert.Contains("cancelled", r.Stderr);
        var rows = r.Stdout.TrimEnd().Split('\n');
        Assert.InRange(rows.Length - 1, 1, 4999); // header + at least one finished point, fewer than all
    }
}
