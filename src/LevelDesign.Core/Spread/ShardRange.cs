using System.Globalization;

namespace LevelDesign.Core.Spread;

/// <summary>
/// Shard I of N (1-based, as written "--shard 3/4"): the contiguous block [First, End) of Total items,
/// First = ⌊(I−1)·Total/N⌋. The blocks of 1/N … N/N cover every item exactly once.
/// </summary>
public sealed record ShardRange(int Shard, int Count, long Total)
{
    public long First => (Shard - 1) * Total / Count;
    public long End => Shard * Total / Count;
    public long Size => End - First;

    public static ShardRange Whole(long total) => new(1, 1, total);

    /// <summary>Reads "I/N"; null with a reason when it is not two whole numbers with 1 ≤ I ≤ N.</summary>
    public static ShardRange? Parse(string text, long total, out string? error)
    {
        error = null;
        var parts = text.Split('/');
        if (parts.Length == 2 && int.TryParse(parts[0], NumberStyles.None, CultureInfo.InvariantCulture, out int i)
            && int.TryParse(parts[1], NumberStyles.None, CultureInfo.InvariantCulture, out int n) && n >= 1 && i >= 1 && i <= n)
        {
            if (n > total) { error = $"'{text}': {n} shards for {total} items would leave some shards empty; use at most {total}"; return null; }
            return new ShardRange(i, n, total);
        }
        error = $"'{text}': write I/N with 1 ≤ I ≤ N, e.g. 2/4 for the second of four shards";
        return null;
    }

    public override string ToString() => $"{Shard}/{Count}";
}
