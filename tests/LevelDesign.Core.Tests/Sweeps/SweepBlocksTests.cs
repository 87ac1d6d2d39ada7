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
        var document = DeviceDocument.Demo();
        var plan = new SweepPlan([new SweepAxis("qa_flux", 0, 0.3, 5, []), new SweepAxis("qc_flux", 1.5e-4, 1.05e-3, 9, [])]);
        int[] counts = [5, 9];
        SweepResult Run(IReadOnlyList<(int, int)> blocks, int workers) => SweepRunner.RunAsync(v => document.Resolve(plan.Axes, v), plan,
            new SweepOptions { Parallelism = workers, Blocks = blocks }).GetAwaiter().GetResult();
        var whole = Run(SweepBlocks.All(counts), 2).Points.ToDictionary(p => p.Index);
        Assert.Equal(45, whole.Count);
        var (shardBlocks, first, end, _) = SweepBlocks.ForShard(counts, new ShardRange(3, 3, 5));
        var shard = Run(shardBlocks, 1).Points.Where(p => p.Index >= first && p.Index < end).ToList();
        Assert.Equal(end - first, shard.Count);
        foreach (var p in shard)
        {
            Assert.Equal(whole[p.Index].Spectrum.Energies, p.Spectrum.Energies);   // exact, not within a tolerance
            Assert.Equal(whole[p.Index].Quantities, p.Quantities);
            Assert.Equal(Enumerable.Range(0, p.Spectrum.Count).Select(k => string.Join(",", whole[p.Index].Spectrum.LabelLevels(k))),
                Enumerable.Range(0, p.Spectrum.Count).Select(k => string.Join(",", p.Spectrum.LabelLevels(k))));
        }
    }
}
