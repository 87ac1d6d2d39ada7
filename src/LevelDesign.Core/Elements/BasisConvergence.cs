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
        var previous = build(startSize).Solve(elementId, levels);
        for (int n = startSize + step; n <= maxSize; n += step)
        {
            var next = build(n).Solve(elementId, levels);
            double change = 0;
            for (int i = 0; i < levels; i++) change = Math.Max(change, Math.Abs(next.Energies[i] - previous.Energies[i]));
            previous = next;
            if (change < ToleranceGHz) return next;
        }
        throw new InvalidOperationException(
            $"element '{elementId}': the lowest {levels} levels did not converge within a basis of {maxSize}; fewer levels or an explicit basis size are needed");
    }
}
