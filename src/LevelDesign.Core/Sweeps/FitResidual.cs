namespace LevelDesign.Core.Sweeps;

/// <summary>How close the fitted device comes to one target: achieved value and residual (achieved − target).</summary>
public sealed record FitResidual(FitTarget Target, double Achieved, double Residual);
