using System.Numerics;
using LevelDesign.Core.Eigen;

namespace LevelDesign.Core.Tests.Eigen;

public sealed class EigenvectorPhaseTests
{
    [Fact]
    public void RealColumnsAreFlippedSoTheLargestComponentIsPositive()
    {
        double[] v = [0.6, -0.8, 0.0, /* second column */ 0.1, 0.2, 0.3];
        EigenvectorPhase.Normalize(v, 3, 2);
        Assert.Equal([-0.6, 0.8, 0.0, 0.1, 0.2, 0.3], v);
    }

    [Fact]
    public void TiesWithinTheToleranceGoToTheFirstComponent()
    {
        double q = Math.Sqrt(0.5);
        // |v0| and |v1| differ by far less than 1e-12 relative: treated as tied, so v0 is pinned.
        double[] v = [-q, q * (1 + 1e-15)];
        EigenvectorPhase.Normalize(v, 2, 1);
        Assert.True(v[0] > 0 && v[1] < 0);

        // A difference well beyond the tolerance is not a tie.
        double[] w = [-q, q * (1 + 1e-9)];
        EigenvectorPhase.Normalize(w, 2, 1);
        Assert.True(w[1] > 0 && w[0] < 0);
    }

    [Fact]
    public void ComplexColumnsAreRotatedSoTheLargestComponentIsRealPositive()
    {
        Complex a = Complex.FromPolarCoordinates(0.6, 0.3), b = Complex.FromPolarCoordinates(0.8, 2.0);
        Complex[] v = [a, b];
        EigenvectorPhase.Normalize(v, 2, 1);
        Assert.Equal(0.0, v[1].Imaginary);
        Assert.Equal(0.8, v[1].Real, 1e-15);
        // The rotation is a global phase: relative phase and magnitudes are kept.
        Assert.Equal(0.6, v[0].Magnitude, 1e-15);
        Assert.Equal(0.3 - 2.0, v[0].Phase, 1e-14);
    }

    [Fact]
    public void ZeroColumnIsLeftAlone()
    {
        Complex[] v = [0, 0];
        EigenvectorPhase.Normalize(v, 2, 1);
        Assert.Equal([Complex.Zero, Complex.Zero], v);
    }
}
