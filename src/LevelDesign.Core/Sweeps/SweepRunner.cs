using LevelDesign.Core.Model;

namespace LevelDesign.Core.Sweeps;

/// <summary>
/// Runs a sweep in parallel on all cores, cancellable; points computed before cancellation are kept.
/// CONTRACT (implemented by the sweeps work).
/// </summary>
public static class SweepRunner
{
    /// <param name="resolve">Maps axis values to the device at that point (applies biases, links and parameter paths).</param>
    public static Task<SweepResult> RunAsync(Func<IReadOnlyList<double>, Device> resolve, SweepPlan plan,
        IProgress<SweepProgress>? progress = null, CancellationToken cancellation = default) =>
        throw new NotImplementedException();
}
