namespace LevelDesign.Core.Sweeps;

/// <summary>
/// What labelling one sweep point needs besides the neighbour's labels: bare weights |⟨bare j|dressed k⟩|²
/// (column-major), each dressed state's largest components (bare indices, largest first) and, when labelling by
/// character, |⟨neighbour i|this k⟩|².
/// </summary>
internal sealed record LabelInputs(double[] Weights, int[][] Top, double[,]? Overlaps);
