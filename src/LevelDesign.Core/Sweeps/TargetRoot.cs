namespace LevelDesign.Core.Sweeps;

/// <summary>One bias where a quantity meets its target: the value reached there and the residual (value − target).</summary>
public sealed record TargetRoot(string Quantity, double Target, double Bias, double Value, double Residual, bool Refined);
