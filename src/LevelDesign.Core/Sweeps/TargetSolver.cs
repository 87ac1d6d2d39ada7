using LevelDesign.Core.Analysis;
using LevelDesign.Core.Composite;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Model;

namespace LevelDesign.Core.Sweeps;

/// <summary>
/// Solves for every bias in a range where a named quantity equals a target (e.g. "qa.f01" = 5.25 GHz, or
/// "zz:qa:qb" = 0): the range is scanned with a labelled sweep, and each sign change of (quantity − target)
/// between neighbouring points is refined by Brent's bracketing root finder. Every root is reported; a sign
/// change that is a jump rather than a root is reported with Refined = false and its residual.
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
        CancellationToken cancellation = default)
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
            if (i + 1 >= f.Length || !double.IsFinite(f[i]) || !double.IsFinite(f[i + 1]) || f[i + 1] == 0 || Math.Sign(f[i]) == Math.Sign(f[i + 1]))
                continue;
            int bracket = i;
            if (MathNet.Numerics.RootFinding.Brent.TryFindRoot(b => Residual(b, bracket), x[i], x[i + 1], tolerance, 200, out double root))
            {
                var (r, purity) = Evaluate(root, bracket);
                // a jump (e.g. a label moving to another state) changes sign without a root: Brent converges onto
                // the jump and leaves a residual of the jump's size, so it is reported as not refined
                bool isRoot = Math.Abs(r) <= Math.Max(1e-9, 1e-6 * Math.Max(Math.Abs(f[i]), Math.Abs(f[i + 1])));
                roots.Add(new TargetRoot(quantity, target, root, target + r, r, isRoot) { Purity = purity });
            }
            else
            {
                // the bracket holds a sign change but no smooth root (e.g. a label jump): report it unrefined
                double middle = 0.5 * (x[i] + x[i + 1]);
                roots.Add(new TargetRoot(quantity, target, middle, double.NaN, double.NaN, false));
            }
        }
        return roots;
    }

    /// <summary>A scan point's eigenpairs in the form the label tracker carries labels from (same states, same order).</summary>
    private static SolvedPoint AsSolvedPoint(DeviceSolver solver, DressedSpectrum spectrum) =>
        new(solver.Prepare(spectrum.Device) with { Basis = spectrum.Basis },
            spectrum.Energies.Select(e => e + spectrum.GroundEnergy).ToArray(), spectrum.RealVectors, spectrum.ComplexVectors,
            spectrum.SolverName);
}
