namespace LevelDesign.Core.Analysis;

/// <summary>A quantity for an ordered pair of elements (e.g. 2χ of a qubit with a resonator, ZZ of two qubits), GHz.</summary>
public sealed record PairValue(string First, string Second, double Value);
