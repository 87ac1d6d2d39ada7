using LevelDesign.Core.Model;
using LevelDesign.Core.Sweeps;

namespace LevelDesign.Ui.Compute;

/// <summary>The sweep engine (<see cref="SweepRunner"/>): parallel, warm-started, labels carried point to point.</summary>
public sealed class SweepService : ISweepService
{
    public Task<SweepResult> RunAsync(Func<IReadOnlyList<double>, Device> resolve, SweepPlan plan, SweepOptions options,
        IProgress<SweepProgress>? progress, CancellationToken cancellation) =>
        SweepRunner.RunAsync(resolve, plan, options, progress, cancellation);
}
