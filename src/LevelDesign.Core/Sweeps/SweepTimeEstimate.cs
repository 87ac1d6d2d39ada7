using System.Globalization;

namespace LevelDesign.Core.Sweeps;

/// <summary>
/// How long a whole sweep would take, from the time its first point took to solve (cold, as the first point of each
/// worker is): points ÷ workers × that time. Warm starts make most later points faster and crossings some slower,
/// so it is an estimate to within a small factor — enough to refuse a run of days before it starts.
/// </summary>
public static class SweepTimeEstimate
{
    /// <summary>Longest sweep run without being asked: a day.</summary>
    public static readonly TimeSpan DefaultLimit = TimeSpan.FromHours(24);

    /// <summary>Sweeps of fewer points are not timed (the extra solve would be a noticeable share of the run).</summary>
    public const int MinimumTimedPoints = 16;

    /// <summary>
    /// Seconds one point of <paramref name="dimension"/> states takes at most: a full dense decomposition at a slow
    /// 10⁸ n³-operations a second plus 0.1 s (the managed solver measured 2.7 s at n = 1,200, i.e. 1.6·10⁻⁹ s·n³; the
    /// iterative solver and native LAPACK are much faster). A bound, not an estimate.
    /// </summary>
    public static double WorstPointSeconds(int dimension) => 0.1 + 1e-8 * Math.Pow(dimension, 3);

    /// <summary>
    /// True when the sweep ends within the limit even at <see cref="WorstPointSeconds"/> a point: then timing a first
    /// point (a whole extra cold solve before the sweep starts, about 3 % of a 201-point sweep of 462 states) is skipped.
    /// </summary>
    public static bool SurelyWithin(int dimension, long points, int workers, TimeSpan limit) =>
        Total(TimeSpan.FromSeconds(WorstPointSeconds(dimension)), points, workers) <= limit;

    public static TimeSpan Total(TimeSpan perPoint, long points, int workers) =>
        TimeSpan.FromSeconds(perPoint.TotalSeconds * Math.Ceiling((double)points / Math.Max(1, workers)));

    /// <summary>"about 2.9 days (250,000 points × 2.0 s, 2 at once)": the estimate and how it was made.</summary>
    public static string Describe(TimeSpan perPoint, long points, int workers) =>
        $"about {Duration(Total(perPoint, points, workers))} ({points.ToString("N0", CultureInfo.InvariantCulture)} points × " +
        $"{Duration(perPoint)} as the first point took, {workers} at once)";

    /// <summary>Null when the sweep ends within <paramref name="limit"/>, else the refusal with the estimate and what to lower.</summary>
    public static string? Refusal(TimeSpan perPoint, long points, int workers, TimeSpan limit)
    {
        if (Total(perPoint, points, workers) <= limit) return null;
        long fitting = (long)Math.Floor(limit.TotalSeconds / Math.Max(perPoint.TotalSeconds, 1e-9)) * Math.Max(1, workers);
        string lower = fitting >= 2
            ? $"use at most {fitting.ToString("N0", CultureInfo.InvariantCulture)} points, fewer levels or states, or a smaller truncation, or split a 1-D sweep into shards (--shard I/N or --slurm TASKS)"
            : "lower the truncation (levels, max_excitations) or the states computed (--states, --levels)";
        return $"this sweep would take {Describe(perPoint, points, workers)}; limit {Duration(limit)}; {lower}";
    }

    /// <summary>A duration in the largest unit that keeps it readable: ms, s, min, h or days.</summary>
    public static string Duration(TimeSpan t) => t.TotalSeconds switch
    {
        < 1 => string.Create(CultureInfo.InvariantCulture, $"{t.TotalMilliseconds:0} ms"),
        < 120 => string.Create(CultureInfo.InvariantCulture, $"{t.TotalSeconds:0.#} s"),
        < 7200 => string.Create(CultureInfo.InvariantCulture, $"{t.TotalMinutes:0} min"),
        < 172_800 => string.Create(CultureInfo.InvariantCulture, $"{t.TotalHours:0.#} h"),
        _ => string.Create(CultureInfo.InvariantCulture, $"{t.TotalDays:0.#} days"),
    };
}
