namespace LevelDesign.Core.Sweeps;

/// <summary>
/// One-dimensional minimisation on an interval by Brent's method (golden-section steps with parabolic
/// interpolation; R. P. Brent, Algorithms for Minimization without Derivatives, 1973, ch. 5), written here.
/// </summary>
public static class BrentMinimizer
{
    private const double GoldenSection = 0.3819660112501051;   // (3 − √5)/2

    /// <returns>The abscissa of the minimum found and the function value there.</returns>
    public static (double X, double Value) Minimize(Func<double, double> f, double lower, double upper,
        double tolerance = 1e-10, int maxIterations = 200) => Minimize(f, lower, upper, [], tolerance, maxIterations);

    /// <summary>
    /// As above, starting from values of f already known inside the interval (e.g. from neighbouring searches):
    /// the interval narrows at once to the known neighbours of the best known point (f is assumed unimodal, as
    /// Brent's method does throughout), and the first step is a parabola through the three best known points.
    /// With none known it is the classic start (one golden-section point).
    /// </summary>
    public static (double X, double Value) Minimize(Func<double, double> f, double lower, double upper,
        IReadOnlyList<(double X, double Value)> known, double tolerance = 1e-10, int maxIterations = 200)
    {
        double a = Math.Min(lower, upper), b = Math.Max(lower, upper);
        double x, w, v, fx, fw, fv, d, e;
        var inside = known.Where(p => p.X >= a && p.X <= b && !double.IsNaN(p.Value)).OrderBy(p => p.Value).ThenBy(p => p.X).ToArray();
        if (inside.Length == 0)
        {
            x = a + GoldenSection * (b - a);
            w = v = x;
            fx = fw = fv = f(x);
            d = e = 0;   // no step history: the first step is golden
        }
        else
        {
            (x, fx) = inside[0];
            foreach (var p in inside)
            {
                if (p.X < x) a = Math.Max(a, p.X);
                if (p.X > x) b = Math.Min(b, p.X);
            }
            var others = inside.Skip(1).Where(p => p.X >= a && p.X <= b && p.X != x).ToArray();
            (w, fw) = others.Length > 0 ? others[0] : (x, fx);
            (v, fv) = others.Length > 1 ? others[1] : (w, fw);
            d = e = b - a;   // a step history as wide as the interval lets the first step be parabolic
        }
        for (int iteration = 0; iteration < maxIterations; iteration++)
        {
            double middle = 0.5 * (a + b);
            double tol1 = 1.5e-8 * Math.Abs(x) + tolerance, tol2 = 2 * tol1;
            if (Math.Abs(x - middle) <= tol2 - 0.5 * (b - a)) break;
            bool golden = true;
            if (Math.Abs(e) > tol1)
            {
                double r = (x - w) * (fx - fv), q = (x - v) * (fx - fw), p = (x - v) * q - (x - w) * r;
                q = 2 * (q - r);
                if (q > 0) p = -p; else q = -q;
                double previousStep = e;
                e = d;
                if (Math.Abs(p) < Math.Abs(0.5 * q * previousStep) && p > q * (a - x) && p < q * (b - x))
                {
                    d = p / q;
                    double trial = x + d;
                    if (trial - a < tol2 || b - trial < tol2) d = x < middle ? tol1 : -tol1;
                    golden = false;
                }
            }
            if (golden)
            {
                e = (x < middle ? b : a) - x;
                d = GoldenSection * e;
            }
            double u = x + (Math.Abs(d) >= tol1 ? d : (d > 0 ? tol1 : -tol1));
            double fu = f(u);
            if (fu <= fx)
            {
                if (u < x) b = x; else a = x;
                (v, fv, w, fw, x, fx) = (w, fw, x, fx, u, fu);
            }
            else
            {
                if (u < x) a = u; else b = u;
                if (fu <= fw || w == x) (v, fv, w, fw) = (w, fw, u, fu);
                else if (fu <= fv || v == x || v == w) (v, fv) = (u, fu);
            }
        }
        return (x, fx);
    }
}
