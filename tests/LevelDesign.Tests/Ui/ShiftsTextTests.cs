using LevelDesign.Core.Couplers;
using LevelDesign.Core.Elements;
using LevelDesign.Core.Model;
using LevelDesign.Ui.Compute;
using LevelDesign.Ui.Text;

namespace LevelDesign.Tests.Ui;

/// <summary>The shifts page text carries J_eff and, once the full point is computed, the coherence budget's T1/T2.</summary>
public sealed class ShiftsTextTests
{
    private static Device Pair() => new("kk",
        [new KerrOscillator("a", 5.0, -0.25, Ec: 0.25), new KerrOscillator("b", 5.4, -0.22, Ec: 0.22), new Resonator("r", 7.0, Kappa: 0.001)],
        [Coupler.Create("ab", CouplerKind.Exchange, "a", "b", new CouplingStrength.Coefficient(0.01)),
         Coupler.Create("ar", CouplerKind.Exchange, "a", "r", new CouplingStrength.Coefficient(0.05))],
        new Truncation { DefaultLevels = 4 });

    [Fact]
    public void Full_point_shows_jeff_and_coherence_times()
    {
        var snapshot = PointComputer.Compute(Pair(), checkConvergence: true, CancellationToken.None);
        Assert.NotNull(snapshot.Coherence);
        var text = ShiftsText.Build(snapshot.Quantities, "here", snapshot.Convergence, snapshot.Spectrum.Device, null, 100, snapshot.Coherence)
            .Select(l => l.Text).ToArray();
        Assert.Contains(text, l => l.StartsWith("J_eff"));
        double jeff = snapshot.Quantities.EffectiveHamiltonians.Single().JEff;
        Assert.Contains(text, l => l.TrimStart().StartsWith("a ") && l.Contains(Numbers.MHz(jeff, 4)));
        Assert.Contains(text, l => l.Contains("confirm by measurement"));
        var budgetA = snapshot.Coherence!.Single(b => b.Qubit == "a");
        Assert.Contains(text, l => l.TrimStart().StartsWith("a ") && l.Contains((budgetA.T1Seconds * 1e6).ToString("G4", System.Globalization.CultureInfo.InvariantCulture))
            && l.Contains(budgetA.DominantT2!.Name));
    }

    [Fact]
    public void Quick_point_has_no_coherence_section()
    {
        var snapshot = PointComputer.Compute(Pair(), checkConvergence: false, CancellationToken.None);
        Assert.Null(snapshot.Coherence);
        var text = ShiftsText.Build(snapshot.Quantities, "here").Select(l => l.Text);
        Assert.DoesNotContain(text, l => l.Contains("confirm by measurement"));
    }
}
