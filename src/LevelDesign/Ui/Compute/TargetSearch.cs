using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Sweeps;

namespace LevelDesign.Ui.Compute;

/// <summary>
/// Core's <see cref="TargetSolver"/>: a labelled scan of the range, each step with a hybridized end sampled finer, then
/// Brent on every sign change — so a root beside a label jump is found as a finer scan would find it.
/// </summary>
public sealed class TargetSearch : ITargetSolver
{
    /// <summary>Scan points over the range; two roots closer than one step apart can be missed.</summary>
    public const int ScanPoints = 41;

    public Task<TargetSearchResult> FindAllAsync(DeviceDocument document, TargetRequest request, CancellationToken cancellation)
    {
        var axis = new SweepAxis(request.Bias, request.Low, request.High, request.ScanPoints, []);
        return TargetSolver.SearchAsync(values => document.Resolve([axis], values), axis, request.Quantity, request.GoalGHz,
            new SweepOptions(), cancellation: cancellation, refineBelowPurity: document.PurityThreshold);
    }
}
