using System.Globalization;
using System.Text;
using LevelDesign.Core.Spread;

namespace LevelDesign.Core.Presentation;

/// <summary>The summary of a spread study as a table for people (stdout).</summary>
public static class SpreadReport
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    public static string Table(string deviceName, SpreadDefinition definition, SpreadSummary s, IReadOnlyList<double> nominal, bool completed)
    {
        var b = new StringBuilder();
        b.AppendLine(string.Create(Inv, $"spread study of {deviceName}: {s.Samples} of {definition.Samples} samples{(completed ? "" : " (cancelled: only the samples finished)")}, seed {definition.Seed}, {definition.Rules.Count} rule(s)"));
        bool nominalPasses = definition.Rules.Select((r, i) => r.Passes(nominal[i])).All(p => p);
        b.AppendLine(nominalPasses ? "nominal device: passes every rule" : "nominal device: FAILS " + string.Join(", ", definition.Rules.Where((r, i) => !r.Passes(nominal[i])).Select(r => r.Name)));
        b.AppendLine(string.Create(Inv, $"yield {s.Yield:0.0000}  ({s.Passed} of {s.Samples} pass every rule; 95% Wilson score interval {s.YieldLow:0.0000} – {s.YieldHigh:0.0000})"));
        if (s.NotComputed > 0) b.AppendLine(string.Create(Inv, $"{s.NotComputed} sample(s) could not be computed and count as failed (reason in the 'error' column of the sample file)"));
        b.AppendLine();
        int width = Math.Max(4, definition.Rules.Max(r => r.Name.Length));
        b.AppendLine($"{"rule".PadRight(width)}  failed  fraction  nominal        rule");
        for (int i = 0; i < definition.Rules.Count; i++)
        {
            var r = definition.Rules[i];
            var f = s.RuleFailures[i];
            b.AppendLine(string.Create(Inv, $"{r.Name.PadRight(width)}  {f.Failed,6}  {f.Fraction,8:0.0000}  {Figure(r, nominal[i]),-13}  {r.Text}"));
        }
        b.AppendLine();
        b.AppendLine("parameters most related to failure (failure rate of samples drawn below -1σ / within ±1σ / above +1σ;");
        b.AppendLine("correlation of failing with the signed deviation and with its size; a correlation, not a proof):");
        int pw = Math.Max(9, definition.Paths.Max(p => p.Length));
        b.AppendLine($"{"parameter".PadRight(pw)}  below   within  above   signed  size");
        foreach (var p in s.Ranking)
            b.AppendLine(string.Create(Inv, $"{p.Path.PadRight(pw)}  {Rate(p.FailureBelow)}  {Rate(p.FailureWithin)}  {Rate(p.FailureAbove)}  {Corr(p.SignedCorrelation)}  {Corr(p.SizeCorrelation)}"));
        b.AppendLine();
        b.AppendLine("figures: a bound's quantity at its point or its worst value along its sweep; crossing rules the largest gap; root rules the root's bias.");
        b.AppendLine(Core.Analysis.Conventions.LimitsOfModel);
        return b.ToString();
    }

    /// <summary>A rule's figure in a readable unit (GHz values in MHz; purities and root biases plain).</summary>
    public static string Figure(SpreadRule rule, double x)
    {
        if (double.IsNaN(x)) return rule.Kind == SpreadRuleKind.Root ? "no root" : "-";
        return rule.Kind switch
        {
            SpreadRuleKind.Purity => x.ToString("0.0000", Inv),
            SpreadRuleKind.Root => x.ToString("G6", Inv),
            _ => (x * 1e3).ToString("0.###", Inv) + " MHz",
        };
    }

    private static string Rate(double x) => double.IsNaN(x) ? "  -   " : x.ToString("0.000", Inv).PadLeft(6);
    private static string Corr(double x) => double.IsNaN(x) ? "   -  " : x.ToString("+0.00;-0.00", Inv).PadLeft(6);
}
