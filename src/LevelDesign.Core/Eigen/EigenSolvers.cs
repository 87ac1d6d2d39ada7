namespace LevelDesign.Core.Eigen;

/// <summary>
/// Process-wide choice of eigensolver backend, made once on first use. LEVELDESIGN_EIGEN=managed forces
/// the managed backend; otherwise (unset or "native") the native LAPACK backend is used if it loads and
/// reproduces a known exact answer, else the managed one, with the reason kept in <see cref="FallbackReason"/>.
/// </summary>
public static class EigenSolvers
{
    public const string EnvironmentVariable = "LEVELDESIGN_EIGEN";

    private static readonly Lazy<IEigenSolver> managed = new(() => new ManagedSolver());
    private static readonly Lazy<(IEigenSolver? Solver, string? Reason)> native = new(ProbeNative);
    private static readonly Lazy<EigenSolverSelection> selection = new(() =>
        EigenSolverSelection.Choose(Environment.GetEnvironmentVariable(EnvironmentVariable), managed.Value, () => native.Value));

    /// <summary>The backend all callers should use.</summary>
    public static IEigenSolver Active => selection.Value.Active;

    /// <summary>Why the managed backend is active, or null when native is active.</summary>
    public static string? FallbackReason => selection.Value.FallbackReason;

    public static IEigenSolver Managed => managed.Value;

    /// <summary>The verified native backend, or null when it cannot be loaded or fails verification.</summary>
    public static IEigenSolver? Native => native.Value.Solver;

    /// <summary>Why <see cref="Native"/> is null; null when it is available.</summary>
    public static string? NativeUnavailableReason => native.Value.Reason;

    /// <summary>One line for logs and the status bar, e.g. "eigensolver: native LAPACK (liblapack.so.3 → …)".</summary>
    public static string Describe() => selection.Value.Describe();

    /// <summary>Loads the native backend and runs the exact trial problem; a failure at either step is a reason, not an exception.</summary>
    internal static (IEigenSolver? Solver, string? Reason) ProbeNative()
    {
        NativeLapackSolver? solver;
        try
        {
            solver = NativeLapackSolver.TryCreate(out string? loadFailure);
            if (solver is null) return (null, loadFailure);
        }
        catch (Exception e) when (e is not OutOfMemoryException)
        {
            return (null, $"loading native LAPACK threw {e.GetType().Name}: {e.Message}");
        }

        string? failure = EigenSolverCheck.Verify(solver);
        return failure is null ? (solver, null) : (null, $"{solver.Name} failed verification: {failure}");
    }
}
