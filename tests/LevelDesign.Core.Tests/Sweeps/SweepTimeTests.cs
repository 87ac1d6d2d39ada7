using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Sweeps;

namespace LevelDesign.Core.Tests.Sweeps;

/// <summary>A sweep that would run longer than its time limit is refused before it starts, naming the time estimate and what to lower.</summary>
public class SweepTimeTests
{
    private static readonly Model.Device Module = SweepDevices.FiveElements(levels: 9, maxExcitations: 8);

    [Fact]
    public void The_refusal_gives_the_estimate_its_basis_the_limit_and_the_points_that_fit()
    {
        string? refusal = SweepTimeEstimate.Refusal(TimeSpan.FromSeconds(2), 250_000, 2, TimeSpan.FromHours(24));
        // 250,000 points / 2 workers × 2 s = 250,000 s = 2.9 days; a day holds 43,200 points per worker
        Assert.Equal("this sweep would take about 2.9 days (250,000 points × 2 s as the first point took, 2 at once); limit 24 h; " +
                     "use at most 86,400 points, fewer levels or states, or a smaller truncation, or split a 1-D sweep into shards (--shard I/N or --slurm TASKS)", refusal);
        Assert.Null(SweepTimeEstimate.Refusal(TimeSpan.FromSeconds(2), 86_400, 2, TimeSpan.FromHours(24)));
    }

    [Fact]
    public async Task A_sweep_over_its_time_limit_is_refused_before_any_point_is_reported()
    {
        int reported = 0;
        var progress = new Progress<SweepProgress>(_ => Interlocked.Increment(ref reported));
        var axis = new SweepAxis("c.flux", 0.2, 0.44, 40, []);
        // one point of 1,287 states takes milliseconds; 40 of them on one worker cannot fit in 1 ms
        var e = await Assert.ThrowsAsync<SweepTooLargeException>(() => SweepRunner.RunAsync(ParameterResolver.ForPaths(Module, [axis]),
            new SweepPlan([axis]), new SweepOptions { Parallelism = 1, TimeLimit = TimeSpan.FromMilliseconds(1) }, progress));
        Assert.Matches(@"would take about [\d.]+ (ms|s|min) \(40 points × [\d.]+ (ms|s) as the first point took, 1 at once\); limit 1 ms", e.Message);
        Assert.Contains("lower the truncation", e.Message);   // not even 2 points fit
        Assert.Equal(0, reported);
    }

    /// <summary>
    /// The first point is timed only when the sweep could exceed the limit at the worst-case cost of a point (a dense
    /// decomposition at 10⁸ n³-operations a second): never for a usual sweep of a small device, always for a module of
    /// tens of thousands of states or an absurd number of points.
    /// </summary>
    [Fact]
    public void Timing_is_skipped_only_when_even_the_worst_case_point_cost_fits_the_limit()
    {
        var day = SweepTimeEstimate.DefaultLimit;
        Assert.True(SweepTimeEstimate.SurelyWithin(462, 201, 2, day));          // worst case ≈ 1.1 s a point: 2 min
        Assert.False(SweepTimeEstimate.SurelyWithin(462, 1_000_000, 2, day));   // 6 days at the worst case
        Assert.False(SweepTimeEstimate.SurelyWithin(46_376, 51, 2, day));       // a 3×3 module: ~10⁶ s a point at worst
        Assert.False(SweepTimeEstimate.SurelyWithin(462, 201, 2, TimeSpan.FromSeconds(1)));
        Assert.Equal(0.1 + 1e-8 * 1200.0 * 1200 * 1200, SweepTimeEstimate.WorstPointSeconds(1200), 12);
    }

    [Fact]
    public async Task Short_sweeps_are_not_timed_and_no_limit_means_no_refusal()
    {
        var few = new SweepAxis("c.flux", 0.2, 0.44, SweepTimeEstimate.MinimumTimedPoints - 1, []);
        var result = await SweepRunner.RunAsync(ParameterResolver.ForPaths(Module, [few]), new SweepPlan([few]),
            new SweepOptions { TimeLimit = TimeSpan.FromMilliseconds(1) });
        Assert.True(result.Completed);
        var many = new SweepAxis("c.flux", 0.2, 0.44, SweepTimeEstimate.MinimumTimedPoints, []);
        result = await SweepRunner.RunAsync(ParameterResolver.ForPaths(Module, [many]), new SweepPlan([many]), new SweepOptions { TimeLimit = null });
        Assert.True(result.Completed);
    }
}
