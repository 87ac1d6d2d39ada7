using System.Text.Json.Nodes;

namespace LevelDesign.Core.Spread.Export;

/// <summary>The "summary" object of a study file (and of --json on stdout).</summary>
public static class SpreadSummaryJson
{
    public static JsonObject Of(SpreadSummary s) => new()
    {
        ["samples"] = s.Samples,
        ["passed"] = s.Passed,
        ["yield"] = Number(s.Yield),
        ["yield_95_low"] = Number(s.YieldLow),
        ["yield_95_high"] = Number(s.YieldHigh),
        ["interval"] = "Wilson score interval, 95 % (Wilson, JASA 22, 209 (1927))",
        ["not_computed"] = s.NotComputed,
        ["rule_failures"] = new JsonArray(s.RuleFailures.Select(r => (JsonNode)new JsonObject
            { ["rule"] = r.Rule, ["failed"] = r.Failed, ["fraction"] = Number(r.Fraction) }).ToArray()),
        ["responsibility"] = new JsonArray(s.Ranking.Select(p => (JsonNode)new JsonObject
        {
            ["parameter"] = p.Path,
            ["score"] = Number(p.Score),
            ["failure_below_minus_1_sigma"] = Number(p.FailureBelow),
            ["failure_within_1_sigma"] = Number(p.FailureWithin),
            ["failure_above_plus_1_sigma"] = Number(p.FailureAbove),
            ["samples_below"] = p.CountBelow, ["samples_within"] = p.CountWithin, ["samples_above"] = p.CountAbove,
            ["correlation_signed"] = Number(p.SignedCorrelation),
            ["correlation_size"] = Number(p.SizeCorrelation),
        }).ToArray()),
    };

    private static JsonNode? Number(double x) => double.IsFinite(x) ? JsonValue.Create(x) : null;
}
