using LevelDesign.Core.Couplers;
using LevelDesign.Core.Elements;
using LevelDesign.Core.Model;

namespace LevelDesign.Bench;

/// <summary>
/// The benchmark's invented five-element device: two tunable transmons, a tunable-transmon coupler and two
/// readout resonators. Qubit–resonator couplings use the resonator's "phi" quadrature, which differs from "n"
/// only by a phase convention (same spectrum) and keeps the matrix real.
/// </summary>
internal static class ReferenceDevice
{
    public static Device Build(int levels = 7, int maxExcitations = 6) => new("bench-five",
        [
            new TunableTransmon("qa", 0.20, 22.0, 0.2, 0.05),
            new TunableTransmon("qb", 0.21, 20.0, 0.3, 0.10),
            new TunableTransmon("c", 0.18, 45.0, 0.0, 0.20),
            new Resonator("ra", 7.1),
            new Resonator("rb", 7.3),
        ],
        [
            Coupler.Create("g_qa_c", CouplerKind.Capacitive, "qa", "c", new CouplingStrength.TargetG(0.09)),
            Coupler.Create("g_qb_c", CouplerKind.Capacitive, "qb", "c", new CouplingStrength.TargetG(0.09)),
            Coupler.Create("g_qa_qb", CouplerKind.Capacitive, "qa", "qb", new CouplingStrength.TargetG(0.006)),
            Coupler.Create("g_qa_ra", CouplerKind.Capacitive, "qa", "ra", new CouplingStrength.TargetG(0.08), operatorB: "phi"),
            Coupler.Create("g_qb_rb", CouplerKind.Capacitive, "qb", "rb", new CouplingStrength.TargetG(0.08), operatorB: "phi"),
        ],
        new Truncation { DefaultLevels = levels, MaxExcitations = maxExcitations });
}
