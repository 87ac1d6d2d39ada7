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

    /// <summary>Operating points (in the swept bias) by which crossings are ranked, nearest first.</summary>
    public IReadOnlyList<double> OperatingPoints { get; init; } = [];
}
