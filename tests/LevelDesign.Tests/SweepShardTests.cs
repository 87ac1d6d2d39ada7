using System.Text.RegularExpressions;
using LevelDesign.Tests.Support;
using Xunit;

namespace LevelDesign.Tests;

/// <summary>`sweep --shard I/N` and `merge`: the merged output is the unsharded sweep's, byte for byte.</summary>
public sealed class SweepShardTests
{
    private static readonly string Pair = Path.Combine(RepositoryPaths.Devices, "pair.toml");

    [Theory]
    [InlineData("--json", 2)]
    [InlineData("--csv", 3)]
    public void MergedShardsEqualTheUnshardedSweep(string format, int shards)
    {
        using var temp = new TempFolder();
        var whole = Executable.Run("sweep", Pair, "--sweep", "coupler_scan", format, "--out", temp.File("whole"));
        Assert.True(whole.ExitCode == 0, whole.ToString());
        for (int i = 1; i <= shards; i++)
        {
            var r = Executable.Run("sweep", Pair, "--sweep", "coupler_scan", format, "--shard", $"{i}/{shards}", "--out", temp.File("parts"));
            Assert.True(r.ExitCode == 0, r.ToString());
        }
        var m = Executable.Run(["merge", .. Directory.GetFiles(temp.File("parts")).Order(), "--out", temp.File("merged")]);
        Assert.True(m.ExitCode == 0, m.ToString());
        Assert.Equal(File.ReadAllBytes(temp.File("whole")), File.ReadAllBytes(temp.File("merged")));
    }

    [Fact]
    public void ShardsWhoseHandedOverLabelsDisagreeAreRefused()
    {
        using var temp = new TempFolder();
        for (int i = 1; i <= 2; i++)
            Assert.Equal(0, Executable.Run("sweep", Pair, "--sweep", "coupler_scan", "--json", "--shard", $"{i}/2", "--out", temp.Path).ExitCode);
        // as if shard 2 had labelled its lead-in point otherwise (a split inside a crossing)
        string second = temp.File("sweep-shard-2-of-2.json");
        string text = File.ReadAllText(second);
        var edited = new Regex("(\"lead_in_labels\": \\[\\s*\")([^\"]*)(\",\\s*\")([^\"]*)\"").Replace(text, "$1$4$3$2\"", 1);
        Assert.NotEqual(text, edited);
        File.WriteAllText(second, edited);
        var m = Executable.Run("merge", temp.File("sweep-shard-1-of-2.json"), second, "--out", temp.File("merged.json"));
        Assert.Equal(2, m.ExitCode);
        Assert.Contains("differ between the two", m.Stderr);
    }

    private static readonly string[] Grid = ["--vary", "qa_flux=0:0.3:5", "--vary", "qc_flux=0.15mA:1.05mA:9"];

    [Theory]
    [InlineData("--json")]
    [InlineData("--csv")]
    public void MergedGridShardsEqualTheUnshardedGrid(string format)
    {
        using var temp = new TempFolder();
        var whole = Executable.Run(["sweep", Pair, .. Grid, format, "--out", temp.File("whole")]);
        Assert.True(whole.ExitCode == 0, whole.ToString());
        for (int shards = 1; shards <= 3; shards++)
        {
            string parts = temp.File($"parts{shards}");
            for (int i = 1; i <= shards; i++)
            {
                var r = Executable.Run(["sweep", Pair, .. Grid, format, "--shard", $"{i}/{shards}", "--out", parts]);
                Assert.True(r.ExitCode == 0, r.ToString());
            }
            string merged = temp.File($"merged{shards}");
            var m = Executable.Run(["merge", .. Directory.GetFiles(parts).Order(), "--out", merged]);
            Assert.True(m.ExitCode == 0, m.ToString());
            Assert.Equal(File.ReadAllText(temp.File("whole")), File.ReadAllText(merged));
        }
    }

    [Fact]
    public void GridShardsOfDifferentGridsOrSplitsAreRefused()
    {
        using var temp = new TempFolder();
        string[] other = ["--vary", "qa_flux=0:0.3:5", "--vary", "qc_flux=0.15mA:1.05mA:7"];
        Assert.Equal(0, Executable.Run(["sweep", Pair, .. Grid, "--json", "--shard", "1/2", "--out", temp.File("a")]).ExitCode);
        Assert.Equal(0, Executable.Run(["sweep", Pair, .. other, "--json", "--shard", "2/2", "--out", temp.File("b")]).ExitCode);
        Assert.Equal(0, Executable.Run(["sweep", Pair, .. Grid, "--json", "--shard", "2/3", "--out", temp.File("c")]).ExitCode);
        string a1 = Path.Combine(temp.File("a"), "sweep-shard-1-of-2.json");
        var grids = Executable.Run("merge", a1, Path.Combine(temp.File("b"), "sweep-shard-2-of-2.json"), "--out", temp.File("m1.json"));
        Assert.Equal(2, grids.ExitCode);
        Assert.Contains("differs from", grids.Stderr);
        Assert.Contains("not of one sweep", grids.Stderr);
        var splits = Executable.Run("merge", a1, Path.Combine(temp.File("c"), "sweep-shard-2-of-3.json"), "--out", temp.File("m2.json"));
        Assert.Equal(2, splits.ExitCode);
        Assert.Contains("split into 3", splits.Stderr);
        Assert.False(File.Exists(temp.File("m1.json")) || File.Exists(temp.File("m2.json")));
    }

    [Fact]
    public void AGridShardsByRowsAndAShardNeedsAFolder()
    {
        var tooMany = Executable.Run(["sweep", Pair, .. Grid, "--shard", "1/6", "--out", Path.GetTempPath()]);
        Assert.Equal(2, tooMany.ExitCode);
        Assert.Contains("5 rows of 9 points", tooMany.Stderr);
        var noOut = Executable.Run("sweep", Pair, "--sweep", "coupler_scan", "--shard", "1/2");
        Assert.Equal(2, noOut.ExitCode);
        Assert.Contains("--shard needs --out", noOut.Stderr);
    }

    [Fact]
    public void TheSlurmOptionWritesAShardedSweepAndItsMerge()
    {
        using var temp = new TempFolder();
        var r = Executable.Run("sweep", Pair, "--sweep", "coupler_scan", "--csv", "--slurm", "3", "--out", temp.Path);
        Assert.True(r.ExitCode == 0, r.ToString());
        string array = File.ReadAllText(temp.File("shards.sbatch"));
        Assert.Contains("#SBATCH --array=0-2", array);
        Assert.Contains("--sweep coupler_scan --csv --shard \"$shard/3\"", array);
        Assert.Contains("--out " + Path.Combine(temp.Path, "sweep.csv"), File.ReadAllText(temp.File("merge.sbatch")));
        var tooMany = Executable.Run("sweep", Pair, "--sweep", "coupler_scan", "--slurm", "9", "--out", temp.Path);
        Assert.Equal(2, tooMany.ExitCode);
        Assert.Contains("give 1 to 8 tasks", tooMany.Stderr);
        string gridFolder = temp.File("grid");
        var grid = Executable.Run(["sweep", Pair, .. Grid, "--slurm", "4", "--out", gridFolder]);
        Assert.True(grid.ExitCode == 0, grid.ToString());
        string gridArray = File.ReadAllText(Path.Combine(gridFolder, "shards.sbatch"));
        Assert.Contains("#SBATCH --array=0-3", gridArray);
        Assert.Contains("--vary qc_flux=0.15mA:1.05mA:9 --json --shard \"$shard/4\"", gridArray);
        Assert.Contains("5 rows of 9 points", gridArray);
        var gridTooMany = Executable.Run(["sweep", Pair, .. Grid, "--slurm", "6", "--out", gridFolder]);
        Assert.Equal(2, gridTooMany.ExitCode);
        Assert.Contains("give 1 to 5 tasks", gridTooMany.Stderr);
    }
}
