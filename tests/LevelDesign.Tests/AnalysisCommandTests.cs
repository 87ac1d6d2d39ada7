using System.Globalization;
using System.Text.Json.Nodes;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Tests.Support;

namespace LevelDesign.Tests;

/// <summary>sweep, crossings, solve and plot run as a process on every example device that has a bias.</summary>
public sealed class AnalysisCommandTests
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    /// <summary>Each example device with a bias: the bias and a range of its control values (the file's sweep where it has one).</summary>
    public static TheoryData<string, string, string, string> Ranges() => new()
    {
        { "pair.toml", "qc_flux", "0.15mA", "1.05mA" },
        { "pair-spread.toml", "qc_flux", "0.15mA", "1.05mA" },
        { "single.toml", "q_flux", "0", "0.5" },
        { "fluxonium.toml", "f_flux", "0.4", "0.6" },
        { "defect.toml", "tls_energy", "5.0GHz", "5.2GHz" },
        { "capmatrix.toml", "qa_flux", "0", "0.4" },
        { "line4.toml", "cab_flux", "0.15mA", "1.05mA" },
        { "lattice3x3.toml", "cab_flux", "0.15mA", "1.05mA" },
    };

    /// <summary>
    /// <see cref="Ranges"/> without the modules: a crossing search refines dozens of candidates by standalone solves,
    /// minutes on a 4,000-state module on a shared 2-core machine, so it is run on the small devices only.
    /// </summary>
    public static TheoryData<string, string, string, string> SmallRanges()
    {
        var data = new TheoryData<string, string, string, string>();
        foreach (var row in Ranges())
            if ((string)row[0] is not ("line4.toml" or "lattice3x3.toml")) data.Add((string)row[0], (string)row[1], (string)row[2], (string)row[3]);
        return data;
    }

    [Fact]
    public void EveryDeviceWithABiasIsCovered()
    {
        var covered = Ranges().Select(r => (string)r[0]).ToHashSet();
        foreach (var file in RepositoryPaths.DeviceFiles())
            if (DeviceDocument.Load(file).Document!.Biases.Count > 0) Assert.Contains(Path.GetFileName(file), covered);
    }

    private static string Device(string name) => ExampleDevices.Path(name);

    private static string TargetElement(string name, string bias) =>
        DeviceDocument.Load(Device(name)).Document!.Bias(bias)!.Target.Split('.')[0];

    [Theory]
    [MemberData(nameof(Ranges))]
    public void SweepJsonHasLabelsQuantitiesAndFlags(string name, string bias, string from, string to)
    {
        var run = Executable.Run("sweep", Device(name), "--vary", $"{bias}={from}:{to}:7", "--json", "--purity", "0.95");
        Assert.True(run.ExitCode == 0, run.ToString());
        var json = JsonNode.Parse(run.Stdout)!;
        Assert.True((bool)json["completed"]!);
        Assert.Equal(0.95, (double)json["purity_threshold"]!);
        var labels = json["labels"]!.AsArray();
        var quantities = json["quantities"]!.AsArray().Select(q => (string)q!).ToList();
        Assert.Contains($"{TargetElement(name, bias)}.f01", quantities);
        var points = json["points"]!.AsArray();
        Assert.Equal(7, points.Count);
        foreach (var p in points)
        {
            Assert.Equal(labels.Count, p!["energies"]!.AsArray().Count);
            var purities = p["purities"]!.AsArray().Select(x => x is null ? double.NaN : (double)x).ToArray();
            // a point is flagged exactly when a tracked state's purity is below the threshold
            Assert.Equal(purities.Any(x => x < 0.95), (bool)p["low_purity"]!);
            Assert.NotNull(p["ambiguous"]);
            Assert.Single(p["parameters"]!.AsObject());
        }
    }

    [Theory]
    [MemberData(nameof(Ranges))]
    public void SolveFindsTheBiasOfAnF01BetweenTwoScanPoints(string name, string bias, string from, string to)
    {
        string quantity = $"{TargetElement(name, bias)}.f01";
        var sweep = JsonNode.Parse(Executable.Run("sweep", Device(name), "--vary", $"{bias}={from}:{to}:5", "--json").Stdout)!;
        int column = sweep["quantities"]!.AsArray().Select(q => (string)q!).ToList().IndexOf(quantity);
        var points = sweep["points"]!.AsArray();
        // the interval where the element's excited state is purest at both ends, away from any crossing, where a
        // label could move to another state (that is a jump, reported as such, not a root)
        var order = sweep["element_order"]!.AsArray().Select(x => (string)x!).ToList();
        var levels = new int[order.Count];
        levels[order.IndexOf(TargetElement(name, bias))] = 1;
        int state = sweep["labels"]!.AsArray().Select(x => (string)x!).ToList().IndexOf("|" + string.Join(",", levels) + "⟩");
        double Purity(int i) => (double)points[i]!["purities"]![state]!;
        int i = Enumerable.Range(0, points.Count - 1).MaxBy(k => Math.Min(Purity(k), Purity(k + 1)));
        double a = (double)points[i]!["quantities"]![column]!, b = (double)points[i + 1]!["quantities"]![column]!;
        Assert.NotEqual(a, b);
        double target = 0.5 * (a + b);   // strictly between two swept values, so a root lies between their biases
        double biasA = (double)points[i]!["axis_values"]![0]!, biasB = (double)points[i + 1]!["axis_values"]![0]!;

        var run = Executable.Run("solve", Device(name), "--vary", $"{bias}={from}:{to}:21", "--target",
            $"{quantity}={(target * 1e3).ToString("R", Inv)}MHz", "--json");
        Assert.True(run.ExitCode == 0, run.ToString());
        var roots = JsonNode.Parse(run.Stdout)!["roots"]!.AsArray().Where(r => (bool)r!["root"]!).ToArray();
        Assert.Contains(roots, r => (double)r!["bias"]! >= Math.Min(biasA, biasB) && (double)r["bias"]! <= Math.Max(biasA, biasB));
        foreach (var r in roots) Assert.Equal(target, (double)r!["value_ghz"]!, 1e-8);
    }

    [Theory]
    [MemberData(nameof(SmallRanges))]
    public void CrossingsJsonIsRankedAndInRange(string name, string bias, string from, string to)
    {
        var run = Executable.Run(["crossings", Device(name), "--vary", $"{bias}={from}:{to}:21", "--json"], TimeSpan.FromMinutes(4));
        Assert.True(run.ExitCode == 0, run.ToString());
        var json = JsonNode.Parse(run.Stdout)!;
        double start = (double)json["axis"]!["start"]!, stop = (double)json["axis"]!["stop"]!;
        double? previous = null;
        foreach (var c in json["crossings"]!.AsArray())
        {
            double at = (double)c!["bias"]!;
            Assert.InRange(at, Math.Min(start, stop) - 1e-12, Math.Max(start, stop) + 1e-12);
            Assert.InRange((double)c["gap_mhz"]!, 0, 500);
            Assert.NotEqual((string)c["state_a"]!, (string)c["state_b"]!);
            if (c["distance"] is JsonNode d)
            {
                Assert.True(previous is null || (double)d >= previous - 1e-15, "ranked by distance to the nearest operating point");
                previous = (double)d;
            }
        }
    }

    [Fact]
    public void DefectCrossingHasTheGapOfTheCouplingAndIsRankedByNear()
    {
        // the defect is swept through the qubit: exactly where their bare levels meet, the levels repel
        var run = Executable.Run("crossings", Device("defect.toml"), "--sweep", "defect_drift", "--near", "5.1GHz", "--json", "--min-gap", "1MHz");
        Assert.True(run.ExitCode == 0, run.ToString());
        var crossings = JsonNode.Parse(run.Stdout)!["crossings"]!.AsArray();
        Assert.NotEmpty(crossings);
        Assert.All(crossings, c => Assert.Equal("5.1GHz", (string)c!["nearest_point"]!));
        Assert.All(crossings, c => Assert.True((double)c!["gap_mhz"]! >= 1));
    }

    [Theory]
    [MemberData(nameof(Ranges))]
    public void PlotWritesAPng(string name, string bias, string from, string to)
    {
        string output = Path.Combine(Path.GetTempPath(), $"leveldesign-plot-{Guid.NewGuid():N}.png");
        try
        {
            var run = Executable.Run(["plot", Device(name), "--vary", $"{bias}={from}:{to}:11", "--out", output, "--width", "640", "--height", "480"], TimeSpan.FromMinutes(4));
            Assert.True(run.ExitCode == 0, run.ToString());
            var bytes = File.ReadAllBytes(output);
            Assert.Equal(new byte[] { 0x89, (byte)'P', (byte)'N', (byte)'G' }, bytes[..4]);
        }
        finally
        {
            File.Delete(output);
        }
    }

    /// <summary>J_eff and ZZ along the coupler bias as a picture (the zero-J_eff and zero-ZZ search, drawn).</summary>
    [Fact]
    public void PlotDrawsQuantitiesAlongTheSweep()
    {
        string output = Path.Combine(Path.GetTempPath(), $"leveldesign-quantities-{Guid.NewGuid():N}.svg");
        try
        {
            var run = Executable.Run("plot", Device("pair.toml"), "--vary", "qc_flux=0.15mA:1.05mA:7", "--quantity", "jeff:qa:qb,zz:qa:qb", "--out", output);
            Assert.True(run.ExitCode == 0, run.ToString());
            string svg = File.ReadAllText(output);
            Assert.Contains("jeff:qa:qb", svg);
            Assert.Contains("zz:qa:qb", svg);
            Assert.Contains("qc_flux (mA)", svg);
            var bad = Executable.Run("plot", Device("pair.toml"), "--vary", "qc_flux=0.15mA:1.05mA:5", "--quantity", "jeff:qa:qx", "--out", output);
            Assert.Equal(2, bad.ExitCode);
            Assert.Contains("did you mean 'jeff:qa:qb'", bad.Stderr);
        }
        finally
        {
            File.Delete(output);
        }
    }

    [Fact]
    public void PlotWritesAnSvgOfOneManifold()
    {
        string output = Path.Combine(Path.GetTempPath(), $"leveldesign-plot-{Guid.NewGuid():N}.svg");
        try
        {
            var run = Executable.Run("plot", Device("single.toml"), "--sweep", "flux_scan", "--out", output, "--manifold", "1");
            Assert.True(run.ExitCode == 0, run.ToString());
            string svg = File.ReadAllText(output);
            Assert.Contains("<svg", svg);
            Assert.Contains("q1", svg);          // the single-excitation characters are drawn and named in the legend
            Assert.Contains("r1", svg);
            Assert.DoesNotContain("q1 r1", svg);   // the two-excitation ones are not
            Assert.DoesNotContain("|1,0⟩", svg);   // states are named, not written as level tuples
            Assert.Contains("q_flux (Φ0)", svg);   // the axis in the unit of the file's bias
        }
        finally
        {
            File.Delete(output);
        }
    }

    [Fact]
    public void LinkedAxisMovesTheSecondBias()
    {
        var run = Executable.Run("sweep", Device("pair.toml"), "--vary", "qa_flux=0:0.2:3", "--link", "qb_flux=0.5*qa_flux+0.1", "--json", "--levels", "3");
        Assert.True(run.ExitCode == 0, run.ToString());
        var json = JsonNode.Parse(run.Stdout)!;
        var link = json["axis_details"]![0]!["links"]![0]!;
        Assert.Equal("qb_flux", (string)link["path"]!);
        Assert.Equal(0.5, (double)link["scale"]!);
        Assert.Equal(0.1, (double)link["shift"]!);
        // qb.f01 falls as qb's flux rises (E_J(Φ) of the SQUID falls from Φ = 0 to Φ0/2; Koch et al. 2007)
        int column = json["quantities"]!.AsArray().Select(q => (string)q!).ToList().IndexOf("qb.f01");
        var f01 = json["points"]!.AsArray().Select(p => (double)p!["quantities"]![column]!).ToArray();
        Assert.True(f01[0] > f01[1] && f01[1] > f01[2]);
    }

    [Fact]
    public void TwoAxesMakeAGrid()
    {
        var run = Executable.Run("sweep", Device("pair.toml"), "--vary", "qa_flux=0:0.1:2", "--vary", "qb_flux=0:0.1:3", "--csv", "--levels", "3", "--labels", "order");
        Assert.True(run.ExitCode == 0, run.ToString());
        var rows = run.Stdout.Split('\n', StringSplitOptions.RemoveEmptyEntries).Where(l => !l.StartsWith('#')).ToArray();
        Assert.Equal(["point", "qa_flux (Φ0)", "qb_flux (Φ0)"], ReferenceCsv.Cells(rows[0])[..3]);
        Assert.Equal(1 + 6, rows.Length);
    }

    [Theory]
    [InlineData("sweep", "devices/pair.toml", "--vary", "qc_flux=0:1:5", "--labels", "sideways")]
    [InlineData("sweep", "devices/pair.toml", "--vary", "qc_flux=0mA:1mA:5", "--link", "qb_flux=two*qc_flux")]
    [InlineData("sweep", "devices/pair.toml", "--vary", "qc_flux=0mA:1mA:5", "--link", "qb_flux=1*qz_flux")]
    [InlineData("sweep", "devices/pair.toml", "--vary", "qa_flux=0:1:2", "--vary", "qb_flux=0:1:2", "--vary", "qc_flux=0mA:1mA:2")]
    [InlineData("sweep", "devices/pair.toml", "--vary", "qc_flux=0mA:1mA:5", "--purity", "1.5")]
    [InlineData("crossings", "devices/pair.toml", "--vary", "qc_flux=0mA:1mA:21", "--max-gap", "5 fF")]
    [InlineData("crossings", "devices/pair.toml", "--vary", "qc_flux=0mA:1mA:21", "--near", "nowhere")]
    [InlineData("crossings", "devices/pair.toml", "--vary", "qa_flux=0:1:5", "--vary", "qb_flux=0:1:5")]
    [InlineData("solve", "devices/pair.toml", "--vary", "qc_flux=0mA:1mA", "--target", "zz:qa:qz=0")]
    [InlineData("solve", "devices/pair.toml", "--vary", "qc_flux=0mA:1mA", "--target", "qa.f01=5 fF")]
    [InlineData("solve", "devices/pair.toml", "--vary", "qc_flux=0mA:1mA")]
    [InlineData("fit", "devices/pair.toml", "--param", "qa.ej_sum", "--target", "qa.f01=5.3GHz@nowhere")]
    [InlineData("fit", "devices/pair.toml", "--param", "qa.nothing", "--target", "qa.f01=5.3GHz")]
    [InlineData("fit", "devices/single.toml", "--param", "q.ej_sum", "--target", "q.f01=5.3GHz", "--write")]
    [InlineData("fit", "devices/pair.toml", "--param", "qc.flux=0:0.5", "--target", "qa.f01=5.3GHz", "--write")]
    [InlineData("plot", "devices/pair.toml", "--vary", "qc_flux=0mA:1mA:5", "--out", "picture.gif")]
    [InlineData("plot", "devices/pair.toml", "--vary", "qc_flux=0mA:1mA:5", "--out", "picture.png", "--manifold", "7")]
    public void BadArgumentsExitWithInvalidInput(params string[] args)
    {
        var run = Executable.Run(args);
        Assert.True(run.ExitCode == 2, run.ToString());
        Assert.False(string.IsNullOrWhiteSpace(run.Stderr));
        Assert.DoesNotContain("   at ", run.Stderr + run.Stdout);
    }
}
