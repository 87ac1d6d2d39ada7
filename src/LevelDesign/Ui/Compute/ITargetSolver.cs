using LevelDesign.Core.Model;

namespace LevelDesign.Ui.Compute;

/// <summary>Hook for the sweep engine's root finder: solve a target for one bias.</summary>
public interface ITargetSolver
{
    Task<TargetAnswer> SolveAsync(Func<double, Device> resolve, TargetRequest request, CancellationToken cancellation);
}
