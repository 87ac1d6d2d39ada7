namespace LevelDesign.Core.Spread;

/// <summary>
/// What a study found: the yield (fraction of samples passing every rule) with its 95 % Wilson interval, per rule
/// the failures, the samples that could not be computed, and the spread parameters ranked by
/// <see cref="ParameterResponsibility.Score"/>.
/// </summary>
public sealed record SpreadSummary(long Samples, long Passed, double Yield, double YieldLow, double YieldHigh,
    IReadOnlyList<(string Rule, long Failed, double Fraction)> RuleFailures, long NotComputed,
    IReadOnlyList<ParameterResponsibility> Ranking)
{
    public static SpreadSummary Of(SpreadDefinition definition, IReadOnlyList<SampleOutcome> outcomes)
    {
        long n = outcomes.Count, passed = outcomes.Count(o => o.Pass);
        var (low, high) = WilsonInterval.Of(passed, n);
        var rules = definition.Rules.Select((r, i) =>
        {
            long failed = outcomes.Count(o => !o.Passed[i]);
            return (r.Name, failed, n == 0 ? double.NaN : failed / (double)n);
        }).ToList();
        var failedFlags = outcomes.Select(o => !o.Pass).ToArray();
        var ranking = definition.Paths.Select((path, p) => ParameterResponsibility.Of(path, outcomes.Select(o => o.Deviations[p]).ToArray(), failedFlags))
            .OrderByDescending(r => r.Score).ThenBy(r => r.Path, StringComparer.Ordinal).ToList();
        return new SpreadSummary(n, passed, n == 0 ? double.NaN : passed / (double)n, low, high, rules,
            outcomes.Count(o => o.Error is not null), ranking);
    }
}
