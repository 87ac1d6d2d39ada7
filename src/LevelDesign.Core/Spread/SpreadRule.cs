using LevelDesign.Core.Sweeps;

namespace LevelDesign.Core.Spread;

/// <summary>
/// One rule of a spread study, as written in [rules] (see <see cref="SpreadRuleParser"/> for the syntax).
/// Exactly one of <see cref="Point"/> and <see cref="Sweep"/> is set for bounds and purities; a crossing rule has a
/// sweep; a root rule has its own bias range (<see cref="RootBias"/>, <see cref="RootLow"/>, <see cref="RootHigh"/>).
/// Bounds are in GHz for quantities and plain numbers for purities.
/// </summary>
public sealed record SpreadRule(string Name, string Text, SpreadRuleKind Kind)
{
    public QuantityExpression? Quantity { get; init; }
    public SpreadComparison Comparison { get; init; }
    public double Low { get; init; } = double.NegativeInfinity;
    public double High { get; init; } = double.PositiveInfinity;
    public string? Point { get; init; }
    public string? Sweep { get; init; }
    public string? StateA { get; init; }
    public string? StateB { get; init; }
    public double MaxGapGHz { get; init; }
    public double RootTarget { get; init; }
    public string? RootBias { get; init; }
    public double RootLow { get; init; }
    public double RootHigh { get; init; }
    public int RootScanPoints { get; init; } = 31;

    /// <summary>Where the rule is written (line and column of its text), for messages; 0 when given on the command line.</summary>
    public int Line { get; init; }
    public int Column { get; init; }

    /// <summary>Whether a figure measured for this rule (see <see cref="RuleEvaluator"/>) passes it.</summary>
    public bool Passes(double figure)
    {
        if (double.IsNaN(figure)) return false;
        return Kind switch
        {
            SpreadRuleKind.NoCrossing => figure <= MaxGapGHz,
            SpreadRuleKind.Root => true,   // the figure is the root's bias; no root is NaN
            _ => Comparison switch
            {
                SpreadComparison.Above => figure > Low,
                SpreadComparison.Below => figure < High,
                SpreadComparison.Within => Math.Abs(figure) <= High,
                _ => figure >= Low && figure <= High,
            },
        };
    }
}
