using System.Numerics;

namespace LevelDesign.Core.Eigen;

/// <summary>
/// One backend for the lowest eigenpairs of a Hermitian matrix. Matrices are dense,
/// column-major flat arrays of size n*n (only the lower triangle need be valid).
/// Implementations must not modify their inputs.
/// </summary>
public interface IEigenSolver
{
    /// <summary>Short name shown to the user, e.g. "native LAPACK (liblapack.so.3)" or "managed (MathNet)".</summary>
    string Name { get; }

    /// <summary>True when this backend calls a native library.</summary>
    bool IsNative { get; }

    /// <summary>Lowest <paramref name="count"/> eigenpairs of a real symmetric matrix, ascending.</summary>
    RealEigenResult LowestReal(double[] matrix, int n, int count);

    /// <summary>Lowest <paramref name="count"/> eigenpairs of a complex Hermitian matrix, ascending.</summary>
    ComplexEigenResult LowestComplex(Complex[] matrix, int n, int count);

    /// <summary>
    /// Lowest eigenpairs of the generalized problem H c = E S c with S symmetric positive definite.
    /// Eigenvectors are S-orthonormal (cᵀ S c = 1). Throws <see cref="NotPositiveDefiniteException"/> when S is not.
    /// </summary>
    RealEigenResult LowestGeneralizedReal(double[] h, double[] s, int n, int count);
}
