namespace LevelDesign.Core.Sweeps;

/// <summary>How close the fitted device comes to one target: achieved value and residual (achieved − target).</summary>
/// <param name="Purity">Lowest purity of the labelled states the achieved value is read from at the fitted point.</param>
public sealed record FitResidual(FitTarget Target, double Achieved, double Residual, double Purity = double.NaN);
