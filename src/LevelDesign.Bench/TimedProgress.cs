using System.Diagnostics;
using LevelDesign.Core.Sweeps;

namespace LevelDesign.Bench;

/// <summary>Notes the time at which the last point of a sweep was solved (reported synchronously).</summary>
internal sealed class TimedProgress(Stopwatch clock, Action<double> whenDone, int total) : IProgress<SweepProgress>
{
    public void Report(SweepProgress value)
    {
        if (value.Done == total) whenDone(clock.Elapsed.TotalSeconds);
    }
}
