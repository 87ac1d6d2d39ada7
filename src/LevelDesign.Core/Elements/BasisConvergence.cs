namespace LevelDesign.Core.Elements;

/// <summary>
/// Grows a natural basis until the kept levels stop moving, so users never have to pick
/// a charge or oscillator cutoff by hand.
/// </summary>
internal static class BasisConvergence
{
    /// <summary>Kept energies must agree to this (GHz) between two basis sizes: 1 Hz.</summary>
    public const double ToleranceGHz = 1e-9;

    public static BareSpectrum Solve(string elementId, int levels, int? fixedSize, int startSize, int step, int maxSize,
        Func<int, NaturalBasisProblem> build)
    {
        if (fixedSize is int size) return build(size).Solve(elementId, levels);
        // only energies are compared while the basis grows; operators are expressed once, in the accepted basis
        var previous = build(startSize).Diagonalise(levels).Values;
        for (int n = startSize + step; n <= maxSize; n += step)
        {
            var problem = build(n);
            var next = problem.Diagonalise(levels);
            double change = 0;
            for (int i = 0; i < levels; i++) change = Math.Max(change, Math.Abs(next.Values[i] - previous[i]));
            previous = next.Values;
            if (change < ToleranceGHz) return problem.Express(elementId, next);
        }
        throw new InvalidOperationException(
            $"element '{elementId}': the lowest {levels} levels did not converge within a basis of {maxSize}; fewer levels or an explicit basis size are needed");
    }
}
