namespace LevelDesign.Core.Sweeps;

/// <summary>
/// What a target search found: every root (and unrefined jump), and the scan point where the quantity came closest to
/// the goal — so a missed target can be reported as "closest: −37.6 kHz at 0.15 mA" rather than only "not reached".
/// </summary>
public sealed record TargetSearchResult(IReadOnlyList<TargetRoot> Roots, TargetApproach? Closest);

/// <summary>The scan point nearest the goal: the bias, the quantity's value there and the lowest purity it is read from.</summary>
public sealed record TargetApproach(double Bias, double Value, double Purity);
