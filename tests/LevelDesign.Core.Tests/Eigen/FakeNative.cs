using System.Numerics;
using LevelDesign.Core.Eigen;

namespace LevelDesign.Core.Tests.Eigen;

/// <summary>Stand-in native backend: delegates to managed, optionally corrupting the answer.</summary>
internal sealed class FakeNative(Func<RealEigenResult, RealEigenResult>? corrupt = null, bool throws = false) : IEigenSolver
{
    private readonly IEigenSolver inner = new ManagedSolver();
    public string Name => "fake native";
    public bool IsNative => true;

    public RealEigenResult LowestReal(double[] matrix, int n, int count)
    {
        if (throws) throw new DllNotFoundException("simulated missing symbol");
        RealEigenResult r = inner.LowestReal(matrix, n, count);
        return corrupt is null ? r : corrupt(r);
    }

    public ComplexEigenResult LowestComplex(Complex[] matrix, int n, int count) => inner.LowestComplex(matrix, n, count);

    public RealEigenResult LowestGeneralizedReal(double[] h, double[] s, int n, int count) =>
        inner.LowestGeneralizedReal(h, s, n, count);
}
