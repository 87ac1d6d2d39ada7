using LevelDesign.Core.Labels;
using MathNet.Numerics.LinearAlgebra;

namespace LevelDesign.Core.Tests.Physics;

/// <summary>
/// The labeller takes clearly dominated states directly and assigns only mixed ones; its total overlap must equal
/// that of a full Hungarian assignment over every dressed and bare state (property test, fixed seeds).
/// </summary>
public class LabellerAssignmentTests
{
    [Theory]
    [InlineData(1, 12, 12, 0.3)]
    [InlineData(2, 30, 10, 0.6)]
    [InlineData(3, 40, 40, 1.0)]
    [InlineData(4, 25, 25, 2.0)]
    public void Total_overlap_equals_full_assignment(int seed, int dimension, int dressed, double mixing)
    {
        var random = new Random(seed);
        for (int trial = 0; trial < 20; trial++)
        {
            // a near-identity orthogonal matrix: exp of a random antisymmetric generator scaled by `mixing`
            var generator = Matrix<double>.Build.Dense(dimension, dimension, (i, j) => 0.0);
            for (int i = 0; i < dimension; i++)
                for (int j = 0; j < i; j++)
                {
                    double v = mixing * (random.NextDouble() - 0.5) / Math.Sqrt(dimension) * (random.NextDouble() < 0.3 ? 4 : 1);
                    generator[i, j] = v;
                    generator[j, i] = -v;
                }
            var q = (Matrix<double>.Build.DenseIdentity(dimension) + generator).QR().Q;
            var weights = new double[dimension * dressed];
            for (int k = 0; k < dressed; k++)
                for (int j = 0; j < dimension; j++) weights[k * dimension + j] = q[j, k] * q[j, k];
            var labels = Labeller.Label(weights, dimension, dressed);
            Assert.Equal(dressed, labels.Select(l => l.BareIndex).Distinct().Count());
            var cost = new double[dressed, dimension];
            for (int k = 0; k < dressed; k++)
                for (int j = 0; j < dimension; j++) cost[k, j] = -weights[k * dimension + j];
            var full = Assignment.Solve(cost);
            double best = Enumerable.Range(0, dressed).Sum(k => weights[k * dimension + full[k]]);
            double ours = labels.Sum(l => l.Purity);
            Assert.True(Math.Abs(best - ours) < 1e-12, $"trial {trial}: total overlap {ours} vs optimal {best}");
        }
    }
}
