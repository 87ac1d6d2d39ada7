using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Sweeps;

namespace LevelDesign.Core.Presentation;

/// <summary>
/// How crossings are searched and placed, the same for the `crossings` and `plot` commands and the terminal UI: the
/// states paired, the bias tolerance of the refinement, and the file's operating points as values of the swept axis.
/// </summary>
public static class CrossingSearch
{
    /// <summary>Refinement tolerance as a fraction of the sweep's span (the reports give the bias to 8–10 digits).</summary>
    public const double ToleranceOfSpan = 1e-8;

    /// <summary>Most states paired by default: each pair adds candidates to refine, at a quadratic cost.</summary>
    public const int MaxDefaultLevels = 12;

    /// <summary>Largest gap of a near-approach without a label swap reported by default (GHz).</summary>
    public const double DefaultMaxGapGHz = 0.5;

    /// <summary>
    /// The states searched by default: the lowest ones at the first point up to the last with at most two excitations
    /// (the states the spectrum shows by default), capped at <see cref="MaxDefaultLevels"/>.
    /// </summary>
    public static int DefaultLevels(SweepResult sweep)
    {
        if (sweep.Points.Count == 0) return 0;
        var first = sweep.Points[0].Spectrum;
        int last = 0;
        for (int k = 0; k < first.Count; k++)
            if (first.LabelLevels(k).Sum() <= 2) last = k;
        return Math.Clamp(last + 1, 2, MaxDefaultLevels);
    }

    public static CrossingOptions Options(SweepResult sweep, IReadOnlyList<double> operatingPoints, int? levels = null,
        double maxGapGHz = DefaultMaxGapGHz)
    {
        var axis = sweep.Plan.Axes[0];
        return new CrossingOptions
        {
            Levels = levels ?? DefaultLevels(sweep),
            MaxGapGHz = maxGapGHz,
            OperatingPoints = operatingPoints,
            BiasTolerance = ToleranceOfSpan * Math.Max(Math.Abs(axis.Stop - axis.Start), 1e-12),
        };
    }

    /// <summary>
    /// Every named operating point of the file as a value of the swept axis: the value the point gives the swept bias,
    /// or, when the axis is a parameter path (qa.flux), the parameter the point's bias for that path sets; a point
    /// that sets neither sits at the axis's value outside the sweep (<paramref name="otherwise"/>).
    /// </summary>
    public static IReadOnlyList<(string Name, double Value)> OperatingPoints(DeviceDocument document, string axisPath, double otherwise)
    {
        var values = new List<(string, double)>();
        foreach (var point in document.Points)
        {
            double? at = null;
            foreach (var (name, control) in point.BiasValues)
            {
                if (name == axisPath) at = control;
                else if (document.Bias(name) is { } bias && bias.Target == axisPath) at ??= bias.ToParameter(control);
            }
            values.Add((point.Name, at ?? otherwise));
        }
        return values;
    }

    /// <summary>The value of an axis outside any sweep: its bias's value in the file, or the parameter's.</summary>
    public static double FileValue(DeviceDocument document, string axisPath) =>
        document.Bias(axisPath) is BiasDefinition b ? b.Value : document.Device.GetParameter(axisPath);
}
