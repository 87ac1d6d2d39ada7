namespace LevelDesign.Core.Sweeps;

/// <summary>
/// A stretch of the sweep (Lower ≤ bias ≤ Upper) where searched labels A and B (indices into the searched states) come
/// close: a sign change of E_A − E_B between neighbouring points, or a local minimum of |E_A − E_B|.
/// </summary>
internal readonly record struct CrossingCandidate(int A, int B, double Lower, double Upper, bool SignChange);
