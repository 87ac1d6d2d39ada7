using LevelDesign.Core.Composite;
using LevelDesign.Core.Labels;

namespace LevelDesign.Core.Sweeps;

/// <summary>
/// How a sweep is computed. <see cref="Solver"/> is shared by every point so unchanged elements are
/// diagonalised once (its cache compares elements by record equality).
/// </summary>
public sealed record SweepOptions
{
    /// <summary>Shared solver (and bare-spectrum cache); null makes one with the active eigensolver.</summary>
    public DeviceSolver? Solver { get; init; }

    /// <summary>Points computed at once (workers walking contiguous stretches); default the cores computations may use (<see cref="Eigen.ComputeCores"/>).</summary>
    public int Parallelism { get; init; } = Eigen.ComputeCores.Limit;

    /// <summary>
    /// When a point fails, stop and return the points computed so far with <see cref="SweepResult.Failure"/> instead of
    /// throwing (a long sweep that meets an invalid device at its end keeps its work).
    /// </summary>
    public bool KeepPointsOnFailure { get; init; }

    /// <summary>Use the warm-started iterative eigensolver on real matrices (dense fallback when it does not converge).</summary>
    public bool Iterative { get; init; } = true;

    /// <summary>Below this dimension dense solves are as fast, so the iterative path is skipped.</summary>
    public int IterativeMinimumDimension { get; init; } = 60;

    /// <summary>Points whose chosen states have a purity below this are flagged in hybridization maps.</summary>
    public double PurityThreshold { get; init; } = Analysis.Conventions.DefaultPurityThreshold;

    /// <summary>
    /// How much continuity with the neighbouring point counts when carrying a label by character (in units of
    /// weight): a label moves to another state only when that state's character beats it by more than this.
    /// </summary>
    public double Hysteresis { get; init; } = 0.1;

    /// <summary>Two candidate labels of one state closer than this are called ambiguous.</summary>
    public double AmbiguityMargin { get; init; } = Labeller.DefaultAmbiguityMargin;

    /// <summary>
    /// When set, only these stretches of flat point indices [Start, End) are computed, each cold-started at its start and
    /// warm-started forward, and a point whose predecessor was not computed is labelled afresh: the numbers then depend
    /// only on the stretches, not on the cores or the order of the work (see <see cref="SweepBlocks"/>). Null: all
    /// points, shared out between workers as they go (fastest, but the last digits depend on where workers meet).
    /// </summary>
    public IReadOnlyList<(int Start, int End)>? Blocks { get; init; }

    /// <summary>
    /// Keep every point's eigenvectors and bare weights in the result (needed for matrix elements, coherence budgets,
    /// root refinement from the scan). Null: keep them when all points' vectors take at most
    /// <see cref="SweepMemoryEstimate.KeptVectorsBudgetBytes"/>; otherwise a point keeps only energies, labels and
    /// derived quantities, and the sweep walks in order so only a few points hold vectors at once.
    /// </summary>
    public bool? KeepVectors { get; init; }

    /// <summary>Refuse, before computing, a sweep estimated to need more than this (bytes); null: no limit.</summary>
    public long? MemoryLimitBytes { get; init; } = DeviceFiles.CompositeSizeEstimate.DefaultLimitBytes;

    /// <summary>
    /// Refuse, before computing, a sweep estimated (from its first point's solve time) to run longer than this; null:
    /// no limit and no timing solve.
    /// </summary>
    public TimeSpan? TimeLimit { get; init; } = SweepTimeEstimate.DefaultLimit;

    public DeviceSolver CreateSolver() => Solver ?? new DeviceSolver();
}
