using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Sweeps;

namespace LevelDesign.Ui.Compute;

/// <summary>Solves a target for one bias: every bias in the range where the named quantity equals the goal.</summary>
public interface ITargetSolver
{
    Task<TargetSearchResult> FindAllAsync(DeviceDocument document, TargetRequest request, CancellationToken cancellation);
}
