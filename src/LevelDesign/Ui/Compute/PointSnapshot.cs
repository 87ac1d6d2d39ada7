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
    /// <summary>Why the truncation check could not run (e.g. a level list cannot grow), or null.</summary>
    public string? ConvergenceProblem { get; init; }

    /// <summary>Warnings about the device at this point (levels cut inside a degenerate multiplet, ...).</summary>
    public IReadOnlyList<string> Warnings { get; init; } = [];

    /// <summary>The coherence budget with the default (common-practice) noise figures, computed with the convergence check; or null.</summary>
    public IReadOnlyList<CoherenceBudget>? Coherence { get; init; }

    /// <summary>Why the coherence budget could not be estimated, or null.</summary>
    public string? CoherenceProblem { get; init; }

    /// <summary>Convergence of the key values only (see <see cref="ConvergenceSummary"/>), or "not checked".</summary>
    public string ConvergenceText => ConvergenceProblem is not null
        ? "not checked (F3 shifts says why)"
        : ConvergenceSummary.StatusText(Convergence, Spectrum.Device);
}
