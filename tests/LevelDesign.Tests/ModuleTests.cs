using System.Text.Json.Nodes;
using LevelDesign.Core.Composite;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Tests.Support;

namespace LevelDesign.Tests;

/// <summary>
/// The module examples (devices/line4.toml, devices/lattice3x3.toml) at full size, the states a module computes by
/// default and on request, and what the output says about them.
/// </summary>
public sealed class ModuleTests
{
    private static DeviceDocument Load(string name)
    {
        var result = DeviceDocument.Load(Path.Combine(RepositoryPaths.Devices, name));
        Assert.True(result.Ok, string.Join("\n", result.Errors));
        return result.Document!;
    }

    [Fact]
    public void Module_examples_have_the_stated_sizes_and_pass_the_memory_guard()
    {
        // C(16, 5) = 4,368 less the 4 states with a five-level resonator at level 5; C(34, 4) = 46,376 (every element ≥ 5 levels)
        Assert.Equal(4_364, Load("line4.toml").CompositeDimension);
        Assert.Equal(46_376, Load("lattice3x3.toml").CompositeDimension);
    }

    [Fact]
    public void Neighbours_of_the_lattice_are_its_twelve_edges_and_nine_readouts()
    {
        var device = Load("lattice3x3.toml").Device;
        var (qubits, zz, chi) = StateSelection.Graph(device);
        Assert.Equal(["qa", "qb", "qc", "qd", "qe", "qf", "qg", "qh", "qi"], qubits.Select(q => device.Elements[q].Id));
        var edges = zz.Select(p => device.Elements[p.Item1].Id + device.Elements[p.Item2].Id).Order().ToArray();
        // qa qb qc / qd qe qf / qg qh qi: six horizontal and six vertical edges, no diagonals
        Assert.Equal(["qaqb", "qaqd", "qbqc", "qbqe", "qcqf", "qdqe", "qdqg", "qeqf", "qeqh", "qfqi", "qgqh", "qhqi"], edges);
        Assert.Equal(9, chi.Count);
        Assert.All(chi, p => Assert.Equal(device.Elements[p.Item1].Id[1..], device.Elements[p.Item2].Id[1..]));
    }

    [Theory]
    [InlineData("auto")]
    [InlineData("neighbours")]
    [InlineData("excitations:2")]
    [InlineData("below:12GHz")]
    [InlineData("zz,chi2")]
    [InlineData("zz:qa:qb, chi2:qa:ra ,qa.anharmonicity")]
    public void Selections_parse(string text) => Assert.True(StateSelection.TryParse(text, out _, out string error), error);

    [Theory]
    [InlineData("excitations:x")]
    [InlineData("below:12 V")]
    [InlineData("zz:qa")]
    [InlineData("everything")]
    public void Bad_selections_are_refused_with_what_is_accepted(string text)
    {
        Assert.False(StateSelection.TryParse(text, out _, out string error));
        Assert.Contains(text.Split(',')[0], error);
    }

    [Fact]
    public void Large_module_by_default_computes_the_neighbours_states_only()
    {
        // The lattice at 3 excitations (5,456 states): prepared, not solved. Every state up to two excitations would be
        // 496 eigenpairs; the neighbours need those up to the highest neighbouring pair or second excitation.
        var document = Load("lattice3x3.toml");
        var device = document.Device with { Truncation = document.Device.Truncation with { MaxExcitations = 3 } };
        var problem = new DeviceSolver().Prepare(device);
        var selected = StateSelection.Auto.Resolve(problem);
        Assert.Contains("neighbouring", selected.Description);
        Assert.True(StateSelection.TryParse("excitations:2", out var manifold, out _));
        int all = manifold.Resolve(problem).Count;
        Assert.True(all > StateSelection.AutoManifoldLimit);
        Assert.InRange(selected.Count, 31 + 12, all / 4);   // ground, 30 single excitations, the pairs; far fewer than all
        Assert.Equal(12 + 9, selected.Pairs!.Count);   // twelve edges, nine qubit–own-resonator pairs
    }

    [Fact]
    public void States_option_asks_for_dispersive_shifts_of_own_resonators()
    {
        var run = Executable.Run("spectrum", ExampleDevices.Path("line4.toml"), "--json", "--states", "chi2:qa:ra,zz:qa:qb");
        Assert.True(run.ExitCode == 0, run.ToString());
        var json = JsonNode.Parse(run.Stdout)!;
        var chi = Assert.Single(json["derived"]!["dispersive_shifts"]!.AsArray());
        Assert.Equal("ra", (string)chi!["resonator"]!);
        Assert.True(double.IsFinite((double)chi["chi2_ghz"]!));
        Assert.Single(json["derived"]!["zz"]!.AsArray());
        var computed = json["computed"]!;
        Assert.Equal("chi2:qa:ra, zz:qa:qb", (string)computed["selection"]!);
        Assert.Contains("Davidson", (string)computed["solver"]!);   // 1,365 states: the sparse path
        Assert.InRange((double)computed["max_residual_ghz"]!, 0, 1e-5);

        var table = Executable.Run("spectrum", ExampleDevices.Path("line4.toml"), "--levels", "3");
        Assert.Contains("largest residual ‖Hx − Ex‖", table.Stdout);

        var bad = Executable.Run("spectrum", ExampleDevices.Path("line4.toml"), "--states", "zz:qa:nowhere");
        Assert.Equal(2, bad.ExitCode);   // an input error, found before computing
        Assert.Contains("nowhere", bad.Stderr);
        Assert.DoesNotContain("   at ", bad.Stderr);
    }

}
