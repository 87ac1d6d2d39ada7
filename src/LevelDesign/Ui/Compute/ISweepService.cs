using LevelDesign.Core.Model;
using LevelDesign.Core.Sweeps;

namespace LevelDesign.Ui.Compute;

/// <summary>Runs a sweep in the background; the UI depends on this seam, not on the sweep engine directly.</summary>
public interface ISweepService
{
    Task<SweepResult> RunAsync(Func<IReadOnlyList<double>, Device> resolve, SweepPlan plan, SweepOptions options,
        IProgress<SweepProgress>? progress, CancellationToken cancellation);
}
