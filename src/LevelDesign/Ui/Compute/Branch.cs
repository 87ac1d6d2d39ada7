namespace LevelDesign.Ui.Compute;

/// <summary>
/// One level of the spectrum followed across a sweep in energy order: the name of its character where it ends (drawn
/// there), and its frequency (GHz) at every point (NaN when absent).
/// </summary>
public sealed record Branch(string Label, int Excitations, double[] Frequencies);
