namespace LevelDesign.Core.Sweeps;

/// <summary>
/// A near-approach of two labelled dressed levels on a 1-D sweep: the labels (product states, levels in
/// device element order), the bias of closest approach, the minimum gap there (2g_eff for an avoided
/// crossing; ~0 for levels that do not couple), the lower purity of the two states there, and the distance
/// to the nearest operating point when ranked.
/// </summary>
public sealed record Crossing(string LabelA, string LabelB, IReadOnlyList<int> StateA, IReadOnlyList<int> StateB,
    double Bias, double GapGHz, double Purity, bool Refined, double? DistanceToOperatingPoint = null);
