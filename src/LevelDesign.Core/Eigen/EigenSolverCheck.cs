using System.Numerics;

namespace LevelDesign.Core.Eigen;

/// <summary>
/// Trial run a backend must pass before it is trusted: the 3×3 matrix tridiag(−1, 2, −1), whose
/// eigenvalues 2 − 2cos(kπ/4) = 2 − √2, 2, 2 + √2 and eigenvectors sin(jkπ/4) are a textbook exact
/// result, posed as a real, a complex Hermitian (phase-rotated) and a generalized problem.
/// </summary>
internal static class EigenSolverCheck
{
    private const double Tolerance = 1e-12;

    /// <summary>Null when the backend reproduces the exact answers; otherwise what went wrong.</summary>
    public static string? Verify(IEigenSolver solver)
    {
        try
        {
            return CheckReal(solver) ?? CheckComplex(solver) ?? CheckGeneralized(solver);
        }
        catch (Exception e) when (e is not OutOfMemoryException)
        {
            return $"trial solve threw {e.GetType().Name}: {e.Message}";
        }
    }

    private static double[] ExactValues() => [2 - Math.Sqrt(2), 2, 2 + Math.Sqrt(2)];

    private static double[] Tridiagonal() => [2, -1, 0, -1, 2, -1, 0, -1, 2];

    private static string? CheckReal(IEigenSolver solver)
    {
        RealEigenResult r = solver.LowestReal(Tridiagonal(), 3, 3);
        string? values = CompareValues("real", r.Values, ExactValues());
        if (values is not null) return values;

        // sin(jkπ/4), normalised, under the shared phase convention (largest component positive, first on ties).
        double h = 0.5, q = Math.Sqrt(0.5);
        double[] exact = [h, q, h, q, 0, -q, -h, q, -h];
        for (int i = 0; i < exact.Length; i++)
            if (Math.Abs(r.Vectors[i] - exact[i]) > Tolerance)
                return $"real eigenvector entry {i} is {r.Vectors[i]:R}, expected {exact[i]:R}";
        return null;
    }

    private static string? CheckComplex(IEigenSolver solver)
    {
        // D T D* with D = diag(1, i, −1) has the same spectrum but genuinely complex off-diagonal entries.
        Complex[] d = [Complex.One, Complex.ImaginaryOne, -Complex.One];
        double[] t = Tridiagonal();
        var a = new Complex[9];
        for (int j = 0; j < 3; j++)
            for (int i = 0; i < 3; i++)
                a[j * 3 + i] = d[i] * t[j * 3 + i] * Complex.Conjugate(d[j]);

        ComplexEigenResult r = solver.LowestComplex(a, 3, 2);
        string? values = CompareValues("complex", r.Values, ExactValues()[..2]);
        if (values is not null) return values;

        for (int k = 0; k < 2; k++)
        {
            double norm = 0;
            for (int i = 0; i < 3; i++)
            {
                Complex av = 0;
                for (int j = 0; j < 3; j++) av += a[j * 3 + i] * r.Component(j, k);
                if ((av - r.Values[k] * r.Component(i, k)).Magnitude > Tolerance)
                    return $"complex eigenpair {k} fails H v = λ v at row {i}";
                norm += r.Component(i, k).Magnitude * r.Component(i, k).Magnitude;
            }
            if (Math.Abs(norm - 1) > Tolerance) return $"complex eigenvector {k} has norm² {norm:R}";
        }
        return null;
    }

    private static string? CheckGeneralized(IEigenSolver solver)
    {
        // H = D T D, S = D² with D = diag(1, 2, 3): H c = E S c has T's spectrum, c = D⁻¹ v.
        double[] d = [1, 2, 3];
        double[] t = Tridiagonal();
        var h = new double[9];
        var s = new double[9];
        for (int j = 0; j < 3; j++)
        {
            s[j * 3 + j] = d[j] * d[j];
            for (int i = 0; i < 3; i++) h[j * 3 + i] = d[i] * t[j * 3 + i] * d[j];
        }

        RealEigenResult r = solver.LowestGeneralizedReal(h, s, 3, 3);
        string? values = CompareValues("generalized", r.Values, ExactValues());
        if (values is not null) return values;

        for (int k = 0; k < 3; k++)
        {
            double sNorm = 0;
            for (int i = 0; i < 3; i++) sNorm += s[i * 3 + i] * r.Component(i, k) * r.Component(i, k);
            if (Math.Abs(sNorm - 1) > Tolerance) return $"generalized eigenvector {k} has cᵀSc = {sNorm:R}";
        }
        return null;
    }

    private static string? CompareValues(string kind, double[] actual, double[] expected)
    {
        if (actual.Length != expected.Length)
            return $"{kind} trial returned {actual.Length} eigenvalues, expected {expected.Length}";
        for (int k = 0; k < expected.Length; k++)
            if (Math.Abs(actual[k] - expected[k]) > Tolerance)
                return $"{kind} eigenvalue {k} is {actual[k]:R}, exact {expected[k]:R}";
        return null;
    }
}
