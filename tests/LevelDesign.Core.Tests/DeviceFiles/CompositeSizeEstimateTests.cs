using LevelDesign.Core.Composite;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Elements;
using LevelDesign.Core.Model;

namespace LevelDesign.Core.Tests.DeviceFiles;

/// <summary>The size guard's count against the basis actually enumerated, and its behaviour on absurd truncations.</summary>
public class CompositeSizeEstimateTests
{
    private static Device Resonators(int count, int levels, int? maxExcitations) => new("many",
        Enumerable.Range(0, count).Select(i => (Element)new Resonator($"r{i}", 5 + 0.01 * i, null)).ToArray(), [],
        new Truncation { DefaultLevels = levels, MaxExcitations = maxExcitations });

    [Theory]
    [InlineData(3, 4, null)]
    [InlineData(5, 4, 3)]
    [InlineData(6, 6, 5)]
    [InlineData(4, 3, 20)]
    [InlineData(7, 2, 0)]
    public void Count_equals_the_enumerated_basis(int elements, int levels, int? maxExcitations)
    {
        var device = Resonators(elements, levels, maxExcitations);
        var energies = device.Elements.Select(_ => Enumerable.Range(0, levels).Select(l => (double)l).ToArray()).ToArray();
        var basis = new BasisStructure(energies, maxExcitations, null);
        Assert.Equal(basis.Dimension, CompositeSizeEstimate.Count(device));
        Assert.Equal(basis.Dimension, CompositeSizeEstimate.UpperBound(device));
    }

    [Fact]
    public void Hundreds_of_thousand_level_elements_do_not_overflow_and_stop_early()
    {
        // issue 11: 100–300 elements with levels = 1000 printed "4,611,686,018,427,387,903 states, a dense matrix of
        // 0.0 GiB" after 33 s. 1000^300 overflows every integer type; the count must saturate, not wrap.
        foreach (int? cap in new int?[] { null, 1000, 100_000 })
        {
            var device = Resonators(300, 1000, cap);
            double count = CompositeSizeEstimate.Count(device);
            Assert.True(count > 1e18, $"cap {cap}: {count}");
            Assert.StartsWith("more than", CompositeSizeEstimate.CountText(count));
            Assert.True(CompositeSizeEstimate.Dimension(device, 1_000_000) > 1_000_000);
        }
    }

    [Fact]
    public void Path_estimate_is_dense_when_small_and_linear_when_large()
    {
        Assert.Equal(CompositeSizeEstimate.DenseBytes(500), CompositeSizeEstimate.PathBytes(500, 5, 800));
        double a = CompositeSizeEstimate.PathBytes(50_000, 45, 800), b = CompositeSizeEstimate.PathBytes(100_000, 45, 800);
        Assert.Equal(2.0, b / a, 1e-9);
        // the 3×3 lattice module (46,376 states, 45 couplers) fits under the default limit; a dense matrix would not
        Assert.True(CompositeSizeEstimate.PathBytes(46_376, 45, 800) < CompositeSizeEstimate.DefaultLimitBytes);
        Assert.True(CompositeSizeEstimate.DenseBytes(46_376) > CompositeSizeEstimate.DefaultLimitBytes);
    }
}
