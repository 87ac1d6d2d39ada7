namespace LevelDesign.Core.Sweeps;

/// <summary>One bias where a quantity meets its target: the value reached there and the residual (value − target).</summary>
public sealed record TargetRoot(string Quantity, double Target, double Bias, double Value, double Residual, bool Refined)
{
    /// <summary>Lowest purity of the labelled states the quantity is read from at the root (NaN when not refined).</summary>
    public double Purity { get; init; } = double.NaN;

    /// <summary>Whether the root lies where its states are hybridized (purity below <paramref name="threshold"/>).</summary>
    public bool IsHybridized(double threshold) => Purity < threshold;
}
