using System.Numerics;
using LevelDesign.Core.Linear;

namespace LevelDesign.Core.Elements;

/// <summary>
/// Oscillator in its Fock basis: E_k = ω k + (α/2) k(k−1) (a Kerr/Duffing oscillator; α = 0 is a resonator).
/// Operators: a, adag, number, n = i·n_zpf(a† − a), phi = φ_zpf(a + a†). With a charging energy E_C given,
/// n_zpf = sqrt(ω/16E_C) and φ_zpf = 1/(2n_zpf) (the LC values); without it both are 1/√2
/// (dimensionless quadratures), which suits couplings given as a target g.
/// </summary>
internal static class FockOscillator
{
    public static BareSpectrum Build(string id, double frequency, double anharmonicity, double? ec, int levels)
    {
        var energies = new double[levels];
        for (int k = 0; k < levels; k++) energies[k] = frequency * k + anharmonicity / 2 * k * (k - 1);
        if (anharmonicity < 0 && levels > 1)
        {
            // A negative Kerr term eventually bends the ladder down; refuse levels past the turning point.
            for (int k = 1; k < levels; k++)
                if (energies[k] <= energies[k - 1])
                    throw new InvalidOperationException($"element '{id}': level {k} of the Kerr ladder is below level {k - 1}; keep fewer levels");
        }
        double nZpf = ec is double e && e > 0 ? Math.Sqrt(frequency / (16 * e)) : 1 / Math.Sqrt(2);
        double phiZpf = ec is double e2 && e2 > 0 ? 1 / (2 * nZpf) : 1 / Math.Sqrt(2);
        var a = LadderOperators.Lowering(levels);
        var adag = a.Adjoint();
        var number = new OperatorMatrix(levels);
        var n = new OperatorMatrix(levels);
        var phi = new OperatorMatrix(levels);
        for (int k = 0; k < levels; k++)
        {
            number[k, k] = k;
            for (int j = 0; j < levels; j++)
            {
                n[k, j] = new Complex(0, nZpf) * (adag[k, j] - a[k, j]);
                phi[k, j] = phiZpf * (adag[k, j] + a[k, j]);
            }
        }
        var ops = new Dictionary<string, OperatorMatrix> { ["a"] = a, ["adag"] = adag, ["number"] = number, ["n"] = n, ["phi"] = phi };
        return new BareSpectrum(id, energies, ops, new BasisInfo("fock", levels));
    }
}
