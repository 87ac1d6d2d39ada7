using System.Diagnostics;
using LevelDesign.Core.Analysis;
using LevelDesign.Core.Composite;
using LevelDesign.Core.Model;

namespace LevelDesign.Ui.Compute;

/// <summary>Solves one device (off the UI thread), checks truncation convergence and estimates the coherence budget.</summary>
public static class PointComputer
{
    public static PointSnapshot Compute(Device device, bool checkConvergence, CancellationToken cancellation, CoherenceInputs? coherenceInputs = null)
    {
        var clock = Stopwatch.StartNew();
        var solver = new DeviceSolver();
        var spectrum = solver.Solve(device);
        cancellation.ThrowIfCancellationRequested();
        var quantities = DerivedQuantities.From(spectrum);
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
        return new PointSnapshot(spectrum, quantities, convergence, DateTime.Now, clock.Elapsed)
            { ConvergenceProblem = convergenceProblem, Coherence = coherence, CoherenceProblem = coherenceProblem, Warnings = TruncationWarnings.For(device) };
    }

    /// <summary>A snapshot of a computed sweep point (its quantities as the sweep derived them), without convergence.</summary>
    public static PointSnapshot FromSweepPoint(Core.Sweeps.SweepPoint point, DateTime computedAt) =>
        new(point.Spectrum, point.Derived, null, computedAt, TimeSpan.Zero);
}
