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
    /// <summary>Convergence of the key values only (see <see cref="ConvergenceSummary"/>), or "not checked".</summary>
    public string ConvergenceText => ConvergenceSummary.StatusText(Convergence, Spectrum.Device);
}
