namespace LevelDesign.Core.Spread;

/// <summary>The finished samples of one run (a whole study or one shard), in sample order; Completed is false when cancelled.</summary>
public sealed record SpreadRun(ShardRange Range, IReadOnlyList<SampleOutcome> Outcomes, bool Completed);
