using LevelDesign.Core.Eigen;

namespace LevelDesign.Core.Tests.Eigen;

public class ComputeCoresTests
{
    [Fact]
    public void The_limit_stays_between_one_core_and_all_of_them()
    {
        int before = ComputeCores.Limit;
        try
        {
            ComputeCores.Limit = 0;
            Assert.Equal(1, ComputeCores.Limit);
            ComputeCores.Limit = Environment.ProcessorCount + 7;
            Assert.Equal(Environment.ProcessorCount, ComputeCores.Limit);
            Assert.InRange(ComputeCores.AllButOne, 1, Math.Max(1, Environment.ProcessorCount - 1));
        }
        finally { ComputeCores.Limit = before; }
    }

    [Fact]
    public void Block_products_are_bit_for_bit_the_same_on_one_core_as_on_all()
    {
        // large enough that the products are shared out over cores (more than 5e7 multiply-adds)
        const int n = 20_000, size = 60, columns = 60;
        var random = new Random(11);
        var v = Enumerable.Range(0, n * size).Select(_ => random.NextDouble() - 0.5).ToArray();
        var k = Enumerable.Range(0, size * columns).Select(_ => random.NextDouble() - 0.5).ToArray();
        (double[] y, double[] g) Products()
        {
            var y = new double[n * columns];
            BlockProducts.Combine(v, n, size, k, size, columns, y);
            var g = new double[size * columns];
            BlockProducts.Dots(v, n, size, y, columns, g, columns);
            return (y, g);
        }
        int before = ComputeCores.Limit;
        try
        {
            ComputeCores.Limit = 1;
            var one = Products();
            ComputeCores.Limit = Environment.ProcessorCount;
            var all = Products();
            Assert.Equal(one.y, all.y);
            Assert.Equal(one.g, all.g);
            // and they are the products: one entry of each against a plain sum
            double y0 = Enumerable.Range(0, size).Sum(j => v[j * n + 5] * k[2 * size + j]);
            Assert.Equal(y0, one.y[2 * n + 5], 12);
        }
        finally { ComputeCores.Limit = before; }
    }
}
