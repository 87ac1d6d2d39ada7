using LevelDesign.Core.Eigen;
using LevelDesign.Core.Linear;

namespace LevelDesign.Core.Elements;

/// <summary>
/// A user-given few-level system: a real symmetric Hamiltonian matrix (GHz) in some basis, named real
/// operator matrices in the same basis, and optionally an overlap matrix S of that basis (non-orthogonal
/// basis), in which case H c = E S c is solved. Suits stray two-level defects and anything not built in.
/// </summary>
public sealed record LevelList(
    string Id,
    double[,] Hamiltonian,
    IReadOnlyDictionary<string, double[,]> OperatorMatrices,
    double[,]? Overlap = null) : Element(Id)
{

    public int BasisSize => Hamiltonian.GetLength(0);

    public override int? MaxLevels => BasisSize;

    public override IReadOnlyList<string> OperatorNames =>
        OperatorMatrices.Keys.Concat(["a", "adag"]).Distinct().ToList();

    /// <summary>Diagonal entries are exposed as energy_0, energy_1, ... so sweeps can move a defect level.</summary>
    public override IReadOnlyDictionary<string, double> Parameters
    {
        get
        {
            var p = new Dictionary<string, double>();
            for (int i = 0; i < BasisSize; i++) p[$"energy_{i}"] = Hamiltonian[i, i];
            return p;
        }
    }

    public override Element WithParameter(string name, double value)
    {
        if (name.StartsWith("energy_") && int.TryParse(name.AsSpan(7), out int i) && i >= 0 && i < BasisSize)
        {
            var h = (double[,])Hamiltonian.Clone();
            h[i, i] = value;
            return this with { Hamiltonian = h };
        }
        throw UnknownParameter(name);
    }

    public override BareSpectrum Diagonalise(int levels, int? basisSize = null)
    {
        int n = BasisSize;
        if (levels > n) throw new ArgumentException($"element '{Id}': {levels} levels asked of a {n}-state level list");
        double[] values, vectors;
        if (Overlap is null)
            (values, vectors) = SmallEigen.LowestSymmetric(Hamiltonian, levels);
        else
        {
            var result = EigenSolvers.Managed.LowestGeneralizedReal(ColumnMajor(Hamiltonian), ColumnMajor(Overlap), n, levels);
            values = result.Values;
            vectors = result.Vectors;   // already in the shared phase convention
        }
        var ops = new Dictionary<string, OperatorMatrix>();
        foreach (var (name, m) in OperatorMatrices) ops[name] = OperatorMatrix.FromReal(m).InBasis(vectors, n, levels);
        // a user-defined "a" is kept (and rephased with the other operators); otherwise the generic ladder is added
        return LadderOperators.Add(new BareSpectrum(Id, values, ops, new BasisInfo(Overlap is null ? "given" : "given, non-orthogonal", n)));
    }

    public override IReadOnlyList<string> Validate()
    {
        var problems = new List<string>();
        int n = BasisSize;
        if (Hamiltonian.GetLength(1) != n) problems.Add("hamiltonian must be square");
        if (n < 2) problems.Add("a level list needs at least 2 levels");
        if (!IsSymmetricFinite(Hamiltonian)) problems.Add("hamiltonian must be real symmetric with finite entries");
        foreach (var (name, m) in OperatorMatrices)
            if (m.GetLength(0) != n || m.GetLength(1) != n) problems.Add($"operator '{name}' must be {n}×{n} like the hamiltonian");
            else if (!IsSymmetricFinite(m) && name != "a") problems.Add($"operator '{name}' must be real symmetric (Hermitian) with finite entries");
        if (Overlap is not null)
        {
            if (Overlap.GetLength(0) != n || Overlap.GetLength(1) != n) problems.Add($"overlap must be {n}×{n} like the hamiltonian");
            else if (!IsSymmetricFinite(Overlap)) problems.Add("overlap must be real symmetric with finite entries");
            else if (!IsPositiveDefinite(Overlap)) problems.Add("overlap matrix S is not positive definite (a basis overlap must be)");
        }
        return problems;
    }

    private static bool IsSymmetricFinite(double[,] m)
    {
        int n = m.GetLength(0);
        if (m.GetLength(1) != n) return false;
        for (int i = 0; i < n; i++)
            for (int j = 0; j < n; j++)
                if (!double.IsFinite(m[i, j]) || Math.Abs(m[i, j] - m[j, i]) > 1e-12 * (1 + Math.Abs(m[i, j]))) return false;
        return true;
    }

    private static bool IsPositiveDefinite(double[,] s)
    {
        try
        {
            var chol = MathNet.Numerics.LinearAlgebra.Matrix<double>.Build.DenseOfArray(s).Cholesky();
            return chol.Determinant > 0;
        }
        catch (ArgumentException) { return false; }
    }

    private static double[] ColumnMajor(double[,] m)
    {
        int n = m.GetLength(0);
        var result = new double[n * n];
        for (int j = 0; j < n; j++)
            for (int i = 0; i < n; i++)
                result[j * n + i] = m[i, j];
        return result;
    }
}
