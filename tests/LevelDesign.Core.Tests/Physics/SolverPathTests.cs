using LevelDesign.Core.Analysis;
using LevelDesign.Core.Composite;
using LevelDesign.Core.Couplers;
using LevelDesign.Core.Eigen;
using LevelDesign.Core.Elements;
using LevelDesign.Core.Model;
using LevelDesign.Core.Tests.Eigen;

namespace LevelDesign.Core.Tests.Physics;

/// <summary>The native and managed eigensolver paths give the same dressed spectrum and derived quantities.</summary>
public class SolverPathTests
{
    private static Device Device(double ng) => new("three",
        [new TunableTransmon("qa", 0.21, 22, 0.3, 0.12, ng), new Fluxonium("fx", 0.9, 4.2, 1.1, 0.31), new Resonator("ra", 7.1, Kappa: 0.001)],
        [
            Coupler.Create("c1", CouplerKind.Capacitive, "qa", "fx", new CouplingStrength.Coefficient(0.05)),
            Coupler.Create("c2", CouplerKind.Capacitive, "qa", "ra", new CouplingStrength.TargetG(0.09)),
        ],
        new Truncation { DefaultLevels = 5, MaxExcitations = 6 });

    [NativeTheory]
    [InlineData(0.0)]
    [InlineData(0.27)]
    public void Native_and_managed_agree(double ng)
    {
        var native = new DeviceSolver(EigenSolvers.Native!).Solve(Device(ng));
        var managed = new DeviceSolver(EigenSolvers.Managed).Solve(Device(ng));
        // With the phase convention both charges are imaginary off the diagonal, so n·n is real at n_g = 0; an offset
        // charge breaks the transmon's parity and makes the matrix complex Hermitian.
        Assert.Equal(ng != 0, native.IsComplex);
        for (int k = 0; k < native.Count; k++)
            Assert.True(Math.Abs(native.Energies[k] - managed.Energies[k]) <= 1e-10 * Math.Max(1, Math.Abs(managed.Energies[k])));
        Assert.Equal(managed.Labels.Select(l => l.BareIndex), native.Labels.Select(l => l.BareIndex));
        var a = DerivedQuantities.From(native).Named();
        var b = DerivedQuantities.From(managed).Named();
        foreach (var (name, value) in b) Assert.Equal(value, a[name], 9);
    }
}
