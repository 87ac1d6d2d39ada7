namespace LevelDesign.Core.Spread;

/// <summary>
/// The result of one sample: its drawn values and deviations (per spread path), per rule the measured figure (see
/// <see cref="RuleEvaluator"/>; NaN when it could not be measured) and whether the rule passed, and the reason when
/// the sample could not be computed at all (then every rule counts as failed).
/// </summary>
public sealed record SampleOutcome(long Index, IReadOnlyList<double> Values, IReadOnlyList<double> Deviations,
    IReadOnlyList<double> Figures, IReadOnlyList<bool> Passed, string? Error = null)
{
    public bool Pass => Error is null && Passed.All(p => p);
}
