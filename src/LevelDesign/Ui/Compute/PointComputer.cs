using System.Diagnostics;
using LevelDesign.Core.Analysis;
using LevelDesign.Core.Composite;
using LevelDesign.Core.Model;

namespace LevelDesign.Ui.Compute;

/// <summary>Solves one device (off the UI thread) and checks truncation convergence.</summary>
public static class PointComputer
{
    public static PointSnapshot Compute(Device device, bool checkConvergence, CancellationToken cancellation)
    {
        var clock = Stopwatch.StartNew();
        var solver = new DeviceSolver();
        var spectrum = solver.Solve(device);
        cancellation.ThrowIfCancellationRequested();
        var quantities = DerivedQuantities.From(spectrum);
        IReadOnlyList<ConvergenceEntry>? convergence = null;
        string? convergenceProblem = null;
        if (checkConvergence)
        {
            cancellation.ThrowIfCancellationRequested();
            // The check raises every cutoff; an element that cannot grow (a short level list) must not cost the point.
            try { convergence = TruncationConvergence.Check(solver, device); }
            catch (Exception e) when (e is ArgumentException or InvalidOperationException) { convergenceProblem = e.Message; }
        }
        return new PointSnapshot(spectrum, quantities, convergence, DateTime.Now, clock.Elapsed)
            { ConvergenceProblem = convergenceProblem, Warnings = TruncationWarnings.For(device) };
    }

    /// <summary>A snapshot of an already computed spectrum (a sweep point), without convergence.</summary>
    public static PointSnapshot FromSpectrum(DressedSpectrum spectrum, DateTime computedAt) =>
        new(spectrum, DerivedQuantities.From(spectrum), null, computedAt, TimeSpan.Zero);
}
