namespace LevelDesign.Core.Eigen;

/// <summary>
/// How many cores the process's computations may occupy at once: sweep workers, crossing refinement, the block
/// products of large points and residual checks all ask here. Commands use every core; the terminal UI lowers the
/// limit by one so the keyboard and the screen keep a core of their own while a module computes (on two cores a
/// point that took both made single keys wait up to ~0.2 s).
/// </summary>
public static class ComputeCores
{
    private static int _limit = Environment.ProcessorCount;

    /// <summary>Cores computations may use (1 … processor count).</summary>
    public static int Limit
    {
        get => Volatile.Read(ref _limit);
        set => Volatile.Write(ref _limit, Math.Clamp(value, 1, Environment.ProcessorCount));
    }

    /// <summary>All cores but one (at least one): what an interactive program leaves to its own thread.</summary>
    public static int AllButOne => Math.Max(1, Environment.ProcessorCount - 1);

    /// <summary>Options for a parallel loop within the limit.</summary>
    public static ParallelOptions Options(CancellationToken cancellation = default) =>
        new() { MaxDegreeOfParallelism = Limit, CancellationToken = cancellation };
}
