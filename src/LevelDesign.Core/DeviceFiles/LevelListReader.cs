using LevelDesign.Core.DeviceFiles.Source;
using LevelDesign.Core.Elements;
using LevelDesign.Core.Units;

namespace LevelDesign.Core.DeviceFiles;

/// <summary>
/// Reads a level_list element: either energies = [...] (a diagonal Hamiltonian) or a full hamiltonian matrix
/// (frequencies), operator matrices (plain numbers, in [elements.ID.operators] or an inline table), and an
/// optional overlap matrix that must be positive definite.
/// </summary>
internal static class LevelListReader
{
    /// <summary>Most states of a level list: its Hamiltonian and operators are dense n×n (500: 2 MB each, a solve well under a second).</summary>
    public const int MaxStates = 500;

    public static Element? Read(string id, TableReader r, SourceTable? operatorTable, int? levels)
    {
        double[,]? h;
        if (r.Has("energies") && r.Has("hamiltonian"))
        {
            r.Error("hamiltonian", "give either energies or hamiltonian, not both");
            return null;
        }
        if (r.Entry("hamiltonian")?.Value is { Kind: SourceValueKind.Array } rows && rows.Items.Count > MaxStates)
        {
            r.Error("hamiltonian", $"a hamiltonian of {rows.Items.Count:N0} rows; a level list holds at most {MaxStates} states (its matrices are dense)");
            return null;
        }
        if (r.Has("hamiltonian")) h = r.Matrix("hamiltonian", UnitKind.Frequency);
        else
        {
            // counted before each value is parsed: a 4 MB file holds 400,000 numbers
            if (r.Entry("energies")?.Value is { Kind: SourceValueKind.Array } list && list.Items.Count > MaxStates)
            {
                r.Error("energies", $"{list.Items.Count:N0} energies; a level list holds at most {MaxStates} states (its matrices are dense)");
                return null;
            }
            var e = r.QuantityArray("energies", UnitKind.Frequency, true);
            if (e is null) return null;
            h = new double[e.Length, e.Length];
            for (int i = 0; i < e.Length; i++) h[i, i] = e[i];
        }
        if (h is null) return null;
        int n = h.GetLength(0);
        if (n > MaxStates)
        {
            r.Error("hamiltonian", $"a {n}×{n} hamiltonian; a level list holds at most {MaxStates} states (its matrices are dense)");
            return null;
        }
        if (n < 2)
        {
            r.Error(r.Has("energies") ? "energies" : "hamiltonian", "a level list needs at least 2 levels");
            return null;
        }
        if (levels is int k && k > n)
        {
            r.Error("levels", $"{k} levels asked of a {n}-state level list; keep at most {n}");
            return null;
        }
        var ops = new Dictionary<string, double[,]>();
        var table = operatorTable ?? (r.Entry("operators")?.Value is { Kind: SourceValueKind.Table } v ? v.Table : null);
        if (r.Entry("operators") is SourceEntry entry && entry.Value.Kind != SourceValueKind.Table)
            r.Error("operators", "expected a table of named matrices, e.g. operators = { n = [[0, 1], [1, 0]] }");
        if (table is not null)
            foreach (var op in table.Entries)
            {
                string field = $"{r.Path}.operators.{op.Key}";
                if (r.MatrixOf(op.Value, field, UnitKind.Dimensionless, n) is double[,] m)
                {
                    if (op.Key != "a" && !Symmetric(m)) r.Errors.At(op.Value, field, "an operator matrix must be real symmetric (Hermitian); only 'a' may be non-symmetric");
                    else ops[op.Key] = m;
                }
            }
        double[,]? overlap = null;
        if (r.Has("overlap"))
        {
            overlap = r.Matrix("overlap", UnitKind.Dimensionless, size: n);
            if (overlap is not null && !Symmetric(overlap))
            {
                r.Error("overlap", "the overlap matrix S must be symmetric");
                return null;
            }
            if (overlap is not null && !PositiveDefinite(overlap))
            {
                r.Error("overlap", "the overlap matrix S is not positive definite (a basis overlap must be; check for linearly dependent states)");
                return null;
            }
        }
        if (!Symmetric(h))
        {
            r.Error("hamiltonian", "the hamiltonian matrix must be real symmetric");
            return null;
        }
        return new LevelList(id, h, ops, overlap);
    }

    private static bool Symmetric(double[,] m)
    {
        int n = m.GetLength(0);
        for (int i = 0; i < n; i++)
            for (int j = i + 1; j < n; j++)
                if (Math.Abs(m[i, j] - m[j, i]) > 1e-12 * (1 + Math.Abs(m[i, j]))) return false;
        return true;
    }

    private static bool PositiveDefinite(double[,] s)
    {
        try
        {
            MathNet.Numerics.LinearAlgebra.Matrix<double>.Build.DenseOfArray(s).Cholesky();
            return true;
        }
        catch (ArgumentException) { return false; }
    }
}
