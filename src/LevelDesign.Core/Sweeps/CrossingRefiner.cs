using System.Runtime.ExceptionServices;
using LevelDesign.Core.Composite;
using LevelDesign.Core.Model;

namespace LevelDesign.Core.Sweeps;

/// <summary>
/// Refines crossing candidates to their closest approach by Brent minimisation of the squared separation, sharing
/// the solves. One dense solve gives the separation of every label pair, and many candidates share a stretch of the
/// sweep (one physical crossing seen from several label pairs, spectator excitations, label hand-overs), so each
/// candidate starts from the sweep's own points in its bracket and from the solves of the candidates refined before
/// it: that narrows the bracket to the known neighbours of the best known point and gives Brent a parabola at once.
/// Solves ask only for as many states as the searched labels occupy along the sweep (plus a margin), in the real
/// gauge when the matrix is real up to phases (<see cref="SeparationSampler"/>).
/// </summary>
/// <remarks>
/// Order: sign changes first (they converge in a few parabolic steps and leave solves at the physical crossings,
/// where near-approach minima, often kinks found by slow golden-section steps, tend to lie), each group by bracket.
/// With W workers (one dense solve per core; the native solver runs one thread), the candidate at position p starts
/// from the solves of positions ≤ p − W only, whichever finished first, so results do not depend on timing.
/// </remarks>
internal static class CrossingRefiner
{
    /// <summary>States above the highest searched label kept in every refinement solve (they may mix with it).</summary>
    private const int CountMargin = 4;

    /// <summary>Each candidate refined (null where the separation is undefined), before any filtering.</summary>
    public static Crossing?[] RefineAll(SweepResult sweep, Func<double, Device> resolve, int[][] states,
        IReadOnlyList<CrossingCandidate> candidates, double tolerance, DeviceSolver solver, int workers,
        CancellationToken cancellation = default)
    {
        var sampler = new SeparationSampler(solver, resolve, states, SampleCount(sweep, states));
        var sweepSamples = sweep.Points.Select(p => sampler.FromSweepPoint(p.AxisValues[0], p.Spectrum)).OfType<SeparationSample>().ToArray();
        var order = Enumerable.Range(0, candidates.Count)
            .OrderBy(c => candidates[c].SignChange ? 0 : 1)
            .ThenBy(c => Math.Min(candidates[c].Lower, candidates[c].Upper)).ThenBy(c => Math.Max(candidates[c].Lower, candidates[c].Upper))
            .ThenBy(c => c).ToArray();
        workers = Math.Clamp(workers, 1, Math.Max(1, order.Length));
        var refined = new Crossing?[candidates.Count];
        var solvedAt = order.Select(_ => new List<SeparationSample>()).ToArray();
        var finished = order.Select(_ => new ManualResetEventSlim()).ToArray();
        using var stop = CancellationTokenSource.CreateLinkedTokenSource(cancellation);
        int next = -1;

        void Work()
        {
            for (int p; (p = Interlocked.Increment(ref next)) < order.Length;)
                try
                {
                    var known = new List<SeparationSample>(sweepSamples);
                    for (int q = 0; q <= p - workers; q++)
                    {
                        finished[q].Wait(stop.Token);
                        known.AddRange(solvedAt[q]);
                    }
                    refined[order[p]] = Refine(sampler, states, candidates[order[p]], known, solvedAt[p], tolerance, stop.Token);
                }
                catch
                {
                    stop.Cancel();   // the others stop too; the first failure is reported below
                    throw;
                }
                finally
                {
                    finished[p].Set();
                }
        }

        var tasks = Enumerable.Range(0, workers).Select(_ => Task.Run(Work, CancellationToken.None)).ToArray();
        try
        {
            Task.WaitAll(tasks);
        }
        catch (AggregateException e)
        {
            cancellation.ThrowIfCancellationRequested();
            ExceptionDispatchInfo.Capture(e.InnerExceptions.FirstOrDefault(x => x is not OperationCanceledException) ?? e.InnerExceptions[0]).Throw();
        }
        finally
        {
            foreach (var f in finished) f.Dispose();
        }
        return refined;
    }

    /// <summary>
    /// Dressed states per refinement solve: up to the highest index any searched label takes along the sweep, plus a
    /// margin, never more than the sweep computed (all of them when a label left the computed states somewhere).
    /// </summary>
    public static int SampleCount(SweepResult sweep, int[][] states)
    {
        int available = sweep.Points[0].Spectrum.Count, highest = 0;
        foreach (var point in sweep.Points)
            foreach (var state in states)
            {
                int k = point.Spectrum.DressedIndexOf(state);
                if (k < 0) return available;
                highest = Math.Max(highest, k);
            }
        return Math.Min(available, highest + 1 + CountMargin);
    }

    /// <param name="known">Samples this candidate may start from (only those inside its bracket are used).</param>
    /// <param name="solved">Receives every sample this candidate evaluates.</param>
    private static Crossing? Refine(SeparationSampler sampler, int[][] states, CrossingCandidate candidate,
        IEnumerable<SeparationSample> known, List<SeparationSample> solved, double tolerance, CancellationToken cancellation)
    {
        var (a, b) = (candidate.A, candidate.B);
        double lower = Math.Min(candidate.Lower, candidate.Upper), upper = Math.Max(candidate.Lower, candidate.Upper);
        double SquaredGap(double bias)
        {
            cancellation.ThrowIfCancellationRequested();
            var sample = sampler.At(bias);
            solved.Add(sample);
            return sample.SquaredGap(a, b);
        }
        var start = known.Where(s => s.Bias >= lower && s.Bias <= upper).Select(s => (s.Bias, s.SquaredGap(a, b))).ToArray();
        // the squared gap of two coupled levels is a parabola in the bias near its minimum, so Brent's parabolic
        // steps converge in a few solves
        var (bias, squared) = BrentMinimizer.Minimize(SquaredGap, lower, upper, start, tolerance);
        if (squared == double.MaxValue) return null;
        // a dense solve even when the best sample is a sweep point (solved iteratively)
        var (gap, purity, pairWeight) = sampler.At(bias).Separation(a, b);
        if (!double.IsFinite(gap)) return null;
        bool interior = bias > lower + 10 * tolerance && bias < upper - 10 * tolerance;
        return new Crossing(Presentation.StateNames.Tuple(states[a]), Presentation.StateNames.Tuple(states[b]), states[a], states[b], bias, gap, purity, interior, PairWeight: pairWeight);
    }
}
