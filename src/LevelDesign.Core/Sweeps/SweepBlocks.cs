using LevelDesign.Core.Spread;

namespace LevelDesign.Core.Sweeps;

/// <summary>
/// Fixed stretches ("blocks") of a sweep's points for a schedule-independent run (<see cref="SweepOptions.Blocks"/>):
/// each block is cold-started at its first point and warm-started forward, so every point's numbers depend only on
/// the block layout, never on the number of cores or the order the work is done in. The layout depends only on the
/// axis counts: a 1-D sweep of P points runs in blocks of max(8, ⌈P/64⌉); each row of a grid (a fixed value of the
/// outer axis) is laid out as a 1-D sweep of the inner axis's points of its own.
/// <para>
/// A shard of a 1-D sweep is a run of whole blocks; it also computes the block before its own (the "lead-in", whose
/// last point hands labels to the shard's first point) and point 0 (whose labels name the table's columns). A shard of
/// a grid is a run of whole rows (see <see cref="ForShard(IReadOnlyList{int}, ShardRange)"/>).
/// </para>
/// </summary>
public static class SweepBlocks
{
    public const int MinimumSize = 8, MostBlocks = 64;

    public static int Size(int points) => Math.Max(MinimumSize, (points + MostBlocks - 1) / MostBlocks);

    public static int Count(int points) => (points + Size(points) - 1) / Size(points);

    public static IReadOnlyList<(int Start, int End)> All(int points) => Range(points, 0, Count(points));

    /// <summary>Every block of a sweep with these axis counts (one or two axes, the outer first), in flat order.</summary>
    public static IReadOnlyList<(int Start, int End)> All(IReadOnlyList<int> counts) =>
        counts.Count == 1 ? All(counts[0]) : Rows(counts[0], counts[1], 0, counts[0]);

    /// <summary>What a sweep is split into for shards: blocks of a 1-D sweep, rows of a grid.</summary>
    public static int ShardUnits(IReadOnlyList<int> counts) => counts.Count == 1 ? Count(counts[0]) : counts[0];

    /// <summary>The words for <see cref="ShardUnits"/> in messages: "7 blocks of 8 points", "5 rows of 9 points".</summary>
    public static string Describe(IReadOnlyList<int> counts) => counts.Count == 1
        ? $"{Count(counts[0])} blocks of {Size(counts[0])} points"
        : $"{counts[0]} rows of {counts[1]} points";

    /// <summary>The blocks a shard of a 1-D sweep computes, and the points it owns [First, End); LeadIn is the point before First (−1 for the first shard).</summary>
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

    /// <summary>
    /// The blocks a shard computes and the points it owns [First, End), for one or two axes. A grid shard owns rows
    /// [I₀, I₁) of the outer axis. Labels reach a row from the first point of the row before it (see
    /// <see cref="SweepGrid.Predecessor"/>), so the labels of row I₀ depend on the first point of every earlier row:
    /// the shard also computes those points, each as a one-point block. Each is cold-started in the single run too (it
    /// starts its row's first block), so the shard gets the very numbers and labels one process computes, and there is
    /// no hand-over to check (LeadIn −1). The cost is one point per earlier row.
    /// </summary>
    public static (IReadOnlyList<(int Start, int End)> Blocks, int First, int End, int LeadIn) ForShard(IReadOnlyList<int> counts, ShardRange shard)
    {
        if (counts.Count == 1) return ForShard(counts[0], shard);
        int columns = counts[1], firstRow = (int)shard.First, endRow = (int)shard.End;
        var blocks = new List<(int Start, int End)>();
        for (int row = 0; row < firstRow; row++) blocks.Add((row * columns, row * columns + 1));
        blocks.AddRange(Rows(counts[0], columns, firstRow, endRow));
        return (blocks, firstRow * columns, endRow * columns, -1);
    }

    private static List<(int, int)> Rows(int rows, int columns, int fromRow, int toRow)
    {
        var list = new List<(int, int)>();
        for (int row = fromRow; row < Math.Min(rows, toRow); row++)
            list.AddRange(Range(columns, 0, Count(columns)).Select(b => (row * columns + b.Item1, row * columns + b.Item2)));
        return list;
    }

    private static List<(int, int)> Range(int points, int fromBlock, int toBlock)
    {
        int size = Size(points);
        var list = new List<(int, int)>();
        for (int b = fromBlock; b < toBlock; b++) list.Add((b * size, Math.Min(points, (b + 1) * size)));
        return list;
    }
}
