namespace LevelDesign.Core.Sweeps;

/// <summary>
/// All computed points (in axis order) of a sweep; <see cref="Completed"/> is false when it was cancelled or a point
/// failed (<see cref="Failure"/>, only with <see cref="SweepOptions.KeepPointsOnFailure"/>).
/// </summary>
public sealed record SweepResult(SweepPlan Plan, IReadOnlyList<SweepPoint> Points, bool Completed)
{
    /// <summary>The point that could not be computed and why; the points computed before the sweep stopped are kept.</summary>
    public SweepFailure? Failure { get; init; }
}

/// <summary>A sweep point that failed: its axis values and the error (e.g. a device invalid there).</summary>
public sealed record SweepFailure(IReadOnlyList<double> AxisValues, Exception Error);
