using LevelDesign.Core.Couplers;
using LevelDesign.Core.Elements;
using LevelDesign.Core.Model;

namespace LevelDesign.Tests.Support;

/// <summary>A tunable qubit exchange-coupled (g = 50 MHz) to a 5.6 GHz resonator, three levels each: the smallest swept device.</summary>
public static class QubitAndResonator
{
    public static Device Build() => new("demo",
        [new TunableTransmon("q", 0.2, 30, 0.35, 0), new Resonator("r", 5.6)],
        [Coupler.Create("g", CouplerKind.Exchange, "q", "r", new CouplingStrength.Coefficient(0.05))],
        new Truncation { DefaultLevels = 3 });
}
