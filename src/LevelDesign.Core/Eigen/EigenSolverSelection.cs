namespace LevelDesign.Core.Eigen;

/// <summary>Outcome of choosing the active backend; kept apart from the facade so the rules are testable.</summary>
internal sealed record EigenSolverSelection(IEigenSolver Active, string? FallbackReason, string? Note)
{
    /// <param name="requested">Value of LEVELDESIGN_EIGEN, or null when unset.</param>
    /// <param name="managed">The always-available backend.</param>
    /// <param name="probeNative">Loads and verifies the native backend; returns it, or null and a reason.</param>
    public static EigenSolverSelection Choose(
        string? requested, IEigenSolver managed, Func<(IEigenSolver? Solver, string? Reason)> probeNative)
    {
        string mode = (requested ?? "").Trim().ToLowerInvariant();
        if (mode == "managed")
            return new EigenSolverSelection(managed, $"{EigenSolvers.EnvironmentVariable}=managed", null);

        string? note = mode is "" or "native"
            ? null
            : $"{EigenSolvers.EnvironmentVariable}='{requested}' ignored: expected 'managed' or 'native'";
        (IEigenSolver? native, string? reason) = probeNative();
        return native is not null
            ? new EigenSolverSelection(native, null, note)
            : new EigenSolverSelection(managed, reason ?? "native backend unavailable", note);
    }

    public string Describe()
    {
        string text = "eigensolver: " + Active.Name;
        if (!Active.IsNative && FallbackReason is not null)
            text += FallbackReason == $"{EigenSolvers.EnvironmentVariable}=managed"
                ? " — native not used: " + FallbackReason
                : " — native unavailable: " + FallbackReason;
        if (Note is not null) text += " (" + Note + ")";
        return text;
    }
}
