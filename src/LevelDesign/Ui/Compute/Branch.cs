namespace LevelDesign.Ui.Compute;

/// <summary>One labelled level followed across a sweep: its label and its frequency (GHz) at every point (NaN when absent).</summary>
public sealed record Branch(string Label, int Excitations, double[] Frequencies);
