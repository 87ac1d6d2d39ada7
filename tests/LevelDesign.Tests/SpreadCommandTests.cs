using System.Text.RegularExpressions;
using LevelDesign.Tests.Support;
using Xunit;

namespace LevelDesign.Tests;

/// <summary>The spread study through the executable: shards merged equal one unsharded run byte for byte (apart from timing), and mismatched shards are refused.</summary>
public sealed class SpreadCommandTests
{
    private static readonly string Device = Path.Combine(RepositoryPaths.Devices, "pair-spread.toml");

    // a small study: the idle-point rules only, so it takes seconds
    private static readonly string[] Small = ["--samples", "8", "--rule", "detuned=qa.f01 - qb.f01 > 300 MHz at idle", "--rule", "quiet=zz:qa:qb within 60 kHz at idle", "--threads", "2"];

    private static string WithoutTiming(string text) => Regex.Replace(text, "\"(started|elapsed_seconds)\": [^,\n]*", "\"$1\": T");

    [Fact]
    public void MergedShardsAreTheUnshardedStudyByteForByte()
    {
        using var temp = new TempFolder();
        string whole = temp.File("whole"), parts = temp.File("parts"), merged = temp.File("merged");
        var one = Executable.Run(["spread", Device, .. Small, "--out", whole]);
        Assert.True(one.ExitCode == 0, one.ToString());
        Assert.Contains("95% Wilson score interval", one.Stdout);
        foreach (string shard in new[] { "1/3", "2/3", "3/3" })
        {
            var r = Executable.Run(["spread", Device, .. Small, "--shard", shard, "--out", parts]);
            Assert.True(r.ExitCode == 0, r.ToString());
        }
        var m = Executable.Run(["merge", .. Directory.GetFiles(parts, "shard-*.json").Order(), "--out", merged]);
        Assert.True(m.ExitCode == 0, m.ToString());
        Assert.Equal(one.Stdout, m.Stdout);
        foreach (string name in Directory.GetFiles(whole).Select(f => Path.GetFileName(f)))
        {
            if (name.EndsWith(".json", StringComparison.Ordinal))
                Assert.Equal(WithoutTiming(File.ReadAllText(Path.Combine(whole, name))), WithoutTiming(File.ReadAllText(Path.Combine(merged, name))));
            else Assert.True(File.ReadAllBytes(Path.Combine(whole, name)).AsSpan().SequenceEqual(File.ReadAllBytes(Path.Combine(merged, name))), name + " differs");
        }
        Assert.Equal(8, File.ReadAllLines(Path.Combine(merged, "samples.csv")).Length - 2);
    }

    [Fact]
    public void ShardsOfDifferentSeedsOrMissingShardsAreRefused()
    {
        using var temp = new TempFolder();
        string a = temp.File("a"), b = temp.File("b");
        Assert.Equal(0, Executable.Run(["spread", Device, .. Small, "--shard", "1/2", "--out", a]).ExitCode);
        Assert.Equal(0, Executable.Run(["spread", Device, .. Small, "--seed", "99", "--shard", "2/2", "--out", b]).ExitCode);
        var mixed = Executable.Run("merge", Path.Combine(a, "shard-1-of-2.json"), Path.Combine(b, "shard-2-of-2.json"), "--out", temp.File("m"));
        Assert.Equal(2, mixed.ExitCode);
        Assert.Contains("seed differs", mixed.Stderr);
        var missing = Executable.Run("merge", Path.Combine(a, "shard-1-of-2.json"), "--out", temp.File("m"));
        Assert.Equal(2, missing.ExitCode);
        Assert.Contains("2/2 missing", missing.Stderr);
    }

    [Fact]
    public void ARuleNamingAnUnknownQuantityIsRefusedWithItsName()
    {
        var r = Executable.Run("spread", Device, "--samples", "2", "--rule", "bad=qa.f02 > 1 GHz at idle");
        Assert.Equal(2, r.ExitCode);
        Assert.Contains("no quantity 'qa.f02'", r.Stderr);
        Assert.DoesNotContain("   at ", r.Stderr);
    }

    [Fact]
    public void TheSlurmOptionWritesAnArrayAMergeAndADependentSubmission()
    {
        using var temp = new TempFolder();
        var r = Executable.Run("spread", Device, "--slurm", "4", "--out", temp.Path);
        Assert.True(r.ExitCode == 0, r.ToString());
        string array = File.ReadAllText(temp.File("shards.sbatch"));
        Assert.Contains("#SBATCH --array=0-3", array);
        Assert.Contains("--shard \"$shard/4\"", array);
        Assert.Matches(@"#SBATCH --mem=\d+M", array);
        Assert.Contains("--dependency=afterok:$array", File.ReadAllText(temp.File("submit.sh")));
        Assert.Contains(" merge ", File.ReadAllText(temp.File("merge.sbatch")));
    }

    [Fact]
    public void CtrlCKeepsTheFinishedSamplesInTheFiles()
    {
        if (!OperatingSystem.IsLinux() && !OperatingSystem.IsMacOS()) return; // SIGINT is sent with kill(1)
        using var temp = new TempFolder();
        var r = InterruptedRun.AfterFirstProgress("spread", Device, "--samples", "5000", "--threads", "2", "--out", temp.Path);
        Assert.Equal(130, r.ExitCode);
        Assert.Contains("cancelled: keeping the", r.Stderr);
        Assert.Contains("(cancelled: only the samples finished)", r.Stdout);
        string json = File.ReadAllText(temp.File("spread.json"));
        Assert.Contains("\"completed\": false", json);
        int rows = File.ReadAllLines(temp.File("samples.csv")).Length - 2;
        Assert.InRange(rows, 1, 4999);
    }
}
