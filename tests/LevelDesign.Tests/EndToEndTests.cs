using System.Text.Json.Nodes;
using LevelDesign.Tests.Support;

namespace LevelDesign.Tests;

/// <summary>Runs the built executable on every example device, for every command, and reads its output.</summary>
public sealed class EndToEndTests
{
    public static TheoryData<string> Devices() => ExampleDeviceTests.Devices();

    private static string DevicePath(string name) => ExampleDevices.Path(name);

    [Theory]
    [MemberData(nameof(Devices))]
    public void CheckSaysOk(string name)
    {
        var run = Executable.Run("check", DevicePath(name));
        Assert.True(run.ExitCode == 0, run.ToString());
        Assert.Matches(@"^ok: \d+ elements, \d+ couplers, composite dimension \d+\s*$", run.Stdout);
    }

    [Theory]
    [MemberData(nameof(Devices))]
    public void DescribeGivesEveryElementAndCoupler(string name)
    {
        var run = Executable.Run("describe", DevicePath(name), "--json");
        Assert.True(run.ExitCode == 0, run.ToString());
        var json = JsonNode.Parse(run.Stdout)!;
        var document = Core.DeviceFiles.DeviceDocument.Load(DevicePath(name)).Document!;
        Assert.Equal(document.Device.Elements.Count, json["elements"]!.AsArray().Count);
        Assert.Equal(document.Device.Couplers.Count, json["couplers"]!.AsArray().Count);
        foreach (var e in json["elements"]!.AsArray())
        {
            Assert.NotNull(e!["kind"]);
            Assert.True((int)e["basis"]!["size"]! >= (int)e["levels_kept"]!);
            Assert.NotEmpty(e["parameters"]!.AsObject());
        }
        foreach (var c in json["couplers"]!.AsArray())
        {
            Assert.True(double.IsFinite((double)c!["coefficient_ghz"]!));
            Assert.Contains((string)c["form"]!, new[] { "full", "exchange" });
        }
        Assert.True((int)json["truncation"]!["composite_dimension"]! > 1);
    }

    [Theory]
    [MemberData(nameof(Devices))]
    public void SpectrumJsonHasStatesDerivedQuantitiesAndConventions(string name)
    {
        var run = Executable.Run("spectrum", DevicePath(name), "--json", "--levels", "6");
        Assert.True(run.ExitCode == 0, run.ToString());
        var json = JsonNode.Parse(run.Stdout)!;
        var states = json["states"]!.AsArray();
        Assert.Equal(6, states.Count);
        Assert.Equal(0.0, (double)states[0]!["energy_ghz"]!);
        for (int k = 1; k < states.Count; k++)
            Assert.True((double)states[k]!["energy_ghz"]! >= (double)states[k - 1]!["energy_ghz"]!);
        foreach (var s in states)
        {
            double purity = (double)s!["purity"]!;
            Assert.InRange(purity, 0, 1 + 1e-12);
            Assert.NotEmpty(s["components"]!.AsArray());
        }
        // f01 reported among the derived quantities equals the energy of the state labelled with that element in 1.
        foreach (var t in json["derived"]!["transitions"]!.AsArray())
        {
            string id = (string)t!["element"]!;
            var state = states.FirstOrDefault(s => (string)s!["text"]! == id + "1");
            if (state is not null) Assert.Equal((double)state["energy_ghz"]!, (double)t["f01_ghz"]!, 1e-9);
        }
        foreach (var key in new[] { "energies", "transitions", "dispersive_shift", "zz", "purity", "purcell", "lamb_shift" })
            Assert.False(string.IsNullOrWhiteSpace((string?)json["conventions"]![key]), key);
        Assert.StartsWith("eigensolver:", (string)json["eigensolver"]!);
        Assert.Contains("Limits of the model", (string)json["limits_of_model"]!);
    }

    [Theory]
    [MemberData(nameof(Devices))]
    public void SpectrumTableAndCsv(string name)
    {
        var table = Executable.Run("spectrum", DevicePath(name));
        Assert.True(table.ExitCode == 0, table.ToString());
        Assert.Contains("Dressed states", table.Stdout);
        Assert.Contains("Limits of the model", table.Stdout);
        Assert.Contains("eigensolver:", table.Stdout);

        var csv = Executable.Run("spectrum", DevicePath(name), "--csv", "--levels", "4");
        Assert.True(csv.ExitCode == 0, csv.ToString());
        var lines = csv.Stdout.TrimEnd().Split('\n');
        Assert.Equal("index,label,energy_ghz,purity,ambiguous,components", lines[0]);
        Assert.Equal(5, lines.Length);
        Assert.StartsWith("0,ground,0,", lines[1]);
    }

    [Theory]
    [MemberData(nameof(Devices))]
    public void SweepOverTheFirstBias(string name)
    {
        var document = Core.DeviceFiles.DeviceDocument.Load(DevicePath(name)).Document!;
        var bias = document.Biases[0];
        string from = bias.ToControl(document.Device.GetParameter(bias.Target)).ToString("R", System.Globalization.CultureInfo.InvariantCulture);
        string unit = bias.ControlKind == Core.Units.UnitKind.Current ? "A" : bias.ControlKind == Core.Units.UnitKind.Frequency ? "GHz" : "";
        var run = Executable.Run("sweep", DevicePath(name), "--vary", $"{bias.Name}={from}{unit}:{from}{unit}:3", "--json", "--levels", "4");
        Assert.True(run.ExitCode == 0, run.ToString());
        var json = JsonNode.Parse(run.Stdout)!;
        Assert.True((bool)json["completed"]!);
        var points = json["points"]!.AsArray();
        Assert.Equal(3, points.Count);
        Assert.Equal(4, json["labels"]!.AsArray().Count);
        // Three identical points must give identical spectra, and the ground state sits at 0 with the energies rising.
        var first = points[0]!["energies"]!.AsArray().Select(e => (double)e!).ToArray();
        var last = points[2]!["energies"]!.AsArray().Select(e => (double)e!).ToArray();
        for (int k = 0; k < first.Length; k++) Assert.Equal(first[k], last[k], 1e-9);
        Assert.Equal(0.0, first[0], 12);
        Assert.Equal(json["quantities"]!.AsArray().Count, points[0]!["quantities"]!.AsArray().Count);
        Assert.Contains("progress", run.Stderr);
    }

    [Fact]
    public void SweepDefinedInTheFileToCsvFile()
    {
        string output = Path.Combine(Path.GetTempPath(), $"leveldesign-sweep-{Guid.NewGuid():N}.csv");
        try
        {
            var run = Executable.Run("sweep", DevicePath("single.toml"), "--vary", "q_flux=0:0.5:6", "--out", output, "--csv");
            Assert.True(run.ExitCode == 0, run.ToString());
            var lines = File.ReadAllLines(output).Where(l => !l.StartsWith('#')).ToArray();
            Assert.Equal(7, lines.Length);
            var header = ReferenceCsv.Cells(lines[0]);
            Assert.Equal(["point", "q_flux (Φ0)"], header[..2]);   // the unit the file writes the bias in
            int column = Array.IndexOf(header, "q.f01 (GHz)");
            Assert.True(column > 0, lines[0]);
            // The tunable transmon's f01 falls monotonically from 0 to Φ0/2 (E_J(Φ) falls; Koch et al. 2007).
            var f01 = lines.Skip(1).Select(l => double.Parse(ReferenceCsv.Cells(l)[column], System.Globalization.CultureInfo.InvariantCulture)).ToList();
            for (int i = 1; i < f01.Count; i++) Assert.True(f01[i] < f01[i - 1]);
        }
        finally
        {
            File.Delete(output);
        }
    }

    [Fact]
    public void NoArgumentWithoutATerminalExplainsInsteadOfDrawing()
    {
        var run = Executable.Run();
        Assert.Equal(2, run.ExitCode);
        Assert.Contains("terminal UI needs an interactive terminal", run.Stderr);
    }

    [Theory]
    [InlineData("spectrum", "devices/pair.toml", "--at", "qz_flux=0.1")]
    [InlineData("spectrum", "devices/pair.toml", "--at", "qc_flux=0.1 V")]
    [InlineData("spectrum", "devices/pair.toml", "--point", "nowhere")]
    [InlineData("sweep", "devices/pair.toml", "--vary", "qc_flux=0:1")]
    [InlineData("check", "devices/missing.toml")]
    [InlineData("spectrum", "devices/pair.toml", "--no-such-option")]
    public void BadArgumentsExitWithInvalidInput(params string[] args)
    {
        var run = Executable.Run(args);
        Assert.True(run.ExitCode == 2, run.ToString());
        Assert.DoesNotContain("   at ", run.Stderr + run.Stdout);
    }

    [Fact]
    public void AtMovesTheBiasInItsControlUnit()
    {
        var idle = JsonNode.Parse(Executable.Run("describe", DevicePath("pair.toml"), "--json").Stdout)!;
        var low = JsonNode.Parse(Executable.Run("describe", DevicePath("pair.toml"), "--json", "--at", "qc_flux=0.75mA").Stdout)!;
        double Flux(JsonNode j) => (double)j["elements"]!.AsArray().Single(e => (string)e!["id"]! == "qc")!["parameters"]!["flux"]!;
        Assert.Equal(0.0, Flux(idle), 12);
        Assert.Equal(0.25, Flux(low), 12); // (0.75 − 0.15) mA / 2.4 mA per Φ0
    }
}
