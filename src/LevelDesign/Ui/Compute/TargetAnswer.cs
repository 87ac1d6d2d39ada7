namespace LevelDesign.Ui.Compute;

/// <summary>A target solve: the bias value found, or why none was.</summary>
public sealed record TargetAnswer(bool Found, double BiasValue, string Message);
