using LevelDesign.Core.Elements;

namespace LevelDesign.Core.Tests.Physics;

/// <summary>
/// Two-level level lists against the 2×2 secular determinant det(H − E S) = 0
/// (textbook linear-variation result; common practice, no single source).
/// </summary>
public class SecularDeterminantTests
{
    private static readonly Dictionary<string, double[,]> NoOperators = new();

    [Theory]
    [InlineData(0.0, 1.0, 0.3)]
    [InlineData(2.5, 2.7, -0.05)]
    [InlineData(-1.0, 4.0, 1.5)]
    public void Orthonormal_matches_closed_form(double h11, double h22, double h12)
    {
        var element = new LevelList("x", new[,] { { h11, h12 }, { h12, h22 } }, NoOperators);
        var e = element.Diagonalise(2).Energies;
        double mean = (h11 + h22) / 2, root = Math.Sqrt(Math.Pow((h11 - h22) / 2, 2) + h12 * h12);
        Assert.Equal(mean - root, e[0], 12);
        Assert.Equal(mean + root, e[1], 12);
    }

    [Theory]
    [InlineData(0.0, 1.0, 0.3, 0.2)]
    [InlineData(2.5, 2.7, -0.05, -0.4)]
    [InlineData(1.0, 3.0, 0.8, 0.6)]
    public void Non_orthogonal_matches_generalized_quadratic(double h11, double h22, double h12, double s12)
    {
        var element = new LevelList("x", new[,] { { h11, h12 }, { h12, h22 } }, NoOperators, new[,] { { 1, s12 }, { s12, 1 } });
        var e = element.Diagonalise(2).Energies;
        // (1 − s²)E² − (H11 + H22 − 2 s H12)E + (H11 H22 − H12²) = 0
        double a = 1 - s12 * s12, b = -(h11 + h22 - 2 * s12 * h12), c = h11 * h22 - h12 * h12;
        double disc = Math.Sqrt(b * b - 4 * a * c);
        Assert.Equal((-b - disc) / (2 * a), e[0], 11);
        Assert.Equal((-b + disc) / (2 * a), e[1], 11);
    }

    [Fact]
    public void Overlap_that_is_not_positive_definite_is_reported()
    {
        var element = new LevelList("x", new[,] { { 0.0, 0.1 }, { 0.1, 1.0 } }, NoOperators, new[,] { { 1, 1.2 }, { 1.2, 1 } });
        Assert.Contains(element.Validate(), p => p.Contains("not positive definite"));
    }
}
