using LevelDesign.Core.Composite;
using LevelDesign.Core.Sweeps;

namespace LevelDesign.Commands;

/// <summary>
/// What one shard of <c>sweep --shard I/N</c> is computed with: the options as typed (the shard, the output folder,
/// the arguments recorded in the shard file) and what the command made of them.
/// </summary>
public sealed record ShardRun
{
    public required SweepArguments Arguments { get; init; }

    /// <summary>The loaded file, the starting settings and the axes.</summary>
    public required SweepSetup Setup { get; init; }
    public required LabelMode Mode { get; init; }

    /// <summary>Dressed states the plan labels (null: the solver's own count).</summary>
    public required int? PlanLevels { get; init; }

    /// <summary>Labelled states reported at each point.</summary>
    public required int Shown { get; init; }
    public required double PurityThreshold { get; init; }
    public required DeviceSolver Solver { get; init; }
}
