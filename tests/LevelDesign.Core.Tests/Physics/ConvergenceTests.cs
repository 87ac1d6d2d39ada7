using LevelDesign.Core.Analysis;
using LevelDesign.Core.Composite;
using LevelDesign.Core.Couplers;
using LevelDesign.Core.Elements;
using LevelDesign.Core.Model;

namespace LevelDesign.Core.Tests.Physics;

public class ConvergenceTests
{
    private static Device Device(int levels) => new("qr",
        [new Transmon("q", 0.25, 15), new Resonator("r", 6.5)],
        [Coupler.Create("c", CouplerKind.Capacitive, "q", "r", new CouplingStrength.TargetG(0.12))],
        new Truncation { DefaultLevels = levels });

    [Fact]
    public void Coarse_truncation_is_flagged_and_fine_truncation_is_not()
    {
        var solver = new DeviceSolver();
        var coarse = TruncationConvergence.Check(solver, Device(3));
        Assert.Contains(coarse, e => e.Flagged && e.Quantity.StartsWith("chi2"));
        var fine = TruncationConvergence.Check(solver, Device(9));
        Assert.DoesNotContain(fine, e => e.Flagged && !double.IsNaN(e.Value));
    }

    [Fact]
    public void Level_lists_are_not_raised_past_their_given_states()
    {
        var defect = new LevelList("tls", new[,] { { 0.0, 0.0 }, { 0.0, 5.1 } }, new Dictionary<string, double[,]> { ["sx"] = new[,] { { 0.0, 1.0 }, { 1.0, 0.0 } } });
        var device = new Device("q-tls", [new Transmon("q", 0.25, 15), defect],
            [Coupler.Create("c", CouplerKind.Custom, "q", "tls", new CouplingStrength.Coefficient(0.01), "n", "sx")],
            new Truncation { DefaultLevels = 4, Levels = new Dictionary<string, int> { ["tls"] = 2 } });
        var entries = TruncationConvergence.Check(new DeviceSolver(), device);
        Assert.Contains(entries, e => e.Quantity == "q.f01" && !e.Flagged);
    }
}
