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
        var gauge = TryFind(3, removable);
        Assert.NotNull(gauge);
        var real = gauge.Value.Real.ToDense();
        var complexDense = new Complex[9];
        foreach (var (r, c, v) in removable) { complexDense[c * 3 + r] = v; complexDense[r * 3 + c] = Complex.Conjugate(v); }
        var expected = EigenSolvers.Managed.LowestComplex(complexDense, 3, 3).Values;
        var actual = EigenSolvers.Managed.LowestReal(real, 3, 3).Values;
        for (int k = 0; k < 3; k++) Assert.Equal(expected[k], actual[k], 12);

        // D†HD is the gauged matrix, entry by entry
        var d = gauge.Value.Phases;
        for (int r = 0; r < 3; r++)
            for (int c = 0; c < 3; c++)
                Assert.Equal(0, (Complex.Conjugate(d[r]) * complexDense[c * 3 + r] * d[c] - real[c * 3 + r]).Magnitude, 12);

        var loop = removable.Append((2, 0, Complex.FromPolarCoordinates(0.1, 0.4))).ToArray();
        Assert.Null(TryFind(3, loop));
    }

    /// <summary>The gauge on full compressed rows built from lower-triangle entries (row ≥ column).</summary>
    private static (Complex[] Phases, CsrMatrix Real)? TryFind(int n, (int Row, int Column, Complex Value)[] lower)
    {
        var rows = Enumerable.Range(0, n).Select(_ => new SortedDictionary<int, Complex>()).ToArray();
        foreach (var (r, c, v) in lower)
        {
            rows[r][c] = v;
            if (r != c) rows[c][r] = Complex.Conjugate(v);
        }
        var rowStart = new int[n + 1];
        for (int r = 0; r < n; r++) rowStart[r + 1] = rowStart[r] + rows[r].Count;
        var columns = rows.SelectMany(row => row.Keys).ToArray();
        var values = rows.SelectMany(row => row.Values).ToArray();
        return RealGauge.TryFind(n, rowStart, columns, values) is var (phases, real)
            ? (phases, new CsrMatrix(n, rowStart, columns, real))
            : null;
    }
}
