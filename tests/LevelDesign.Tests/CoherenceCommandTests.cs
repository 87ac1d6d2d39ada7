using System.Text.Json.Nodes;
using LevelDesign.Tests.Support;

namespace LevelDesign.Tests;

/// <summary>coherence, effective and matrix run as a process on the example devices.</summary>
public sealed class CoherenceCommandTests
{
    private static string Device(string name) => Path.Combine(RepositoryPaths.Devices, name);

    private static JsonNode Json(CommandResult run)
    {
        Assert.True(run.ExitCode == 0, run.ToString());
        return JsonNode.Parse(run.Stdout)!;
    }

    private static double Rate(JsonNode qubit, string channel) =>
        (double)qubit["channels"]!.AsArray().Single(c => (string)c!["name"]! == channel)!["rate_per_s"]!;

    [Fact]
    public void Coherence_json_names_every_channel_with_formula_source_and_the_caution()
    {
        var json = Json(Executable.Run("coherence", Device("single.toml"), "--json"));
        Assert.Contains("confirm by measurement", (string)json["note"]!);
        Assert.All(json["inputs"]!.AsArray(), i => Assert.False(string.IsNullOrEmpty((string)i!["meaning"]!)));
        Assert.Contains(json["inputs"]!.AsArray(), i => ((string)i!["meaning"]!).Contains("common practice"));
        var q = json["qubits"]!.AsArray().Single()!;
        Assert.Equal("q", (string)q["qubit"]!);
        var names = q["channels"]!.AsArray().Select(c => (string)c!["name"]!).ToArray();
        Assert.Equal(["Purcell (r)", "dielectric loss", "flux noise, 1st order (q.flux)", "flux noise, 2nd order (q.flux)", "charge noise", "thermal photons (r)"], names);
        foreach (var c in q["channels"]!.AsArray())
        {
            Assert.False(string.IsNullOrEmpty((string)c!["formula"]!));
            Assert.False(string.IsNullOrEmpty((string)c["source"]!));
            Assert.True((double)c["rate_per_s"]! >= 0);
        }
        double t1 = (double)q["t1_us"]!, tphi = (double)q["tphi_us"]!, t2 = (double)q["t2_us"]!;
        Assert.Equal(1 / (1 / (2 * t1) + 1 / tphi), t2, 9);
        // off the sweet spot (flux 0.1) first-order flux noise limits T2
        Assert.Equal("flux noise, 1st order (q.flux)", (string)q["dominant_t2"]!);
    }

    [Fact]
    public void Coherence_inputs_reach_their_channels()
    {
        var baseline = Json(Executable.Run("coherence", Device("single.toml"), "--json"))["qubits"]![0]!;
        var changed = Json(Executable.Run("coherence", Device("single.toml"), "--json", "--q-cap", "2e6", "--flux-noise", "4e-6",
            "--resonator-temperature", "0mK"))["qubits"]![0]!;
        Assert.Equal(Rate(baseline, "dielectric loss") / 2, Rate(changed, "dielectric loss"), 6);
        Assert.Equal(Rate(baseline, "flux noise, 1st order (q.flux)") * 2, Rate(changed, "flux noise, 1st order (q.flux)"), 6);
        Assert.Equal(0, Rate(changed, "thermal photons (r)"));
    }

    [Fact]
    public void The_device_files_coherence_table_sets_inputs_and_options_override_it()
    {
        string dir = Directory.CreateTempSubdirectory("coherence-table").FullName;
        try
        {
            string file = Path.Combine(dir, "single.toml");
            File.WriteAllText(file, File.ReadAllText(Device("single.toml")) + "\n[coherence]\nq_cap = 3e6\nqubit_temperature = \"30 mK\"\n");
            double Input(JsonNode json, string name) => (double)json["inputs"]!.AsArray().Single(i => (string)i!["name"]! == name)!["value"]!;
            var fromFile = Json(Executable.Run("coherence", file, "--json"));
            Assert.Equal(3e6, Input(fromFile, "q_cap"));
            Assert.Equal(0.030, Input(fromFile, "qubit_temperature"), 12);
            Assert.Equal(2e-6, Input(fromFile, "flux_noise"));   // not in the table: the default
            var overridden = Json(Executable.Run("coherence", file, "--json", "--q-cap", "5e5"));
            Assert.Equal(5e5, Input(overridden, "q_cap"));
            Assert.Equal(0.030, Input(overridden, "qubit_temperature"), 12);
        }
        finally { Directory.Delete(dir, recursive: true); }
    }

    [Theory]
    [InlineData("--qubit-temperature", "hot", "--qubit-temperature hot")]
    [InlineData("--q-cap", "-5", "q_cap must be")]
    [InlineData("--infrared-cutoff", "1", "give a unit")]
    public void Bad_coherence_inputs_exit_2_with_the_option_named(string option, string value, string fragment)
    {
        var run = Executable.Run("coherence", Device("single.toml"), option, value);
        Assert.Equal(2, run.ExitCode);
        Assert.Contains(fragment, run.Stderr);
        Assert.DoesNotContain("   at ", run.Stderr);
    }

    [Fact]
    public void Coherence_along_a_sweep_writes_one_row_per_point()
    {
        var run = Executable.Run("coherence", Device("single.toml"), "--vary", "q_flux=0:0.3:3");
        Assert.True(run.ExitCode == 0, run.ToString());
        var lines = run.Stdout.Split('\n', StringSplitOptions.RemoveEmptyEntries).Where(l => !l.StartsWith('#')).ToArray();
        Assert.Equal("q_flux,q.f01_ghz,q.t1_us,q.tphi_us,q.t2_us,q.dominant_t2", lines[0]);
        Assert.Equal(4, lines.Length);
        Assert.Contains("confirm by measurement", run.Stdout);
    }

    [Fact]
    public void Effective_json_agrees_with_the_spectrum_and_reports_purity()
    {
        var json = Json(Executable.Run("effective", Device("pair.toml"), "--json"));
        var pairs = json["pairs"]!.AsArray();
        Assert.Equal(["qa:qb", "qa:qc", "qb:qc"], pairs.Select(p => $"{p!["qubits"]![0]}:{p["qubits"]![1]}"));
        var ab = pairs[0]!;
        Assert.False((bool)ab["ill_conditioned"]!);
        Assert.Equal(4, ab["purities"]!.AsArray().Count);
        // J_eff = Re⟨10|H|01⟩ (basis 00, 01, 10, 11)
        Assert.Equal((double)ab["matrix_real_ghz"]![2]![1]!, (double)ab["jeff_ghz"]!, 12);
        var spectrum = Json(Executable.Run("spectrum", Device("pair.toml"), "--json"));
        double zz = (double)spectrum["derived"]!["zz"]!.AsArray().Single(z => (string)z!["first"]! == "qa" && (string)z["second"]! == "qb")!["zz_ghz"]!;
        Assert.Equal(zz, (double)ab["zz_ghz"]!, 9);
    }

    [Fact]
    public void Effective_warns_when_computational_states_are_hybridized()
    {
        // the coupler tuned down among the qubits: the labelled states mix with coupler excitations
        var run = Executable.Run("effective", Device("pair.toml"), "--pair", "qa:qb", "--at", "qc_flux=0.7842mA");
        Assert.True(run.ExitCode == 0, run.ToString());
        Assert.Contains("ill-conditioned", run.Stdout);
        Assert.Contains("ill-conditioned", run.Stderr);
    }

    [Fact]
    public void Matrix_elements_are_hermitian_and_bad_operators_are_named()
    {
        var json = Json(Executable.Run("matrix", Device("pair.toml"), "qa.n", "--states", "4", "--json"));
        var elements = json["elements"]!.AsArray();
        Assert.Equal(16, elements.Count);
        double Abs(int i, int j) => (double)elements.Single(e => (int)e!["i"]! == i && (int)e["j"]! == j)!["abs"]!;
        for (int i = 0; i < 4; i++)
            for (int j = 0; j < 4; j++) Assert.Equal(Abs(i, j), Abs(j, i), 12);
        var bad = Executable.Run("matrix", Device("pair.toml"), "qa.phi");
        Assert.Equal(2, bad.ExitCode);
        Assert.Contains("has no operator 'phi'", bad.Stderr);
    }

    [Fact]
    public void Solve_targets_jeff_and_flags_an_ill_conditioned_root()
    {
        var run = Executable.Run("solve", Device("pair.toml"), "--vary", "qc_flux=0.76mA:0.80mA:5", "--target", "jeff:qa:qb=0");
        Assert.True(run.ExitCode == 0, run.ToString());
        Assert.Contains("jeff:qa:qb =", run.Stdout);
        Assert.Contains("ill-conditioned", run.Stderr);
    }
}
