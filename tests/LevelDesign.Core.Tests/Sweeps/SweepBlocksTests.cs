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
}
