using LevelDesign.Core.Couplers;
using LevelDesign.Core.Elements;
using LevelDesign.Core.Model;

namespace LevelDesign.Core.Tests.Sweeps;

/// <summary>Small invented devices for sweep tests.</summary>
internal static class SweepDevices
{
    /// <summary>A two-level system (level list, energies 0 and <paramref name="qubit"/>) exchange-coupled to a resonator: Jaynes–Cummings.</summary>
    public static Device JaynesCummings(double qubit, double resonator, double g) => new("jc",
        [new LevelList("tls", new double[,] { { 0, 0 }, { 0, qubit } }, new Dictionary<string, double[,]>()),
         new Resonator("r", resonator)],
        [Coupler.Create("g_tls_r", CouplerKind.Exchange, "tls", "r", new CouplingStrength.Coefficient(g))],
        new Truncation { Levels = new Dictionary<string, int> { ["tls"] = 2, ["r"] = 5 } });

    /// <summary>Two Kerr oscillators with exchange J.</summary>
    public static Device KerrPair(double wa, double wb, double j) => new("pair",
        [new KerrOscillator("a", wa, -0.25), new KerrOscillator("b", wb, -0.25)],
        [Coupler.Create("j", CouplerKind.Exchange, "a", "b", new CouplingStrength.Coefficient(j))],
        new Truncation { DefaultLevels = 3 });

    /// <summary>
    /// Two tunable transmons, a tunable-transmon coupler and two resonators, capacitively coupled (counter-rotating
    /// terms kept). <paramref name="levels"/>/<paramref name="maxExcitations"/> set the composite size.
    /// </summary>
    public static Device FiveElements(int levels = 5, int maxExcitations = 4, double couplerFlux = 0.2) => new("five",
        [
            new TunableTransmon("qa", 0.20, 22.0, 0.2, 0.05),
            new TunableTransmon("qb", 0.21, 20.0, 0.3, 0.1),
            new TunableTransmon("c", 0.18, 45.0, 0.0, couplerFlux),
            new Resonator("ra", 7.1),
            new Resonator("rb", 7.3),
        ],
        [
            Coupler.Create("g_qa_c", CouplerKind.Capacitive, "qa", "c", new CouplingStrength.TargetG(0.09)),
            Coupler.Create("g_qb_c", CouplerKind.Capacitive, "qb", "c", new CouplingStrength.TargetG(0.09)),
            Coupler.Create("g_qa_qb", CouplerKind.Capacitive, "qa", "qb", new CouplingStrength.TargetG(0.006)),
            // qubit charge n (imaginary off the diagonal by the phase convention) on the resonators' real phi: a complex
            // Hamiltonian that is real in a gauge, so the real-gauge paths are exercised
            Coupler.Create("g_qa_ra", CouplerKind.Custom, "qa", "ra", new CouplingStrength.TargetG(0.08), "n", "phi"),
            Coupler.Create("g_qb_rb", CouplerKind.Custom, "qb", "rb", new CouplingStrength.TargetG(0.08), "n", "phi"),
        ],
        new Truncation { DefaultLevels = levels, MaxExcitations = maxExcitations });
}
