namespace LevelDesign.Core.Sweeps;

/// <summary>Which near-approaches the crossing scan reports.</summary>
public sealed record CrossingOptions
{
    /// <summary>A local minimum of a level separation counts as a near-approach only below this gap (GHz); sign changes always count.</summary>
    public double MaxGapGHz { get; init; } = 0.5;

    /// <summary>Only labels of the lowest this many states (at the first point) are paired; null: all judged states.</summary>
    public int? Levels { get; init; }

    /// <summary>
    /// Bias tolerance of the Brent refinement. The gap is flat at its minimum (quadratic in the bias), so a bias
    /// error ε changes the reported gap only by about (slope·ε)²/gap: 1e-7 keeps that far below 1 Hz for any
    /// resolvable gap while saving about half of the solves a tighter tolerance would cost.
    /// </summary>
    public double BiasTolerance { get; init; } = 1e-7;

    /// <summary>
    /// Crossings whose two dressed states hold less than this of A and B together are left out: a third state is
    /// taking part, and the separation there is not a two-level gap (label hand-overs in a multi-level mixing region
    /// otherwise show up as wide "crossings"). 0 keeps everything.
    /// </summary>
    public double MinimumPairWeight { get; init; } = 0.8;

    /// <summary>
    /// A local minimum of a separation without a label swap (a near-approach) is kept only when the two states are
    /// actually mixed there, i.e. the lower purity is at most this; two levels that stay pure merely repel from afar.
    /// </summary>
    public double MaximumPurityOfNearApproach { get; init; } = 0.9;

    /// <summary>Whether minima found at the edge of their search bracket (separation monotonic there: no crossing) are kept.</summary>
    public bool IncludeUnrefined { get; init; }

    /// <summary>Operating points (in the swept bias) by which crossings are ranked, nearest first.</summary>
    public IReadOnlyList<double> OperatingPoints { get; init; } = [];
}
