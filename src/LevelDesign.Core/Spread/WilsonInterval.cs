namespace LevelDesign.Core.Spread;

/// <summary>
/// The Wilson score interval for a binomial proportion (Wilson, JASA 22, 209 (1927)): with p̂ = k/n and z the
/// normal quantile, centre (p̂ + z²/2n)/(1 + z²/n) and half-width z·sqrt(p̂(1−p̂)/n + z²/4n²)/(1 + z²/n). Unlike the
/// normal approximation it stays inside [0, 1] and is not empty at k = 0 or k = n.
/// </summary>
public static class WilsonInterval
{
    /// <summary>z for a two-sided 95 % interval, Φ⁻¹(0.975).</summary>
    public const double Z95 = 1.959963984540054;

    public static (double Low, double High) Of(long successes, long trials, double z = Z95)
    {
        if (trials <= 0) return (0, 1);
        double n = trials, p = successes / n, z2 = z * z;
        double denominator = 1 + z2 / n;
        double centre = (p + z2 / (2 * n)) / denominator;
        double half = z * Math.Sqrt(p * (1 - p) / n + z2 / (4 * n * n)) / denominator;
        return (Math.Max(0, centre - half), Math.Min(1, centre + half));
    }
}
