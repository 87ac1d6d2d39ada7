namespace LevelDesign.Ui.Compute;

/// <summary>Find the bias value in [Low, High] at which the named quantity ("qa.f01", "zz:qa:qb") equals Goal (GHz).</summary>
public sealed record TargetRequest(string Quantity, double GoalGHz, string Bias, double Low, double High);
