namespace LevelDesign.Core.Spread;

/// <summary>The bound of a rule: above, below, within ±limit, or between two values.</summary>
public enum SpreadComparison
{
    Above,
    Below,
    Within,
    Between,
}
