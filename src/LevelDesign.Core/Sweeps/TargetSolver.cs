using LevelDesign.Core.Analysis;
using LevelDesign.Core.Composite;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Model;

namespace LevelDesign.Core.Sweeps;

/// <summary>
/// Solves for every bias in a range where a named quantity equals a target (e.g. "qa.f01" = 5.25 GHz, or
/// "zz:qa:qb" = 0): the range is scanned with a labelled sweep, and each sign change of (quantity − target)
/// between neighbouring points is refined by Brent's bracketing root finder. Every root is reported; a sign
/// change that is a jump rather than a root is reported with Refined = false and its residual. With
/// <c>refineBelowPurity</c>, every scan step with a hybridized end is sampled <see cref="RefinementSamples"/> times finer
/// first, so a root sharing a step with a label jump is found as a finer scan would find it.
/// </summary>
/// <remarks>
/// Points inside a bracket are labelled as the scan labels its points: carried, by bare character and eigenvector
/// overlap, from the nearer end of the bracket (<see cref="LabelTracker"/>), not labelled afresh. Near an avoided
/// crossing of the targeted state the two differ (a carried label stays with its state until another state's
/// character wins clearly), and fresh labels would put a jump where the scan saw the quantity pass the target.
/// </remarks>
public static class TargetSolver
{
    public static async Task<IReadOnlyList<TargetRoot>> FindAllAsync(Func<IReadOnlyList<double>, Device> resolve, SweepAxis axis,
        string quantity, double target, SweepOptions? options = null, int? levels = null, double tolerance = 1e-12,
        CancellationToken cancellation = default, double? refineBelowPurity = null) =>
        (await SearchAsync(resolve, axis, quantity, target, options, levels, tolerance, cancellation, refineBelowPurity).ConfigureAwait(false)).Roots;

    /// <summary>As <see cref="FindAllAsync"/>, with the scan point nearest the goal as well.</summary>
    public static async Task<TargetSearchResult> SearchAsync(Func<IReadOnlyList<double>, Device> resolve, SweepAxis axis,
        string quantity, double target, SweepOptions? options = null, int? levels = null, double tolerance = 1e-12,
        CancellationToken cancellation = default, double? refineBelowPurity = null)
    {
        options ??= new SweepOptions();
        var solver = options.CreateSolver();
        // refinement points carry their labels from the scan's vectors, so the scan keeps them
        options = options with { Solver = solver, KeepVectors = true };
        if (axis.Count < 2) throw new ArgumentException($"axis '{axis.Path}': a root search needs at least 2 scan points");
        const LabelMode labels = LabelMode.ByCharacter;
        var scan = await SweepRunner.RunAsync(resolve, new SweepPlan([axis], labels, levels), options, null, cancellation)
            .ConfigureAwait(false);
        var x = scan.Points.Select(p => p.AxisValues[0]).ToArray();
        var f = scan.Points.Select(p => QuantityLookup.Value(p.Quantities, quantity) - target).ToArray();

        var scanPoints = new Dictionary<int, SolvedPoint>();
        SolvedPoint ScanPoint(int i) =>
            scanPoints.TryGetValue(i, out var p) ? p : scanPoints[i] = AsSolvedPoint(solver, scan.Points[i].Spectrum);

        // the quantity at a bias inside [x[i], x[i+1]], its labels carried from the nearer end, with the lowest purity
        // of the labelled states it is read from
        (double Residual, double Purity) Evaluate(double bias, int i)
        {
            cancellation.ThrowIfCancellationRequested();
            int nearer = Math.Abs(bias - x[i]) <= Math.Abs(bias - x[i + 1]) ? i : i + 1;
            var problem = solver.Prepare(resolve([bias]));
            // a standalone solve (dense, or cold iterative for a large module), so a refinement point does not depend on the one before it
            var point = solver.SolvePoint(problem, levels ?? solver.DefaultCount(problem));
            var reference = ScanPoint(nearer);
            var (spectrum, _) = new LabelTracker(labels, options, point.Count)
                .Next(point, LabelTracker.Inputs(labels, point, reference), scan.Points[nearer].Spectrum);
            var derived = DerivedQuantities.From(spectrum);
            return (QuantityLookup.Value(derived.Named(), quantity) - target, QuantityLookup.Purity(derived.NamedPurities(), quantity));
        }
        double Residual(double bias, int i) => Evaluate(bias, i).Residual;

        var roots = new List<TargetRoot>();
        for (int i = 0; i < f.Length; i++)
        {
            cancellation.ThrowIfCancellationRequested();
            if (f[i] == 0)
            {
                roots.Add(new TargetRoot(quantity, target, x[i], target, 0, true) { Purity = QuantityLookup.Purity(scan.Points[i].QuantityPurities, quantity) });
                continue;
            }
            if (i + 1 >= f.Length || !double.IsFinite(f[i]) || !double.IsFinite(f[i + 1])) continue;
            int bracket = i;
            // Inside a hybridized stretch a label jump and a root can share one scan step (the ends then have the same
            // sign, or the sign change is the jump's): there the step is sampled finer, each sample labelled as the
            // refinement labels it (carried from the nearer scan point), and every sign change between samples refined.
            var samples = new List<(double Bias, double F)> { (x[i], f[i]) };
            if (refineBelowPurity is double threshold && Math.Min(PurityAt(i), PurityAt(i + 1)) < threshold)
                for (int k = 1; k < RefinementSamples; k++)
                {
                    double b = x[i] + (x[i + 1] - x[i]) * k / RefinementSamples;
                    samples.Add((b, Residual(b, bracket)));
                }
            samples.Add((x[i + 1], f[i + 1]));
            for (int s = 0; s + 1 < samples.Count; s++)
            {
                var (lo, flo) = samples[s];
                var (hi, fhi) = samples[s + 1];
                if (!double.IsFinite(flo) || !double.IsFinite(fhi) || fhi == 0 || Math.Sign(flo) == Math.Sign(fhi)) continue;
                if (s > 0 && flo == 0) continue;
                if (MathNet.Numerics.RootFinding.Brent.TryFindRoot(b => Residual(b, bracket), lo, hi, tolerance, 200, out double root))
                {
                    var (r, purity) = Evaluate(root, bracket);
                    // a jump (e.g. a label moving to another state) changes sign without a root: Brent converges onto
                    // the jump and leaves a residual of the jump's size, so it is reported as not refined
                    bool isRoot = Math.Abs(r) <= Math.Max(1e-9, 1e-6 * Math.Max(Math.Abs(flo), Math.Abs(fhi)));
                    roots.Add(new TargetRoot(quantity, target, root, target + r, r, isRoot) { Purity = purity });
                }
                else
                {
                    // the bracket holds a sign change but no smooth root (e.g. a label jump): report it unrefined
                    roots.Add(new TargetRoot(quantity, target, 0.5 * (lo + hi), double.NaN, double.NaN, false));
                }
            }
        }
        int nearest = -1;
        for (int i = 0; i < f.Length; i++)
            if (double.IsFinite(f[i]) && (nearest < 0 || Math.Abs(f[i]) < Math.Abs(f[nearest]))) nearest = i;
        var closest = nearest < 0 ? null : new TargetApproach(x[nearest], f[nearest] + target, PurityAt(nearest));
        return new TargetSearchResult(roots, closest);

        double PurityAt(int i) => QuantityLookup.Purity(scan.Points[i].QuantityPurities, quantity);
    }

    /// <summary>Sub-steps a scan step is split into when refined (see refineBelowPurity).</summary>
    public const int RefinementSamples = 8;

    /// <summary>A scan point's eigenpairs in the form the label tracker carries labels from (same states, same order).</summary>
    private static SolvedPoint AsSolvedPoint(DeviceSolver solver, DressedSpectrum spectrum) =>
        new(solver.Prepare(spectrum.Device) with { Basis = spectrum.Basis },
            spectrum.Energies.Select(e => e + spectrum.GroundEnergy).ToArray(), spectrum.RealVectors, spectrum.ComplexVectors,
            spectrum.SolverName);
}
