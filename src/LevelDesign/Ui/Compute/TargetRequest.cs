namespace LevelDesign.Ui.Compute;

/// <summary>
/// Find every value in [Low, High] of Bias (a bias name, in its control unit, or a parameter path) at which the
/// named quantity ("qa.f01", "zz:qa:qb") equals Goal (GHz).
/// </summary>
public sealed record TargetRequest(string Quantity, double GoalGHz, string Bias, double Low, double High)
{
    /// <summary>Points of the scan before refinement.</summary>
    public int ScanPoints { get; init; } = TargetSearch.ScanPoints;
}
