namespace LevelDesign.Core.Analysis;

/// <summary>
/// ∂f01/∂x and ∂²f01/∂x² of a qubit's dressed f01 with respect to one parameter (GHz per unit, per unit²), by central
/// differences with step h, each also taken with 2h as a check: the step is trusted when the two agree within
/// <see cref="Tolerance"/> of the larger magnitude (or both lie below the noise floor of the solve).
/// </summary>
public sealed record FrequencyDerivatives(string Parameter, double Step, double First, double FirstWithDoubleStep,
    double Second, double SecondWithDoubleStep)
{
    public const double Tolerance = 0.02;

    /// <summary>Below this |∂f/∂x|·h (GHz) the difference is at the level of the eigensolver's rounding.</summary>
    private const double NoiseGHz = 1e-9;

    public bool FirstStepAgrees => Agrees(First, FirstWithDoubleStep, NoiseGHz / Step);

    public bool SecondStepAgrees => Agrees(Second, SecondWithDoubleStep, NoiseGHz / (Step * Step));

    private static bool Agrees(double a, double b, double floor) =>
        Math.Abs(a - b) <= Math.Max(Tolerance * Math.Max(Math.Abs(a), Math.Abs(b)), 4 * floor);

    /// <summary>From f01 at x − 2h, x − h, x, x + h, x + 2h.</summary>
    public static FrequencyDerivatives From(string parameter, double h, double m2, double m1, double centre, double p1, double p2) =>
        new(parameter, h, (p1 - m1) / (2 * h), (p2 - m2) / (4 * h),
            (p1 - 2 * centre + m1) / (h * h), (p2 - 2 * centre + m2) / (4 * h * h));
}
