using LevelDesign.Core.Model;
using LevelDesign.Core.Sweeps;

namespace LevelDesign.Ui.Compute;

/// <summary>
/// Uses <see cref="SweepRunner"/>; while the sweep engine is not built (it throws NotImplementedException)
/// falls back to <see cref="PointwiseSweep"/>, which solves point by point. The fallback is kept on purpose
/// and announced through <see cref="UsingFallback"/> so the status line can say which path ran.
/// </summary>
public sealed class SweepService : ISweepService
{
    public bool UsingFallback { get; private set; }

    public async Task<SweepResult> RunAsync(Func<IReadOnlyList<double>, Device> resolve, SweepPlan plan,
        IProgress<SweepProgress>? progress, CancellationToken cancellation)
    {
        if (!UsingFallback)
        {
            try
            {
                return await SweepRunner.RunAsync(resolve, plan, progress, cancellation).ConfigureAwait(false);
            }
            catch (NotImplementedException)
            {
                UsingFallback = true;
            }
        }
        return await PointwiseSweep.RunAsync(resolve, plan, progress, cancellation).ConfigureAwait(false);
    }
}
