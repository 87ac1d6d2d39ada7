using LevelDesign.Core.Model;

namespace LevelDesign.Ui.Compute;

/// <summary>Placeholder until the sweep engine's root finder is merged: says so instead of guessing.</summary>
public sealed class PendingTargetSolver : ITargetSolver
{
    public Task<TargetAnswer> SolveAsync(Func<double, Device> resolve, TargetRequest request, CancellationToken cancellation) =>
        Task.FromResult(new TargetAnswer(false, double.NaN,
            "target solving needs the sweep engine's root finder, which is not in this build; plug it in via TerminalApp.Targets"));
}
