namespace LevelDesign.Core.Sweeps;

/// <summary>
/// A named quantity ("qa.f01", "chi2:qa:ra", ...) that should equal Value, evaluated with the parameter paths
/// in Settings set first (e.g. {"qa.flux": 0.5} for a minimum frequency). Scale (same unit as Value) weights
/// the residual: residuals are compared as (achieved − Value)/Scale.
/// </summary>
public sealed record FitTarget(string Quantity, double Value, IReadOnlyDictionary<string, double>? Settings = null, double Scale = 1);
