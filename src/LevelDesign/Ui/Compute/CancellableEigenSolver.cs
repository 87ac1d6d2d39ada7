using System.Numerics;
using LevelDesign.Core.Eigen;

namespace LevelDesign.Ui.Compute;

/// <summary>
/// Passes every call to another eigensolver after checking a cancellation token, so work built from many full
/// solves (a parameter fit: dozens of solves between Core's own checks) stops within one solve of Esc.
/// </summary>
public sealed class CancellableEigenSolver(IEigenSolver inner, CancellationToken cancellation) : IEigenSolver
{
    public string Name => inner.Name;
    public bool IsNative => inner.IsNative;

    public RealEigenResult LowestReal(double[] matrix, int n, int count)
    {
        cancellation.ThrowIfCancellationRequested();
        return inner.LowestReal(matrix, n, count);
    }

    public ComplexEigenResult LowestComplex(Complex[] matrix, int n, int count)
    {
        cancellation.ThrowIfCancellationRequested();
        return inner.LowestComplex(matrix, n, count);
    }

    public RealEigenResult LowestGeneralizedReal(double[] h, double[] s, int n, int count)
    {
        cancellation.ThrowIfCancellationRequested();
        return inner.LowestGeneralizedReal(h, s, n, count);
    }
}
