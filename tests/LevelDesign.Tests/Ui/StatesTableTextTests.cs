using LevelDesign.Core.Composite;
using LevelDesign.Core.Couplers;
using LevelDesign.Core.Elements;
using LevelDesign.Core.Model;
using LevelDesign.Ui.Text;

namespace LevelDesign.Tests.Ui;

public sealed class StatesTableTextTests
{
    /// <summary>
    /// Two exchange-coupled oscillators, g = 40 MHz, Δ = 300 MHz: the lower single-excitation state's partner weight is
    /// sin²θ with tan 2θ = 2g/Δ (exact in the one-excitation block, which the exchange form does not leave), 1.7 %;
    /// two decimals would round it to 0.02 next to 0.98, three show it as it is.
    /// </summary>
    [Fact]
    public void Component_weights_show_a_one_percent_admixture_with_three_decimals()
    {
        var device = new Device("two", [new KerrOscillator("a", 5.0, -0.25), new KerrOscillator("b", 5.3, -0.22)],
            [Coupler.Create("ab", CouplerKind.Exchange, "a", "b", new CouplingStrength.Coefficient(0.04))],
            new Truncation { DefaultLevels = 3 });
        var spectrum = new DeviceSolver().Solve(device);
        var lines = StatesTableText.Build(spectrum, "here", 100).Select(l => l.Text).ToArray();
        double theta = 0.5 * Math.Atan2(2 * 0.04, 0.3);
        double admixture = Math.Sin(theta) * Math.Sin(theta);
        string expected = admixture.ToString("0.000", System.Globalization.CultureInfo.InvariantCulture);
        var row = Assert.Single(lines, l => l.TrimStart().StartsWith("1 a1 "));
        Assert.Contains($"b1 {expected}", row);
        Assert.Contains($"a1 {(1 - admixture).ToString("0.000", System.Globalization.CultureInfo.InvariantCulture)}", row);
    }
}
