using LevelDesign.Core.Sweeps;

namespace LevelDesign.Core.Tests.Sweeps;

/// <summary>
/// Brent's minimiser started from known values. References are closed-form minima: cosh has its minimum 1 at 0, |x|
/// at 0, a parabola at its vertex (textbook). Brent's stopping rule leaves a bracket of at most 4·tol1 around the
/// minimum (tol1 = 1.5e-8·|x| + tolerance; Brent 1973, ch. 5), which bounds the error at a kink; at a smooth minimum
/// rounding of f (relative 1e-16) limits the location to about sqrt(1e-16·f/f″) (a few 1e-8 here).
/// </summary>
public class BrentMinimizerTests
{
    private const double Tolerance = 1e-10;

    private static double Tol1(double x) => 1.5e-8 * Math.Abs(x) + Tolerance;

    [Fact]
    public void Smooth_minimum_from_known_points()
    {
        Func<double, double> f = x => Math.Cosh(x - 0.3);
        var known = new[] { 0.0, 0.25, 0.5, 1.0 }.Select(x => (x, f(x))).ToArray();
        var (x, value) = BrentMinimizer.Minimize(f, 0, 1, known, Tolerance);
        Assert.InRange(x, 0.3 - 1e-7, 0.3 + 1e-7);
        Assert.Equal(1, value, 1e-14);
    }

    [Fact]
    public void Kink_is_located_to_the_final_bracket()
    {
        Func<double, double> f = x => Math.Abs(x - 0.3) + (x > 0.3 ? 2 * (x - 0.3) : 0);   // unequal slopes either side
        var known = new[] { 0.0, 0.2, 0.6, 1.0 }.Select(x => (x, f(x))).ToArray();
        var (x, _) = BrentMinimizer.Minimize(f, 0, 1, known, Tolerance);
        Assert.InRange(x, 0.3 - 4 * Tol1(0.3), 0.3 + 4 * Tol1(0.3));
    }

    /// <summary>Three known points on a parabola give its vertex in the first step: far fewer evaluations than the classic start.</summary>
    [Fact]
    public void Known_points_on_a_parabola_save_evaluations()
    {
        int seeded = 0, classic = 0;
        double Parabola(double x) => 2 * (x - 0.3) * (x - 0.3) + 1;
        var known = new[] { 0.1, 0.45, 0.7 }.Select(x => (x, Parabola(x))).ToArray();
        var (xs, _) = BrentMinimizer.Minimize(x => { seeded++; return Parabola(x); }, 0, 1, known, Tolerance);
        var (xc, _) = BrentMinimizer.Minimize(x => { classic++; return Parabola(x); }, 0, 1, Tolerance);
        Assert.InRange(xs, 0.3 - 1e-7, 0.3 + 1e-7);
        Assert.InRange(xc, 0.3 - 1e-7, 0.3 + 1e-7);
        Assert.True(seeded < classic, $"{seeded} evaluations with known points, {classic} without");
    }

    /// <summary>Known values outside the interval, or NaN, are ignored: the minimum is the one inside.</summary>
    [Fact]
    public void Known_points_outside_the_interval_are_ignored()
    {
        Func<double, double> f = x => (x - 0.7) * (x - 0.7);
        var known = new[] { (-1.0, -100.0), (0.5, double.NaN), (2.0, -50.0), (0.9, f(0.9)) };
        var (x, _) = BrentMinimizer.Minimize(f, 0, 1, known, Tolerance);
        Assert.InRange(x, 0.7 - 1e-7, 0.7 + 1e-7);
    }
}
