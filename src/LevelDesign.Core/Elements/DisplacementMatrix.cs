namespace LevelDesign.Core.Elements;

/// <summary>
/// Exact Fock-basis elements of e^{iβ(a+a†)} = D(iβ):
/// ⟨m|D(iβ)|n⟩ = i^{|m−n|} · sqrt(min!/max!) · β^{|m−n|} · e^{−β²/2} · L_min^{(|m−n|)}(β²)
/// (standard displaced-Fock-state result, e.g. Cahill &amp; Glauber, Phys. Rev. 177, 1857 (1969); citation from memory, the
/// formula is checked in tests against an independent SciPy phase-grid reference).
/// Using the closed form avoids the truncation error of exponentiating a truncated φ matrix.
/// Returns the real magnitudes without the i^{|m−n|} factor.
/// </summary>
internal static class DisplacementMatrix
{
    public static double[,] RealPart(double beta, int size)
    {
        var result = new double[size, size];
        double x = beta * beta;
        double logBeta = Math.Log(beta);
        var logFactorial = new double[2 * size + 1];
        for (int k = 1; k < logFactorial.Length; k++) logFactorial[k] = logFactorial[k - 1] + Math.Log(k);
        for (int d = 0; d < size; d++)
        {
            // L_n^{(d)}(x) for n = 0..size−1−d by the three-term recurrence
            var laguerre = new double[size - d];
            laguerre[0] = 1;
            if (laguerre.Length > 1) laguerre[1] = 1 + d - x;
            for (int k = 1; k + 1 < laguerre.Length; k++)
                laguerre[k + 1] = ((2 * k + 1 + d - x) * laguerre[k] - (k + d) * laguerre[k - 1]) / (k + 1);
            for (int n = 0; n + d < size; n++)
            {
                int m = n + d;
                double logPrefactor = 0.5 * (logFactorial[n] - logFactorial[m]) + d * logBeta - x / 2;
                double value = Math.Exp(logPrefactor) * laguerre[n];
                result[m, n] = result[n, m] = value;
            }
        }
        return result;
    }
}
