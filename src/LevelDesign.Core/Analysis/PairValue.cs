namespace LevelDesign.Core.Analysis;

/// <summary>A quantity for an ordered pair of elements (e.g. 2χ of a qubit with a resonator, ZZ of two qubits), GHz.</summary>
/// <param name="Purity">The lowest purity of the four labelled states (00, 10, 01, 11) the value is read from.</param>
public sealed record PairValue(string First, string Second, double Value, double Purity = double.NaN);
