using System.Globalization;
using System.Text.Json.Nodes;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Tests.Support;

namespace LevelDesign.Tests;

/// <summary>
/// `fit --write` round trip: a transmon's E_J and E_C are fitted to f01 and α of the Mathieu reference
/// (tests/reference/data/transmon_mathieu.csv: SciPy 1.10.1 Mathieu characteristic values, E_J/E_C = 50, E_C = 1 GHz,
/// n_g = 0; Koch et al., PRA 76, 042319 (2007)), written back, and the file re-read: only those two values change,
/// in the units the file used, and every comment survives.
/// </summary>
public sealed class FitWriteTests
{
    private const string Original = """
        # A lone transmon for the fit round trip: E_C and E_J start off target.
        [device]
        name = "fit-check"   # kept as written

        [truncation]
        max_excitations = 4

        [elements.q]
        kind = "transmon"
        ec = "900 MHz"       # starting guess for E_C
        ej = "45 GHz"        # starting guess for E_J
        levels = 4
        # end of file comment
        """;

    [Fact]
    public void FittedValuesAreWrittenInTheFileUnitsAndNothingElseChanges()
    {
        var levels = ReferenceCsv.Rows("transmon_mathieu.csv")
            .Where(r => r["ej_over_ec"] == 50 && r["ng"] == 0).OrderBy(r => r["m"]).Select(r => r["energy_ghz"]).ToArray();
        double f01 = levels[1] - levels[0], alpha = levels[2] - 2 * levels[1] + levels[0];
        string dir = Path.Combine(Path.GetTempPath(), $"leveldesign-fit-{Guid.NewGuid():N}");
        Directory.CreateDirectory(dir);
        string file = Path.Combine(dir, "transmon.toml");
        File.WriteAllText(file, Original);
        try
        {
            var run = Executable.Run(["fit", file, "--param", "q.ec=0.5GHz:2GHz", "--param", "q.ej=20GHz:100GHz",
                "--target", $"q.f01={(f01 * 1e3).ToString("R", CultureInfo.InvariantCulture)}MHz",
                "--target", $"q.anharmonicity={(alpha * 1e3).ToString("R", CultureInfo.InvariantCulture)} MHz", "--write", "--json"], TimeSpan.FromMinutes(3));
            Assert.True(run.ExitCode == 0, run.ToString());
            var report = JsonNode.Parse(run.Stdout)!;
            foreach (var t in report["targets"]!.AsArray()) Assert.True(Math.Abs((double)t!["residual_ghz"]!) < 1e-7, run.Stdout);

            // E_C = 1 GHz and E_J = 50 GHz are the reference's; LevelDesign's charge basis is converged to 1 Hz, so the
            // fitted values can differ only at the 1e-9 level; 1e-6 relative also covers the 12-digit text written.
            var reloaded = DeviceDocument.Load(file);
            Assert.True(reloaded.Ok, string.Join("\n", reloaded.Errors));
            Assert.Equal(1.0, reloaded.Document!.Device.GetParameter("q.ec"), 1e-6);
            Assert.Equal(50.0, reloaded.Document.Device.GetParameter("q.ej"), 5e-5);

            var before = Original.Split('\n');
            var after = File.ReadAllText(file).Split('\n');
            Assert.Equal(before.Length, after.Length);
            var changed = Enumerable.Range(0, before.Length).Where(i => before[i] != after[i]).ToArray();
            Assert.Equal([Array.FindIndex(before, l => l.StartsWith("ec =")), Array.FindIndex(before, l => l.StartsWith("ej ="))], changed);
            Assert.Matches(@"^ec = ""[0-9.]+ MHz""\s+# starting guess for E_C$", after[changed[0]]);
            Assert.Matches(@"^ej = ""[0-9.]+ GHz""\s+# starting guess for E_J$", after[changed[1]]);
            foreach (var comment in before.Where(l => l.Contains('#'))) Assert.Contains(comment[comment.IndexOf('#')..], string.Join("\n", after));
            Assert.Equal(Original, File.ReadAllText(file + ".bak"));
        }
        finally
        {
            Directory.Delete(dir, recursive: true);
        }
    }

    [Fact]
    public void WriteIsRefusedForAValueTheFileGivesAnotherWay()
    {
        // single.toml gives its transmon by ej1/ej2 and a capacitance: writing ej_sum or ec would change the file's meaning
        string copy = Path.Combine(Path.GetTempPath(), $"leveldesign-single-{Guid.NewGuid():N}.toml");
        File.Copy(Path.Combine(RepositoryPaths.Devices, "single.toml"), copy);
        try
        {
            string text = File.ReadAllText(copy);
            var run = Executable.Run("fit", copy, "--param", "q.ec", "--target", "q.anharmonicity=-230MHz", "--write");
            Assert.Equal(2, run.ExitCode);
            Assert.Contains("capacitance", run.Stderr);
            Assert.Equal(text, File.ReadAllText(copy));
            Assert.False(File.Exists(copy + ".bak"));
        }
        finally
        {
            File.Delete(copy);
        }
    }
}
