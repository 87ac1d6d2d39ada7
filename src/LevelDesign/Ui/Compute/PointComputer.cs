using System.Diagnostics;
using LevelDesign.Core.Analysis;
using LevelDesign.Core.Composite;
using LevelDesign.Core.Model;

namespace LevelDesign.Ui.Compute;

/// <summary>Solves one device (off the UI thread), checks truncation convergence and estimates the coherence budget.</summary>
public static class PointComputer
{
    /// <param name="cancellation">Also stops the iterative solves between iterations (a module's point takes seconds).</param>
    /// <param name="progress">Told after every iteration of an iterative solve.</param>
    /// <param name="solved">The quick snapshot of this same device: its spectrum is reused, not solved again (a module's point takes seconds).</param>
    public static PointSnapshot Compute(Device device, bool checkConvergence, CancellationToken cancellation, CoherenceInputs? coherenceInputs = null,
        IProgress<Core.Eigen.SolveProgress>? progress = null, PointSnapshot? solved = null)
    {
        var clock = Stopwatch.StartNew();
        var solver = new DeviceSolver { Cancellation = cancellation, Progress = progress };
        var spectrum = solved?.Spectrum ?? solver.Solve(device);
        cancellation.ThrowIfCancellationRequested();
        var quantities = solved?.Quantities ?? DerivedQuantities.From(spectrum);
        IReadOnlyList<ConvergenceEntry>? convergence = null;
        IReadOnlyList<CoherenceBudget>? coherence = null;
        string? convergenceProblem = null, coherenceProblem = null;
        if (checkConvergence)
        {
            cancellation.ThrowIfCancellationRequested();
            // The check raises every cutoff; an element that cannot grow (a short level list) must not cost the point.
            try { convergence = TruncationConvergence.Check(solver, device); }
            catch (Exception e) when (e is ArgumentException or InvalidOperationException) { convergenceProblem = e.Message; }
            // extra solves at shifted flux and offset charge; with the convergence check, so a quick first view is not delayed
            try { coherence = CoherenceEstimator.Estimate(solver, spectrum, coherenceInputs ?? new CoherenceInputs(), cancellation); }
            catch (Exception e) when (e is ArgumentException or InvalidOperationException) { coherenceProblem = e.Message; }
        }
        return new PointSnapshot(spectrum, quantities, convergence, DateTime.Now, clock.Elapsed + (solved?.Elapsed ?? TimeSpan.Zero))
            { ConvergenceProblem = convergenceProblem, Coherence = coherence, CoherenceProblem = coherenceProblem, Warnings = TruncationWarnings.For(device) };
    }

    /// <summary>A snapshot of a computed sweep point (its quantities as the sweep derived them), without convergence.</summary>
    public static PointSnapshot FromSweepPoint(Core.Sweeps.SweepPoint point, DateTime computedAt) =>
        new(point.Spectrum, point.Derived, null, computedAt, TimeSpan.Zero);
}
