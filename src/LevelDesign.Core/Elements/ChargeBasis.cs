using LevelDesign.Core.Linear;

namespace LevelDesign.Core.Elements;

/// <summary>
/// H = 4E_C(n − n_g)² − E_J cos φ in the charge basis |n⟩, −N ≤ n ≤ N, with e^{iφ}|n⟩ = |n+1⟩.
/// Operators: n (meaning n − n_g, the charge that couples), cos_phi, sin_phi.
/// </summary>
internal static class ChargeBasis
{
    public static NaturalBasisProblem Build(double ec, double ej, double ng, int nMax)
    {
        int size = 2 * nMax + 1;
        var h = new double[size, size];
        for (int i = 0; i < size; i++)
        {
            double charge = i - nMax - ng;
            h[i, i] = 4 * ec * charge * charge;
            if (i + 1 < size) h[i, i + 1] = h[i + 1, i] = -ej / 2;
        }
        return new NaturalBasisProblem(h, new Lazy<IReadOnlyDictionary<string, OperatorMatrix>>(() => Operators(ng, nMax)),
            new BasisInfo("charge", size));
    }

    private static IReadOnlyDictionary<string, OperatorMatrix> Operators(double ng, int nMax)
    {
        int size = 2 * nMax + 1;
        var n = new OperatorMatrix(size);
        var cos = new OperatorMatrix(size);
        var sin = new OperatorMatrix(size);
        for (int i = 0; i < size; i++)
        {
            n[i, i] = i - nMax - ng;
            if (i + 1 < size)
            {
                cos[i, i + 1] = cos[i + 1, i] = 0.5;
                // sin φ = (e^{iφ} − e^{−iφ})/2i, and ⟨n+1|e^{iφ}|n⟩ = 1
                sin[i + 1, i] = new System.Numerics.Complex(0, -0.5);
                sin[i, i + 1] = new System.Numerics.Complex(0, 0.5);
            }
        }
        return new Dictionary<string, OperatorMatrix> { ["n"] = n, ["cos_phi"] = cos, ["sin_phi"] = sin };
    }

    /// <summary>
    /// Solves with |n| ≤ N grown from a safe start until the kept levels converge; refuses at once (naming
    /// <paramref name="ejName"/> or levels) what the grown basis cannot converge (<see cref="ChargeBasisLimit"/>).
    /// </summary>
    public static BareSpectrum Solve(string id, double ec, double ej, double ng, int levels, int? basisSize, string ejName)
    {
        int? nMax = basisSize is int s ? (s - 1) / 2 : null;
        if (nMax is null && ChargeBasisLimit.Problem(ec, ej, levels, ejName) is var (parameter, message))
            throw new ElementLimitException(parameter, $"element '{id}': {message}");
        return BasisConvergence.Solve(id, levels, nMax, ChargeBasisLimit.StartCharge(levels), 4, ChargeBasisLimit.MaxCharge, m => Build(ec, ej, ng, m));
    }
}
