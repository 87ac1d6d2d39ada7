namespace LevelDesign.Core.Sweeps;

/// <summary>Fitted values by parameter path, the residual of each target, and how the fit ended.</summary>
public sealed record FitResult(IReadOnlyDictionary<string, double> Values, IReadOnlyList<FitResidual> Residuals,
    int Iterations, bool Converged, string Message)
{
    /// <summary>Parameters that ended on a bound (the target may want a value outside the box).</summary>
    public IReadOnlyList<string> AtBounds { get; init; } = [];
}
