namespace LevelDesign.Core.Eigen;

/// <summary>How far an iterative solve is: after <paramref name="Iteration"/>, <paramref name="Converged"/> of the <paramref name="Wanted"/> lowest states have converged.</summary>
public sealed record SolveProgress(int Iteration, int Converged, int Wanted);
