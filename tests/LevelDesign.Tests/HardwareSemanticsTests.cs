using System.Text.Json.Nodes;
using LevelDesign.Tests.Support;

namespace LevelDesign.Tests;

/// <summary>
/// What a sweep means on the demo chip: couplings fixed as hardware, results that carry the purity of their states,
/// warnings a designer needs. Run as the built executable.
/// </summary>
public sealed class HardwareSemanticsTests
{
    private static string Pair => Path.Combine(RepositoryPaths.Devices, "pair.toml");

    /// <summary>
    /// The qubit–coupler avoided crossings along coupler_scan with every coefficient fixed at its value at the file's own
    /// point: 185.86 and 173.21 MHz, as an independent numpy rebuild of the model with fixed coefficients gives
    /// (a g held fixed instead gave 198.73 and 194.67 MHz). Within 0.1 MHz.
    /// </summary>
    [Fact]
    public void Pair_crossing_gaps_are_those_of_fixed_couplings()
    {
        var run = Executable.Run(["crossings", Pair, "--sweep", "coupler_scan", "--json"], TimeSpan.FromMinutes(5));
        Assert.True(run.ExitCode == 0, run.ToString());
        var crossings = JsonNode.Parse(run.Stdout)!["crossings"]!.AsArray();
        double Gap(string a, string b) => (double)crossings.Single(c => (string)c!["state_a"]! == a && (string)c["state_b"]! == b)!["gap_mhz"]!;
        Assert.Equal(185.86, Gap("qa1", "qc1"), 0.1);
        Assert.Equal(173.21, Gap("qb1", "qc1"), 0.1);
    }

    [Fact]
    public void Symmetric_squid_at_half_flux_computes_and_warns_about_its_cut_doublet()
    {
        var run = Executable.Run("spectrum", Pair, "--at", "qc.flux=0.5", "--json");
        Assert.True(run.ExitCode == 0, run.ToString());
        Assert.Contains("element 'qc': its 6 kept levels end inside a degenerate multiplet", run.Stderr);
        var report = JsonNode.Parse(run.Stdout)!;
        Assert.Contains("set levels = 7", (string)report["warnings"]![0]!);
        var couplings = report["couplings"]!.AsArray();
        var qaQc = couplings.Single(c => (string)c!["id"]! == "qa_qc")!;
        Assert.Equal("reference", (string)qaQc["converted_at"]!);
        Assert.Equal(0, (double)qaQc["g_here_ghz"]!, 9);   // E_J = 0 at n_g = 0: no 0↔1 charge matrix element
    }

    [Fact]
    public void Describe_gives_the_fixed_coefficient_its_point_and_g_here()
    {
        var atRef = JsonNode.Parse(Executable.Run("describe", Pair, "--json").Stdout)!["couplers"]!.AsArray();
        var atLow = JsonNode.Parse(Executable.Run("describe", Pair, "--json", "--point", "coupler_low").Stdout)!["couplers"]!.AsArray();
        for (int i = 0; i < atRef.Count; i++)
        {
            Assert.Equal((double)atRef[i]!["coefficient_ghz"]!, (double)atLow[i]!["coefficient_ghz"]!, 15);
            Assert.Equal("reference", (string)atRef[i]!["converted_at"]!);
            Assert.Equal((double)atRef[i]!["given_as"]!["g_ghz"]!, (double)atRef[i]!["g_here_ghz"]!, 12);
        }
        var qaQc = atLow.Single(c => (string)c!["id"]! == "qa_qc")!;
        Assert.True((double)qaQc["g_here_ghz"]! < 0.1, "the coupler's E_J is lower at coupler_low, so is its charge matrix element and g");
    }

    /// <summary>The README's example: the one ZZ zero of the coupler flux lies where |qa1 qb1⟩ is hybridized.</summary>
    [Fact]
    public void Solve_lists_a_root_inside_a_hybridized_region_apart()
    {
        var run = Executable.Run(["solve", Pair, "--vary", "qc_flux=0.15mA:1.05mA:31", "--target", "zz:qa:qb=0"], TimeSpan.FromMinutes(5));
        Assert.True(run.ExitCode == 0, run.ToString());
        Assert.Contains("no clean root in this range", run.Stdout);
        Assert.Contains("1 root(s) inside a hybridized region", run.Stdout);
        Assert.Contains("lie inside a hybridized region", run.Stderr);
        var json = Executable.Run(["solve", Pair, "--vary", "qc_flux=0.15mA:1.05mA:31", "--target", "zz:qa:qb=0", "--json", "--purity", "0.5"], TimeSpan.FromMinutes(5));
        var root = JsonNode.Parse(json.Stdout)!["roots"]!.AsArray().Single(r => (bool)r!["root"]!)!;
        Assert.InRange((double)root["purity"]!, 0.5, 0.9);
        Assert.False((bool)root["hybridized"]!);   // with a threshold of 0.5 it counts as clean
    }

    [Fact]
    public void Spectrum_flags_quantities_read_from_hybridized_states()
    {
        var run = Executable.Run("spectrum", Pair, "--point", "coupler_low", "--json", "--purity", "0.99");
        Assert.True(run.ExitCode == 0, run.ToString());
        var derived = JsonNode.Parse(run.Stdout)!["derived"]!;
        Assert.Equal(0.99, (double)derived["purity_threshold"]!);
        foreach (var z in derived["zz"]!.AsArray())
            Assert.Equal((double)z!["purity"]! < 0.99, (bool)z["hybridized"]!);
        Assert.Contains(derived["zz"]!.AsArray(), z => (bool)z!["hybridized"]!);
    }

    [Fact]
    public void Sweep_lists_quantity_purities_and_linked_targets()
    {
        var run = Executable.Run("sweep", Pair, "--vary", "qa_flux=0:0.2:3", "--link", "qb_flux=1.0*qa_flux+0.05", "--json");
        Assert.True(run.ExitCode == 0, run.ToString());
        var o = JsonNode.Parse(run.Stdout)!;
        var quantities = o["quantities"]!.AsArray();
        var point = o["points"]![2]!;
        Assert.Equal(quantities.Count, point["quantity_purities"]!.AsArray().Count);
        Assert.Equal(0.2, (double)point["parameters"]!["qa.flux"]!, 12);
        Assert.Equal(0.25, (double)point["parameters"]!["qb.flux"]!, 12);
    }

    [Fact]
    public void A_g_that_cannot_be_converted_is_reported_at_its_line()
    {
        string dir = Directory.CreateTempSubdirectory("ld-g").FullName;
        try
        {
            string text = File.ReadAllText(Pair).Replace("value = \"0.15 mA\"          # coil current", "value = \"1.35 mA\"          # coil current");
            Assert.Contains("1.35 mA", text);   // qc at 0.5 Φ0 (symmetric SQUID, E_J = 0) at the reference point
            string path = Path.Combine(dir, "half.toml");
            File.WriteAllText(path, text);
            var run = Executable.Run("check", path);
            Assert.Equal(2, run.ExitCode);
            int line = File.ReadAllLines(path).ToList().FindIndex(l => l.StartsWith("g = \"100 MHz\"")) + 1;
            Assert.Contains($"{path}:{line}:", run.Stdout);
            Assert.Contains("g_at", run.Stdout);
            Assert.DoesNotContain(":0:0:", run.Stdout);
        }
        finally { Directory.Delete(dir, true); }
    }

    /// <summary>A relative target: qb tuned 700 MHz below qa; the root's own spectrum must show that difference.</summary>
    [Fact]
    public void Solve_takes_a_difference_of_quantities()
    {
        var run = Executable.Run(["solve", Pair, "--vary", "qb_flux=0:0.3:21", "--target", "qa.f01 - qb.f01=700MHz", "--json"], TimeSpan.FromMinutes(5));
        Assert.True(run.ExitCode == 0, run.ToString());
        var o = JsonNode.Parse(run.Stdout)!;
        Assert.Equal("qa.f01 - qb.f01", (string)o["quantity"]!);
        var root = o["roots"]!.AsArray().Single(r => (bool)r!["root"]!)!;
        double flux = (double)root["parameter"]!["qb.flux"]!;
        var spectrum = JsonNode.Parse(Executable.Run("spectrum", Pair, "--at", $"qb.flux={flux.ToString("R", System.Globalization.CultureInfo.InvariantCulture)}", "--json").Stdout)!;
        double F01(string id) => (double)spectrum["derived"]!["transitions"]!.AsArray().Single(t => (string)t!["element"]! == id)!["f01_ghz"]!;
        Assert.Equal(0.7, F01("qa") - F01("qb"), 1e-9);
        var bad = Executable.Run("solve", Pair, "--vary", "qb_flux=0:0.3:5", "--target", "qa.f01 - qz.f01=700MHz");
        Assert.Equal(2, bad.ExitCode);
        Assert.Contains("no quantity 'qz.f01'", bad.Stderr);
    }

    [Fact]
    public void An_unknown_element_in_states_is_an_input_error()
    {
        foreach (var args in new[] { new[] { "spectrum", Pair, "--states", "zz:qa:qz" }, new[] { "sweep", Pair, "--vary", "qa_flux=0:0.1:2", "--states", "qx.anharmonicity" } })
        {
            var run = Executable.Run(args);
            Assert.Equal(2, run.ExitCode);
            Assert.Contains("no element", run.Stderr);
        }
    }
}
