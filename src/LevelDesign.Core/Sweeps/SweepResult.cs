namespace LevelDesign.Core.Sweeps;

/// <summary>All computed points (in axis order) of a sweep; <see cref="Completed"/> is false when it was cancelled.</summary>
public sealed record SweepResult(SweepPlan Plan, IReadOnlyList<SweepPoint> Points, bool Completed);
