using System.Numerics;
using LevelDesign.Core.Composite;
using MathNet.Numerics.LinearAlgebra;

namespace LevelDesign.Core.Analysis;

/// <summary>
/// The effective two-qubit Hamiltonian by least-action block diagonalisation (Cederbaum, Schirmer &amp; Meyer,
/// J. Phys. A 22, 2427 (1989)): with M_jk = ⟨bare j|dressed k⟩ over the four computational product states j and their
/// four labelled dressed states k, the unitary closest to M is its polar factor W = U·Vᴴ (from M = U·S·Vᴴ), and
/// H_eff = W·diag(E_k)·Wᴴ in the bare computational basis. Its eigenvalues are the labelled dressed energies exactly,
/// and it does not depend on how the four states are ordered, only on which four they are.
/// </summary>
public static class BlockDiagonalisation
{
    public const double DefaultThreshold = 0.9;

    private static readonly Complex[][,] Paulis =
    [
        new Complex[,] { { 1, 0 }, { 0, 1 } },
        new Complex[,] { { 0, 1 }, { 1, 0 } },
        new Complex[,] { { 0, -Complex.ImaginaryOne }, { Complex.ImaginaryOne, 0 } },
        new Complex[,] { { 1, 0 }, { 0, -1 } },
    ];

    private const string PauliNames = "IXYZ";

    public static QubitPairHamiltonian Of(DressedSpectrum s, string qubitA, string qubitB, double threshold = DefaultThreshold)
    {
        int a = s.Device.IndexOf(qubitA), b = s.Device.IndexOf(qubitB);
        if (a < 0 || b < 0) throw new ArgumentException($"no element '{(a < 0 ? qubitA : qubitB)}' (elements: {string.Join(", ", s.Device.Elements.Select(e => e.Id))})");
        if (a == b) throw new ArgumentException($"a qubit pair needs two different elements (got '{qubitA}' twice)");
        var bare = new int[4];
        var dressed = new int[4];
        for (int j = 0; j < 4; j++)
        {
            var state = new int[s.Basis.ElementCount];
            state[a] = j >> 1;
            state[b] = j & 1;
            bare[j] = s.Basis.IndexOf(state);
            dressed[j] = s.DressedIndexOfBare(bare[j]);
        }
        if (bare.Any(i => i < 0) || dressed.Any(k => k < 0))
            return Unavailable(qubitA, qubitB, threshold);

        var m = Matrix<Complex>.Build.Dense(4, 4, (j, k) => DressedMatrixElements.Component(s, bare[j], dressed[k]));
        var svd = m.Svd(true);
        var w = svd.U * svd.VT;
        var energies = dressed.Select(k => s.Energies[k]).ToArray();
        var h = w * Matrix<Complex>.Build.DenseOfDiagonalArray(energies.Select(e => new Complex(e, 0)).ToArray()) * w.ConjugateTranspose();
        var matrix = h.ToArray();
        var weights = Enumerable.Range(0, 4).Select(k => Enumerable.Range(0, 4).Sum(j => Math.Pow(m[j, k].Magnitude, 2))).ToArray();
        var purities = dressed.Select(k => s.Labels[k].Purity).ToArray();
        return new QubitPairHamiltonian(qubitA, qubitB, matrix, energies, Decompose(matrix), weights, purities, threshold);
    }

    /// <summary>h_PQ = Tr(H·(P⊗Q))/4 for all sixteen Pauli products (names "IX", "ZZ", ...; first letter on qubit a).</summary>
    public static IReadOnlyDictionary<string, double> Decompose(Complex[,] h)
    {
        var terms = new Dictionary<string, double>();
        for (int p = 0; p < 4; p++)
            for (int q = 0; q < 4; q++)
            {
                Complex trace = Complex.Zero;
                for (int i = 0; i < 4; i++)
                    for (int j = 0; j < 4; j++)
                        trace += h[i, j] * Paulis[p][j >> 1, i >> 1] * Paulis[q][j & 1, i & 1];
                terms[$"{PauliNames[p]}{PauliNames[q]}"] = trace.Real / 4;
            }
        return terms;
    }

    /// <summary>
    /// The default pairs: qubit-like elements joined by a coupler directly or through one other element (a coupler
    /// element, a bus), in device order.
    /// </summary>
    public static IReadOnlyList<(string A, string B)> CoupledPairs(Model.Device device)
    {
        var neighbours = device.Elements.ToDictionary(e => e.Id, _ => new HashSet<string>());
        foreach (var c in device.Couplers)
        {
            if (!neighbours.ContainsKey(c.ElementA) || !neighbours.ContainsKey(c.ElementB)) continue;
            neighbours[c.ElementA].Add(c.ElementB);
            neighbours[c.ElementB].Add(c.ElementA);
        }
        var pairs = new List<(string, string)>();
        var qubits = device.Elements.Where(e => e.IsQubitLike).Select(e => e.Id).ToArray();
        for (int i = 0; i < qubits.Length; i++)
            for (int j = i + 1; j < qubits.Length; j++)
                if (neighbours[qubits[i]].Contains(qubits[j]) || neighbours[qubits[i]].Overlaps(neighbours[qubits[j]]))
                    pairs.Add((qubits[i], qubits[j]));
        return pairs;
    }

    /// <summary>The effective Hamiltonian of every default pair.</summary>
    public static IReadOnlyList<QubitPairHamiltonian> ForCoupledPairs(DressedSpectrum s, double threshold = DefaultThreshold) =>
        CoupledPairs(s.Device).Select(p => Of(s, p.A, p.B, threshold)).ToArray();

    private static QubitPairHamiltonian Unavailable(string a, string b, double threshold)
    {
        var nan = new Complex[4, 4];
        for (int i = 0; i < 4; i++) for (int j = 0; j < 4; j++) nan[i, j] = double.NaN;
        return new QubitPairHamiltonian(a, b, nan, [double.NaN, double.NaN, double.NaN, double.NaN],
            Decompose(nan), [], [], threshold);
    }
}
