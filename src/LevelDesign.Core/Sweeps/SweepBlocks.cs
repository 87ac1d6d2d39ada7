using LevelDesign.Core.Spread;

namespace LevelDesign.Core.Sweeps;

/// <summary>
/// Fixed stretches ("blocks") of a 1-D sweep's points for a schedule-independent run (<see cref="SweepOptions.Blocks"/>):
/// each block is cold-started at its first point and warm-started forward, so every point's numbers depend only on
/// the block layout, never on the number of cores or the order the work is done in. The layout depends only on the
/// number of points: blocks of max(8, ⌈points/64⌉). A shard is a run of whole blocks; it also computes the block
/// before its own (the "lead-in", whose last point hands labels to the shard's first point) and point 0 (whose labels
/// name the table's columns).
/// </summary>
public static class SweepBlocks
{
    public const int MinimumSize = 8, MostBlocks = 64;

    public static int Size(int points) => Math.Max(MinimumSize, (points + MostBlocks - 1) / MostBlocks);

    public static int Count(int points) => (points + Size(points) - 1) / Size(points);

    public static IReadOnlyList<(int Start, int End)> All(int points) => Range(points, 0, Count(points));

    /// <summary>The blocks a shard computes, and the points it owns [First, End); LeadIn is the point before First (−1 for the first shard).</summary>
    public static (IReadOnlyList<(int Start, int End)> Blocks, int First, int End, int LeadIn) ForShard(int points, ShardRange shard)
    {
        int size = Size(points);
        int firstBlock = (int)shard.First, endBlock = (int)shard.End;
        int first = firstBlock * size, end = Math.Min(points, endBlock * size);
        var blocks = new List<(int, int)>();
        if (firstBlock > 1) blocks.Add((0, 1));
        blocks.AddRange(Range(points, Math.Max(0, firstBlock - 1), endBlock));
        return (blocks, first, end, first - 1);
    }

    private static List<(int, int)> Range(int points, int fromBlock, int toBlock)
    {
        int size = Size(points);
        var list = new List<(int, int)>();
        for (int b = fromBlock; b < toBlock; b++) list.Add((b * size, Math.Min(points, (b + 1) * size)));
        return list;
    }
}
