namespace LevelDesign.Core.Spread;

/// <summary>What a rule checks (see <see cref="SpreadRule"/>).</summary>
public enum SpreadRuleKind
{
    /// <summary>A quantity (or sum of quantities) against a bound, at a point or everywhere along a sweep.</summary>
    Bound,

    /// <summary>The lowest purity of the labelled states a quantity is read from, against a bound.</summary>
    Purity,

    /// <summary>No avoided crossing between two named states along a sweep with a gap above a limit.</summary>
    NoCrossing,

    /// <summary>A target quantity must reach its value somewhere in a bias range (a root of quantity − value).</summary>
    Root,
}
