using System.Numerics;
using LevelDesign.Core.Eigen;

namespace LevelDesign.Core.Tests.Sweeps;

public class RealGaugeTests
{
    /// <summary>
    /// A Hermitian matrix whose off-diagonal phases can be removed by D = diag(e^{iθ}) has the spectrum of the real
    /// matrix it maps to (a unitary similarity, textbook); a triangle of couplings whose phases sum to a non-multiple
    /// of π (a flux through a loop) cannot be made real, and the gauge must say so.
    /// </summary>
    [Fact]
    public void Removable_phases_are_removed_and_a_loop_phase_is_refused()
    {
        var removable = new (int, int, Complex)[]
        {
            (0, 0, 1.0), (1, 1, 2.0), (2, 2, 3.5),
            (1, 0, new Complex(0, 0.3)), (2, 1, new Complex(0, -0.2)),
        };
        var gauge = RealGauge.TryFind(3, removable);
        Assert.NotNull(gauge);
        var real = CsrMatrix.FromLowerTriangle(3, gauge.Value.Real).ToDense();
        var complexDense = new Complex[9];
        foreach (var (r, c, v) in removable) { complexDense[c * 3 + r] = v; complexDense[r * 3 + c] = Complex.Conjugate(v); }
        var expected = EigenSolvers.Managed.LowestComplex(complexDense, 3, 3).Values;
        var actual = EigenSolvers.Managed.LowestReal(real, 3, 3).Values;
        for (int k = 0; k < 3; k++) Assert.Equal(expected[k], actual[k], 12);

        var loop = removable.Append((2, 0, Complex.FromPolarCoordinates(0.1, 0.4))).ToArray();
        Assert.Null(RealGauge.TryFind(3, loop));
    }
}
