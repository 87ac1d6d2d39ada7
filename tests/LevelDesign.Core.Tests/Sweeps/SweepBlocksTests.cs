using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Spread;
using LevelDesign.Core.Sweeps;
using Xunit;

namespace LevelDesign.Core.Tests.Sweeps;

public sealed class SweepBlocksTests
{
    [Theory]
    [InlineData(61, 3)]
    [InlineData(201, 7)]
    [InlineData(5000, 64)]
    public void ShardsOwnEveryPointOnceAndComputeTheirLeadIn(int points, int shards)
    {
        var owned = new List<int>();
        for (int i = 1; i <= shards; i++)
        {
            var (blocks, first, end, leadIn) = SweepBlocks.ForShard(points, new ShardRange(i, shards, SweepBlocks.Count(points)));
            owned.AddRange(Enumerable.Range(first, end - first));
            var computed = blocks.SelectMany(b => Enumerable.Range(b.Start, b.End - b.Start)).ToHashSet();
            Assert.Contains(0, computed);                                   // names the table's columns
            Assert.True(leadIn < 0 || computed.Contains(leadIn));
            Assert.All(Enumerable.Range(first, end - first), p => Assert.Contains(p, computed));
            Assert.All(blocks, b => Assert.True(b.Start == 0 || b.Start % SweepBlocks.Size(points) == 0));
        }
        Assert.Equal(Enumerable.Range(0, points), owned);
    }

    [Fact]
    public void FixedBlocksGiveTheSameBitsOnOneOrTwoWorkers()
    {
        var document = DeviceDocument.Demo();
        var axes = document.Sweeps.First(s => s.Name == "coupler_scan").Axes;
        SweepResult Run(int workers) => SweepRunner.RunAsync(v => document.Resolve(axes, v), new SweepPlan(axes),
            new SweepOptions { Parallelism = workers, Blocks = SweepBlocks.All(axes[0].Count) }).GetAwaiter().GetResult();
        var one = Run(1);
        var two = Run(2);
        Assert.Equal(61, one.Points.Count);
        for (int i = 0; i < 61; i++)
        {
            Assert.Equal(one.Points[i].Spectrum.Energies, two.Points[i].Spectrum.Energies);   // exact, not within a tolerance
            Assert.Equal(one.Points[i].Quantities, two.Points[i].Quantities);
        }
    }

    [Theory]
    [InlineData(5, 9, 3)]
    [InlineData(7, 20, 7)]
    [InlineData(4, 1, 2)]
    public void GridShardsOwnWholeRowsAndComputeTheFirstPointOfEarlierRows(int rows, int columns, int shards)
    {
        int[] counts = [rows, columns];
        var owned = new List<int>();
        for (int i = 1; i <= shards; i++)
        {
            var (blocks, first, end, leadIn) = SweepBlocks.ForShard(counts, new ShardRange(i, shards, SweepBlocks.ShardUnits(counts)));
            Assert.Equal(-1, leadIn);
            Assert.Equal(0, first % columns);
            owned.AddRange(Enumerable.Range(first, end - first));
            var computed = blocks.SelectMany(b => Enumerable.Range(b.Start, b.End - b.Start)).ToList();
            Assert.Equal(computed.Distinct().Count(), computed.Count);
            // the label chain down the first column, and nothing else, before the shard's own rows
            Assert.Equal(Enumerable.Range(0, first / columns).Select(r => r * columns).Concat(Enumerable.Range(first, end - first)), computed);
            // every block of the shard is one of the single run's, or the first point of one
            var whole = SweepBlocks.All(counts);
            Assert.All(blocks, b => Assert.Contains(whole, w => w.Start == b.Start && (w.End == b.End || b.End == b.Start + 1)));
        }
        Assert.Equal(Enumerable.Range(0, rows * columns), owned);
    }

    [Fact]
    public void AGridShardGivesTheSingleRunsBitsAndLabels()
    {
        // rows across the qa–qb crossing with the coupler tuned down (0.75 mA): at 0.209 Φ0 the label carried from row
        // to row holds less of its character than one given afresh, and at 0.2095 it has moved to the other state
        var document = DeviceDocument.Demo();
        var plan = new SweepPlan([new SweepAxis("qa_flux", 0.208, 0.2095, 4, []), new SweepAxis("qc_flux", 0.75e-3, 0.80e-3, 3, [])]);
        int[] counts = [4, 3];
        SweepResult Run(IReadOnlyList<(int, int)> blocks, int workers) => SweepRunner.RunAsync(v => document.Resolve(plan.Axes, v), plan,
            new SweepOptions { Parallelism = workers, Blocks = blocks }).GetAwaiter().GetResult();
        static string Labels(SweepPoint p) => string.Join(";", Enumerable.Range(0, p.Spectrum.Count)
            .Select(k => string.Join(",", p.Spectrum.LabelLevels(k)) + FormattableString.Invariant($"@{p.Spectrum.Labels[k].Purity:R}")));
        var whole = Run(SweepBlocks.All(counts), 2).Points.ToDictionary(p => p.Index);
        Assert.Equal(12, whole.Count);
        var (shardBlocks, first, end, _) = SweepBlocks.ForShard(counts, new ShardRange(2, 2, 4));
        var shard = Run(shardBlocks, 1).Points.Where(p => p.Index >= first && p.Index < end).ToList();
        Assert.Equal(end - first, shard.Count);
        foreach (var p in shard)
        {
            Assert.Equal(whole[p.Index].Spectrum.Energies, p.Spectrum.Energies);   // exact, not within a tolerance
            Assert.Equal(whole[p.Index].Quantities, p.Quantities);
            Assert.Equal(Labels(whole[p.Index]), Labels(p));
        }
        // without the first points of the earlier rows the shard's rows would be labelled afresh, and differently
        var afresh = Run(shardBlocks.Where(b => b.Start >= first).ToList(), 1).Points;
        Assert.Contains(afresh, p => Labels(p) != Labels(whole[p.Index]));
    }
}
