using LevelDesign.Core.Analysis;
using LevelDesign.Core.Composite;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Model;
using LevelDesign.Core.Presentation;
using LevelDesign.Core.Sweeps;

namespace LevelDesign.Core.Spread;

/// <summary>
/// Evaluates the rules on one device (a drawn chip, or the nominal one). Each rule gives one figure:
/// a bound or purity at a point, the quantity there; along a sweep, its worst value (the lowest for a lower bound,
/// the highest for an upper one, the largest size for 'within', and for 'between' the extreme nearer its limit);
/// a crossing rule, the largest gap of a crossing between its two states (0 when there is none); a root rule, the
/// bias of the first root found (NaN when none). Points and sweeps named by several rules are solved once.
/// Everything is computed on one thread, so a sample's figures do not depend on how samples are shared out.
/// </summary>
public sealed class RuleEvaluator(DeviceDocument document, IReadOnlyList<SpreadRule> rules)
{
    private readonly DeviceSolver _solver = new();

    /// <summary>Per rule the figure and a problem text (e.g. an unknown quantity name) when it could not be measured.</summary>
    public (double[] Figures, string?[] Problems) Evaluate(Device device, CancellationToken cancellation = default)
    {
        var points = new Dictionary<string, DerivedQuantities>();
        var sweeps = new Dictionary<string, SweepResult>();
        var figures = new double[rules.Count];
        var problems = new string?[rules.Count];
        for (int r = 0; r < rules.Count; r++)
        {
            cancellation.ThrowIfCancellationRequested();
            try { figures[r] = Figure(rules[r], device, points, sweeps, cancellation); }
            catch (ArgumentException e) { figures[r] = double.NaN; problems[r] = e.Message; }
        }
        return (figures, problems);
    }

    private double Figure(SpreadRule rule, Device device, Dictionary<string, DerivedQuantities> points, Dictionary<string, SweepResult> sweeps,
        CancellationToken cancellation)
    {
        switch (rule.Kind)
        {
            case SpreadRuleKind.Root:
                return Root(rule, device, cancellation);
            case SpreadRuleKind.NoCrossing:
                return LargestGap(rule, device, Sweep(rule.Sweep!, device, sweeps, cancellation), cancellation);
        }
        var quantity = rule.Quantity!;
        bool purity = rule.Kind == SpreadRuleKind.Purity;
        if (rule.Point is string name)
        {
            if (!points.TryGetValue(name, out var derived))
            {
                var settings = document.Points.First(p => p.Name == name).BiasValues;
                points[name] = derived = DerivedQuantities.From(_solver.Solve(document.At(settings, device)));
            }
            return purity ? quantity.Purity(derived.NamedPurities()) : Checked(quantity, derived.Named());
        }
        var sweep = Sweep(rule.Sweep!, device, sweeps, cancellation);
        var values = sweep.Points.Select(p => purity ? quantity.Purity(p.QuantityPurities) : Checked(quantity, p.Quantities)).ToList();
        return Worst(rule, values);
    }

    /// <summary>The value, after checking every name (QuantityLookup would also read a name that is itself a sum).</summary>
    private static double Checked(QuantityExpression quantity, IReadOnlyDictionary<string, double> named)
    {
        foreach (var (_, term) in quantity.Terms)
            if (!named.ContainsKey(term))
                throw new ArgumentException($"no quantity '{term}'{EditDistance.Suggestion(term, named.Keys)} (quantities here: {string.Join(", ", named.Keys.OrderBy(k => k, StringComparer.Ordinal))})");
        return quantity.Value(named);
    }

    /// <summary>The value along a sweep that decides the rule (see the class summary); NaN if any point lacks it.</summary>
    internal static double Worst(SpreadRule rule, IReadOnlyList<double> values)
    {
        if (values.Count == 0 || values.Any(double.IsNaN)) return double.NaN;
        double min = values.Min(), max = values.Max();
        return rule.Comparison switch
        {
            SpreadComparison.Above => min,
            SpreadComparison.Below => max,
            SpreadComparison.Within => Math.Abs(min) > Math.Abs(max) ? min : max,
            _ => min - rule.Low < rule.High - max ? min : max,
        };
    }

    private SweepResult Sweep(string name, Device device, Dictionary<string, SweepResult> sweeps, CancellationToken cancellation)
    {
        if (sweeps.TryGetValue(name, out var done)) return done;
        var axes = document.Sweeps.First(s => s.Name == name).Axes;
        var options = new SweepOptions { Solver = _solver, Parallelism = 1 };
        var result = SweepRunner.RunAsync(values => document.Resolve(axes, values, null, device), new SweepPlan(axes), options, null, cancellation)
            .GetAwaiter().GetResult();
        cancellation.ThrowIfCancellationRequested();
        return sweeps[name] = result;
    }

    private double LargestGap(SpreadRule rule, Device device, SweepResult sweep, CancellationToken cancellation)
    {
        var ids = device.Elements.Select(e => e.Id).ToArray();
        var axis = sweep.Plan.Axes[0];
        var crossings = CrossingFinder.Find(sweep, bias => document.Resolve([axis], [bias], null, device), new CrossingOptions(), _solver, cancellation);
        double largest = 0;
        foreach (var c in crossings)
        {
            string a = StateNames.Of(ids, c.StateA), b = StateNames.Of(ids, c.StateB);
            if ((a == rule.StateA && b == rule.StateB) || (a == rule.StateB && b == rule.StateA)) largest = Math.Max(largest, c.GapGHz);
        }
        return largest;
    }

    private double Root(SpreadRule rule, Device device, CancellationToken cancellation)
    {
        var axis = new SweepAxis(rule.RootBias!, rule.RootLow, rule.RootHigh, rule.RootScanPoints, []);
        var options = new SweepOptions { Solver = _solver, Parallelism = 1 };
        var roots = TargetSolver.FindAllAsync(values => document.Resolve([axis], values, null, device), axis, rule.Quantity!.ToString(), rule.RootTarget,
            options, null, 1e-12, cancellation).GetAwaiter().GetResult();
        return roots.FirstOrDefault(r => r.Refined) is TargetRoot root ? root.Bias : double.NaN;
    }
}
