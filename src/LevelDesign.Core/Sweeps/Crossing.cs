namespace LevelDesign.Core.Sweeps;

/// <summary>
/// A near-approach of two labelled dressed levels on a 1-D sweep: the labels (product states, levels in
/// device element order), the bias of closest approach, the minimum gap there (2g_eff for an avoided
/// crossing; ~0 for levels that do not couple), the lower purity of the two states there, and the distance
/// to the nearest operating point when ranked. <see cref="PairWeight"/> is the smaller, over the two dressed states,
/// of their weight on A and B together: near 1 for a clean two-level avoided crossing, lower when a third state
/// takes part (then the "gap" is a feature of a multi-level mixing, not 2g_eff).
/// </summary>
public sealed record Crossing(string LabelA, string LabelB, IReadOnlyList<int> StateA, IReadOnlyList<int> StateB,
    double Bias, double GapGHz, double Purity, bool Refined, double? DistanceToOperatingPoint = null, double PairWeight = 1);
