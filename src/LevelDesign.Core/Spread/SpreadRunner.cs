using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Sweeps;

namespace LevelDesign.Core.Spread;

/// <summary>
/// Runs the samples of a range in parallel (each worker draws its next sample index and evaluates every rule on
/// one thread, see <see cref="RuleEvaluator"/>), reporting progress; cancellation stops the workers and keeps the
/// samples already finished. Outcomes come back in sample order.
/// </summary>
public static class SpreadRunner
{
    public static async Task<SpreadRun> RunAsync(DeviceDocument document, SpreadDefinition definition, ShardRange range, int parallelism,
        IProgress<SweepProgress>? progress = null, CancellationToken cancellation = default)
    {
        var sampler = new SpreadSampler(document.Device, definition);
        var outcomes = new SampleOutcome?[range.Size];
        long next = -1;
        int done = 0;
        int workers = (int)Math.Clamp(parallelism, 1, Math.Max(1, range.Size));
        var tasks = Enumerable.Range(0, workers).Select(_ => Task.Run(() =>
        {
            var evaluator = new RuleEvaluator(document, definition.Rules);
            long k;
            while (!cancellation.IsCancellationRequested && (k = Interlocked.Increment(ref next)) < range.Size)
            {
                var outcome = Evaluate(evaluator, sampler, definition, range.First + k, cancellation);
                if (outcome is null) break;   // cancelled inside the sample: it is not kept
                outcomes[k] = outcome;
                progress?.Report(new SweepProgress(Interlocked.Increment(ref done), (int)range.Size));
            }
        })).ToArray();
        await Task.WhenAll(tasks).ConfigureAwait(false);
        var kept = outcomes.Where(o => o is not null).Select(o => o!).ToList();
        return new SpreadRun(range, kept, kept.Count == range.Size);
    }

    /// <summary>One sample's outcome; null when cancelled while it was being computed.</summary>
    public static SampleOutcome? Evaluate(RuleEvaluator evaluator, SpreadSampler sampler, SpreadDefinition definition, long index,
        CancellationToken cancellation = default)
    {
        var sample = sampler.Draw(index);
        int rules = definition.Rules.Count;
        try
        {
            var problems = sample.Device.Validate();
            if (problems.Count > 0) return Failed(sample, rules, "invalid device: " + string.Join("; ", problems));
            var (figures, ruleProblems) = evaluator.Evaluate(sample.Device, cancellation);
            var passed = definition.Rules.Select((r, i) => ruleProblems[i] is null && r.Passes(figures[i])).ToArray();
            string? error = ruleProblems.FirstOrDefault(p => p is not null);
            return new SampleOutcome(index, sample.Values, sample.Deviations, figures, passed, error);
        }
        catch (OperationCanceledException) { return null; }
        catch (Exception e) when (e is ArgumentException or InvalidOperationException or ArithmeticException or Model.InvalidDeviceException)
        {
            return Failed(sample, rules, e.Message);
        }
    }

    private static SampleOutcome Failed(SpreadSample sample, int rules, string reason) =>
        new(sample.Index, sample.Values, sample.Deviations, Enumerable.Repeat(double.NaN, rules).ToArray(), new bool[rules], reason);
}
