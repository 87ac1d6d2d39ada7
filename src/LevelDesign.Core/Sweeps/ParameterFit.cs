using LevelDesign.Core.Composite;
using LevelDesign.Core.Model;
using MathNet.Numerics.LinearAlgebra;

namespace LevelDesign.Core.Sweeps;

/// <summary>
/// Fits element or coupler parameters to targets by bounded least squares: Levenberg–Marquardt on the
/// parameters mapped to the unit box ([Lower, Upper] → [0, 1]), steps clipped to the box, Jacobian by
/// finite differences of full dressed solves. Returns fitted values by path; writing them back is the caller's.
/// </summary>
public static class ParameterFit
{
    public static FitResult Fit(Device device, IReadOnlyList<FitParameter> parameters, IReadOnlyList<FitTarget> targets,
        DeviceSolver? solver = null, int? levels = null, int maxIterations = 100, CancellationToken cancellation = default)
    {
        solver ??= new DeviceSolver();
        var problems = new List<string>();
        foreach (var p in parameters)
        {
            if (!(p.Lower < p.Upper) || !double.IsFinite(p.Lower) || !double.IsFinite(p.Upper))
                problems.Add($"'{p.Path}': bounds must be finite with lower < upper (got [{p.Lower}, {p.Upper}])");
            else if (p.Initial < p.Lower || p.Initial > p.Upper)
                problems.Add($"'{p.Path}': initial value {p.Initial} lies outside [{p.Lower}, {p.Upper}]");
            try { device.WithParameter(p.Path, p.Initial); } catch (ArgumentException e) { problems.Add(e.Message); }
        }
        foreach (var t in targets.Where(t => !(t.Scale > 0))) problems.Add($"target '{t.Quantity}': scale must be positive");
        if (targets.Count == 0) problems.Add("no targets to fit");
        if (problems.Count > 0) throw new ArgumentException(string.Join("; ", problems));

        int np = parameters.Count, nt = targets.Count;
        double[] ToValues(double[] u) => parameters.Select((p, i) => p.Lower + Math.Clamp(u[i], 0, 1) * (p.Upper - p.Lower)).ToArray();

        var purities = new double[nt];   // of the last evaluation, read at the end for the fitted point
        double[] Achieved(double[] u)
        {
            var values = ToValues(u);
            var fitted = device;
            for (int i = 0; i < np; i++) fitted = fitted.WithParameter(parameters[i].Path, values[i]);
            var achieved = new double[nt];
            // targets sharing settings share one solve
            foreach (var group in Enumerable.Range(0, nt).GroupBy(j => SettingsKey(targets[j].Settings)))
            {
                var at = fitted;
                foreach (var (path, value) in targets[group.First()].Settings ?? new Dictionary<string, double>()) at = at.WithParameter(path, value);
                var spectrum = solver.Solve(at, levels);
                var derived = Analysis.DerivedQuantities.From(spectrum);
                var quantities = derived.Named();
                var quantityPurities = derived.NamedPurities();
                foreach (int j in group)
                {
                    achieved[j] = QuantityLookup.Value(quantities, targets[j].Quantity);
                    purities[j] = QuantityLookup.Purity(quantityPurities, targets[j].Quantity);
                }
            }
            return achieved;
        }

        double[] Residuals(double[] u)
        {
            var a = Achieved(u);
            return a.Select((v, j) => (v - targets[j].Value) / targets[j].Scale).ToArray();
        }

        static double Cost(double[] r) => r.Sum(x => x * x);

        var u = parameters.Select(p => (p.Initial - p.Lower) / (p.Upper - p.Lower)).ToArray();
        var r = Residuals(u);
        double cost = Cost(r), lambda = 1e-3;
        int iteration = 0;
        bool converged = false;
        string message = "iteration limit reached";
        const double step = 1e-7;
        while (iteration < maxIterations)
        {
            cancellation.ThrowIfCancellationRequested();
            iteration++;
            if (!double.IsFinite(cost)) { message = "a target could not be evaluated (NaN): is the labelled state among the computed ones?"; break; }
            if (cost < 1e-28) { converged = true; message = "residuals at numerical precision"; break; }
            var jacobian = Matrix<double>.Build.Dense(nt, np);
            for (int i = 0; i < np; i++)
            {
                var shifted = (double[])u.Clone();
                double h = u[i] + step <= 1 ? step : -step;
                shifted[i] += h;
                var rs = Residuals(shifted);
                for (int j = 0; j < nt; j++) jacobian[j, i] = (rs[j] - r[j]) / h;
            }
            var jt = jacobian.Transpose();
            var normal = jt * jacobian;
            var gradient = jt * Vector<double>.Build.DenseOfArray(r);
            bool improved = false;
            while (lambda < 1e12)
            {
                var damped = normal.Clone();
                for (int i = 0; i < np; i++) damped[i, i] += lambda * Math.Max(normal[i, i], 1e-12);
                var delta = damped.Solve(-gradient);
                var trial = u.Select((x, i) => Math.Clamp(x + delta[i], 0, 1)).ToArray();
                var trialR = Residuals(trial);
                double trialCost = Cost(trialR);
                if (trialCost < cost)
                {
                    double moved = trial.Zip(u, (a, b) => Math.Abs(a - b)).Max();
                    bool small = cost - trialCost <= 1e-14 * cost || moved < 1e-13;
                    (u, r, cost) = (trial, trialR, trialCost);
                    lambda = Math.Max(lambda / 3, 1e-12);
                    improved = true;
                    if (small) { converged = true; message = "step below tolerance"; }
                    break;
                }
                lambda *= 4;
            }
            if (converged) break;
            if (!improved) { converged = true; message = "no further decrease (a local minimum, or a target out of reach within the bounds)"; break; }
        }

        var final = ToValues(u);
        var achievedFinal = Achieved(u);
        var residuals = targets.Select((t, j) => new FitResidual(t, achievedFinal[j], achievedFinal[j] - t.Value, purities[j])).ToArray();
        var atBounds = parameters.Where((p, i) => u[i] <= 1e-9 || u[i] >= 1 - 1e-9).Select(p => p.Path).ToArray();
        var values = parameters.Select((p, i) => (p.Path, final[i])).ToDictionary(x => x.Path, x => x.Item2);
        return new FitResult(values, residuals, iteration, converged, message) { AtBounds = atBounds };
    }

    private static string SettingsKey(IReadOnlyDictionary<string, double>? settings) =>
        settings is null ? "" : string.Join(";", settings.OrderBy(kv => kv.Key).Select(kv => $"{kv.Key}={kv.Value:R}"));
}
