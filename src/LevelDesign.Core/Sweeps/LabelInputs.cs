namespace LevelDesign.Core.Sweeps;

/// <summary>
/// What labelling one sweep point needs besides the neighbour's labels: bare weights |⟨bare j|dressed k⟩|²
/// (column-major) and, when labelling by character, |⟨neighbour i|this k⟩|².
/// </summary>
internal sealed record LabelInputs(double[] Weights, double[,]? Overlaps);
