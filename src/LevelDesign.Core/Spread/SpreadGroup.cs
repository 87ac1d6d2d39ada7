namespace LevelDesign.Core.Spread;

/// <summary>
/// One [spread.NAME] table: parameters (paths such as "qa.ej_sum") drawn with the same spread. Each parameter gets
/// its own standard normal z_i; with <see cref="Shared"/> &gt; 0 the group also shares one common z_0 (e.g. every
/// junction of one wafer region), and the total deviation in units of the spread of the logarithm or of the
/// value is Shared·z_0 + Sigma·z_i. Relative spreads are fractions of the nominal value (0.03 for "3%"),
/// absolute ones are in the parameter's base unit (GHz, F).
/// </summary>
public sealed record SpreadGroup(string Name, IReadOnlyList<string> Paths, double Sigma, double Shared, bool Relative,
    SpreadDistribution Distribution)
{
    /// <summary>The standard deviation of one parameter's total deviation (same unit as <see cref="Sigma"/>).</summary>
    public double TotalSigma => Math.Sqrt(Sigma * Sigma + Shared * Shared);
}
