using LevelDesign.Core.Composite;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Sweeps;

namespace LevelDesign.Core.Tests.Sweeps;

/// <summary>
/// The crossing search refines its candidates through shared solves (one sampler, sweep points as starting samples,
/// real gauge, fewer states). These tests hold it to the plain procedure it replaced: every candidate refined on its
/// own by Brent's method from the classic start, each step a full complex dense solve through <see cref="DeviceSolver"/>.
/// </summary>
public class CrossingRefinementTests
{
    /// <summary>
    /// Two tunable transmons, a tunable coupler swept from 7.9 GHz down to 3 GHz through both qubits, and two resonators
    /// coupled through their charge i(a† − a): a complex Hamiltonian (so the real-gauge path is exercised) of 121 states
    /// (so the sweep is solved iteratively) with many label pairs meeting in the same stretches (so solves are shared). The crossings reported must be those the
    /// independent refinement gives after the same selection: same labels, biases within the final Brent brackets, gaps
    /// to 1e-9 GHz.
    /// </summary>
    [Fact]
    public async Task Shared_refinement_reports_the_crossings_of_refining_each_candidate_alone()
    {
        var (sweep, resolve, options) = await CouplerSweep();
        var solver = new DeviceSolver();
        Assert.False(solver.Prepare(resolve(0.2)).Hamiltonian.IsReal);

        var states = CrossingFinder.SearchedStates(sweep, options);
        var candidates = CrossingFinder.Candidates(sweep, states, options);
        Assert.True(candidates.Count >= 10, $"only {candidates.Count} candidates: the test device should give many");
        Assert.True(candidates.Select(c => (c.Lower, c.Upper)).Distinct().Count() < candidates.Count,
            "some candidates should share a bracket, or nothing is shared");
        var alone = AloneAll(sweep, resolve, states, candidates, options, solver);
        double step = Math.Abs(sweep.Points[1].AxisValues[0] - sweep.Points[0].AxisValues[0]);
        var expected = CrossingFinder.Keep(candidates, alone, options, step);

        var found = CrossingFinder.Find(sweep, resolve, options, solver);

        Assert.True(expected.Count >= 5, $"only {expected.Count} crossings: the test device should give several");
        Assert.Equal(expected.Count, found.Count);
        for (int i = 0; i < expected.Count; i++)
        {
            var (e, f) = (expected[i], found[i]);
            Assert.Equal((e.LabelA, e.LabelB), (f.LabelA, f.LabelB));
            Assert.True(Math.Abs(f.Bias - e.Bias) <= FinalBracket(e.Bias, options), $"{e.LabelA}↔{e.LabelB}: bias {f.Bias} vs {e.Bias}");
            Assert.True(Math.Abs(f.GapGHz - e.GapGHz) <= 1e-9, $"{e.LabelA}↔{e.LabelB}: gap {f.GapGHz} vs {e.GapGHz}");
            AssertSamePurity(sweep, e, f);
        }
    }

    /// <summary>
    /// Candidate by candidate, wherever the independent refinement ends at a clean two-level minimum (inside its
    /// bracket, pair weight ≥ 0.8, states mixed: purity ≤ 0.9), the shared one must end there too. Elsewhere the two
    /// may differ and that is not checked: at a kink, where a third state takes over the A/B character (pair weight
    /// ≤ 2/3 there, since three shares that sum to at most 2 are equal), the gap is linear in the bias and is fixed
    /// only to slope × tolerance; a bracket holding two local minima may give either one; and a flat minimum of
    /// two states that stay pure fixes the bias only loosely. The selection drops all of these.
    /// </summary>
    [Fact]
    public async Task Every_clean_two_level_minimum_is_refined_as_alone()
    {
        var (sweep, resolve, options) = await CouplerSweep();
        var solver = new DeviceSolver();
        var states = CrossingFinder.SearchedStates(sweep, options);
        var candidates = CrossingFinder.Candidates(sweep, states, options);
        var alone = AloneAll(sweep, resolve, states, candidates, options, solver);
        var shared = CrossingRefiner.RefineAll(sweep, resolve, states, candidates, options.BiasTolerance, solver, Environment.ProcessorCount);

        int clean = 0;
        for (int c = 0; c < candidates.Count; c++)
        {
            if (alone[c] is not Crossing e || !e.Refined || e.PairWeight < 0.8 || e.Purity > 0.9) continue;
            clean++;
            var f = Assert.IsType<Crossing>(shared[c]);
            string what = $"candidate {c}: {e.LabelA}↔{e.LabelB}";
            Assert.True(f.Refined, what);
            Assert.True(Math.Abs(f.Bias - e.Bias) <= FinalBracket(e.Bias, options), $"{what}: bias {f.Bias} vs {e.Bias}");
            Assert.True(Math.Abs(f.GapGHz - e.GapGHz) <= 1e-9, $"{what}: gap {f.GapGHz} vs {e.GapGHz}");
            AssertSamePurity(sweep, e, f);
        }
        Assert.True(clean >= 5, $"only {clean} clean minima to compare");
    }

    /// <summary>
    /// With several workers each candidate starts only from the solves of candidates at least that many places before
    /// it, so the result cannot depend on which worker finished first: two runs must agree bit for bit.
    /// </summary>
    [Fact]
    public async Task Parallel_refinement_does_not_depend_on_timing()
    {
        var (sweep, resolve, options) = await CouplerSweep();
        var states = CrossingFinder.SearchedStates(sweep, options);
        var candidates = CrossingFinder.Candidates(sweep, states, options);
        var first = CrossingRefiner.RefineAll(sweep, resolve, states, candidates, options.BiasTolerance, new DeviceSolver(), workers: 2);
        var second = CrossingRefiner.RefineAll(sweep, resolve, states, candidates, options.BiasTolerance, new DeviceSolver(), workers: 2);
        Assert.Equal(first.Select(c => (c?.Bias, c?.GapGHz, c?.Purity)), second.Select(c => (c?.Bias, c?.GapGHz, c?.Purity)));
    }

    private static async Task<(SweepResult Sweep, Func<double, LevelDesign.Core.Model.Device> Resolve, CrossingOptions Options)> CouplerSweep()
    {
        var device = SweepDevices.FiveElements(levels: 4, maxExcitations: 4);
        var axis = new SweepAxis("c.flux", 0.0, 0.45, 31, []);
        var resolve = ParameterResolver.ForPaths(device, [axis]);
        var sweep = await SweepRunner.RunAsync(resolve, new SweepPlan([axis], LabelMode.ByCharacter, Levels: 36));
        var options = new CrossingOptions { Levels = 14, BiasTolerance = 1e-8 * 0.45 };
        // the paths this checks: sweep points solved iteratively (used as starting samples), refinement solves asking
        // for fewer states than the sweep kept
        Assert.Contains(sweep.Points, p => p.Spectrum.SolverName.Contains("Davidson"));
        Assert.True(CrossingRefiner.SampleCount(sweep, CrossingFinder.SearchedStates(sweep, options)) < sweep.Points[0].Spectrum.Count);
        return (sweep, ParameterResolver.OneAxis(resolve), options);
    }

    /// <summary>
    /// Brent stops once its bracket, which holds the minimum, is at most 4·tol1 wide (tol1 = 1.5e-8·|x| + tolerance), so
    /// two runs on the same function end within that of each other.
    /// </summary>
    private static double FinalBracket(double bias, CrossingOptions options) => 4 * (1.5e-8 * Math.Abs(bias) + options.BiasTolerance);

    /// <summary>
    /// Purity is not stationary at the minimum gap: for two levels with detuning Δ = s·(x − x0) and gap 2g it is
    /// ½(1 + Δ/sqrt(Δ² + 4g²)) (the 2×2 secular problem), whose slope is at most s/(2·2g); so two biases δ apart give
    /// purities up to s·δ/(2·gap) apart. s is taken, with a factor 2 to spare, from the labelled energies of the sweep
    /// around the crossing (labels by character follow the uncoupled levels). The pair weight moves with it: a dressed
    /// state's A+B share is 1 − (P·ε_A + (1 − P)·ε_B), ε being what A and B each lose to other states, and near P ≈ ½
    /// each ε is at most 2(1 − pair weight), so the pair weight moves by at most 2(1 − pair weight) times the purity.
    /// </summary>
    private static void AssertSamePurity(SweepResult sweep, Crossing expected, Crossing found)
    {
        var x = sweep.Points.Select(p => p.AxisValues[0]).ToArray();
        int i = Math.Clamp(Array.FindLastIndex(x, v => v <= expected.Bias), 1, x.Length - 3);
        double Detuning(int k) => sweep.Points[k].Spectrum.EnergyOf(expected.StateA.ToArray()) - sweep.Points[k].Spectrum.EnergyOf(expected.StateB.ToArray());
        double slope = Math.Abs(Detuning(i + 2) - Detuning(i - 1)) / Math.Abs(x[i + 2] - x[i - 1]);
        double purityBound = 2 * slope * Math.Abs(found.Bias - expected.Bias) / (2 * expected.GapGHz) + 1e-9;
        Assert.True(Math.Abs(found.Purity - expected.Purity) <= purityBound,
            $"{expected.LabelA}↔{expected.LabelB}: purity {found.Purity} vs {expected.Purity} (bound {purityBound})");
        double weightBound = 2 * (1 - expected.PairWeight) * purityBound + 1e-9;
        Assert.True(Math.Abs(found.PairWeight - expected.PairWeight) <= weightBound,
            $"{expected.LabelA}↔{expected.LabelB}: pair weight {found.PairWeight} vs {expected.PairWeight} (bound {weightBound})");
    }

    private static Crossing?[] AloneAll(SweepResult sweep, Func<double, LevelDesign.Core.Model.Device> resolve, int[][] states,
        IReadOnlyList<CrossingCandidate> candidates, CrossingOptions options, DeviceSolver solver) =>
        candidates.Select(c => RefineAlone(solver, resolve, states[c.A], states[c.B], c.Lower, c.Upper,
            sweep.Points[0].Spectrum.Count, options.BiasTolerance)).ToArray();

    /// <summary>
    /// The plain procedure, written out from the definition: Brent (classic start, no known points) on the squared
    /// separation of the two dressed states holding most of the A/B weight, each evaluation a full solve of the lowest
    /// <paramref name="count"/> states with the complex Hermitian solver.
    /// </summary>
    private static Crossing? RefineAlone(DeviceSolver solver, Func<double, LevelDesign.Core.Model.Device> resolve, int[] a, int[] b,
        double lower, double upper, int count, double tolerance)
    {
        (double Gap, double Purity, double PairWeight) Separation(double bias)
        {
            var s = solver.Solve(resolve(bias), count);
            int ia = s.Basis.IndexOf(a), ib = s.Basis.IndexOf(b);
            if (ia < 0 || ib < 0) return (double.NaN, double.NaN, double.NaN);
            var weights = s.Weights!;   // a dense solve of this small device always keeps them
            double Share(int k) => weights[k * s.Dimension + ia] + weights[k * s.Dimension + ib];
            var pair = Enumerable.Range(0, s.Count).OrderByDescending(Share).Take(2).ToArray();
            double purity = pair.Min(k => Math.Max(weights[k * s.Dimension + ia], weights[k * s.Dimension + ib]));
            return (Math.Abs(s.Energies[pair[0]] - s.Energies[pair[1]]), purity, pair.Min(Share));
        }
        var (bias, squared) = BrentMinimizer.Minimize(x => Separation(x).Gap is double g && double.IsFinite(g) ? g * g : double.MaxValue,
            lower, upper, tolerance);
        if (squared == double.MaxValue) return null;
        var (gap, purity, pairWeight) = Separation(bias);
        double lo = Math.Min(lower, upper), hi = Math.Max(lower, upper);
        return new Crossing("|" + string.Join(",", a) + "⟩", "|" + string.Join(",", b) + "⟩", a, b, bias, gap, purity,
            bias > lo + 10 * tolerance && bias < hi - 10 * tolerance, PairWeight: pairWeight);
    }
}
