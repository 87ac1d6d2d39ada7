using LevelDesign.Core.Analysis;
using LevelDesign.Core.Composite;

namespace LevelDesign.Ui.Compute;

/// <summary>One solved bias point for the screens: spectrum, derived quantities, convergence and timing.</summary>
public sealed record PointSnapshot(
    DressedSpectrum Spectrum,
    DerivedQuantities Quantities,
    IReadOnlyList<ConvergenceEntry>? Convergence,
    DateTime ComputedAt,
    TimeSpan Elapsed)
{
    /// <summary>"converged", "N flagged", or "not checked".</summary>
    public string ConvergenceText => Convergence is null
        ? "not checked"
        : Convergence.Count(c => c.Flagged) is int n and > 0 ? $"✗ {n} unconverged" : "✓ converged";
}
