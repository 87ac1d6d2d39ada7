using static System.FormattableString;

namespace LevelDesign.Core.Elements;

/// <summary>
/// What the grown charge basis (|n| ≤ <see cref="MaxCharge"/>) can converge, told before any diagonalisation: a
/// transmon whose E_J/E_C or E_J lies beyond it used to grow its basis to the cap (5–6 s of dense solves) only to
/// report "did not converge".
/// </summary>
/// <remarks>
/// In the transmon limit the states are those of an oscillator in n with ground-state spread σ = (E_J/32E_C)^¼.
/// Level k reaches to σ·√(4k+2) and beyond falls off like exp(−n²/2σ²); the growth stops when the kept energies move
/// by less than <see cref="BasisConvergence.ToleranceGHz"/>, i.e. once that tail, weighted by E_J, is below it. So the
/// half-width needed is σ·x with x² = 2·ln(E_J/tolerance) + 6·levels — a fit to the half-widths the growth actually
/// reaches (2–50 levels, E_J/E_C 10²–10⁸, E_C 1 kHz–200 MHz), which it meets or exceeds by up to 20 % near the cap.
/// Separately, the 1 Hz test needs the rounding of double precision on E_J-sized matrix entries to stay far below
/// 1 Hz: measured, E_J = 3·10⁵ GHz fails for 50 levels and 10⁶–10⁷ GHz for 4; 10⁵ GHz (100 THz) converges.
/// </remarks>
internal static class ChargeBasisLimit
{
    /// <summary>Largest |n| the growth reaches (basis size 2·MaxCharge + 1).</summary>
    public const int MaxCharge = 400;

    /// <summary>Largest E_J (GHz) whose levels a 1 Hz convergence test can resolve in double precision.</summary>
    public const double MaxJosephsonGHz = 1e5;

    /// <summary>Basis growth starts at this |n| and steps by 4: kept levels beyond what that allows never converge.</summary>
    public static int StartCharge(int levels) => Math.Max(10, levels + 6);

    /// <summary>The |n| the lowest <paramref name="levels"/> need to converge (see remarks).</summary>
    public static double RequiredCharge(double ec, double ej, int levels) => Spread(ec, ej) * TailFactor(ej, levels);

    /// <summary>The largest E_J/E_C the cap converges for this E_J and number of levels.</summary>
    public static double MaxRatio(double ej, int levels) => 32 * Math.Pow(MaxCharge / TailFactor(ej, levels), 4);

    /// <summary>
    /// Why the lowest <paramref name="levels"/> cannot converge in the grown basis, with what to lower, and the
    /// parameter to blame (<paramref name="ejName"/> or "levels"); null when they can.
    /// </summary>
    public static (string Parameter, string Message)? Problem(double ec, double ej, int levels, string ejName)
    {
        if (StartCharge(levels) + 4 > MaxCharge)
            return ("levels", $"{levels} levels are more than a charge basis of |n| ≤ {MaxCharge} can converge (at most {MaxCharge - 10}); keep fewer levels");
        if (ej > MaxJosephsonGHz)
            return (ejName, Invariant($"E_J = {ej:G3} GHz is beyond what a 1 Hz convergence test resolves in double precision (at most {MaxJosephsonGHz:G3} GHz); lower {ejName}"));
        if (RequiredCharge(ec, ej, levels) > MaxCharge)
        {
            double ratio = ej / ec, most = MaxRatio(ej, levels);
            return (ejName, Invariant($"E_J/E_C = {ratio:G3} is beyond what a charge basis of |n| ≤ {MaxCharge} converges for {levels} levels (at most {most:G3} at this E_J); lower {ejName}, raise E_C or keep fewer levels"));
        }
        return null;
    }

    private static double Spread(double ec, double ej) => Math.Pow(ej / (32 * ec), 0.25);

    private static double TailFactor(double ej, int levels) =>
        Math.Sqrt(2 * Math.Max(0, Math.Log(ej / BasisConvergence.ToleranceGHz)) + 6 * levels);
}
