using System.Numerics;
using LevelDesign.Core.Eigen;

namespace LevelDesign.Core.Tests.Eigen;

/// <summary>
/// Identity checks for eigen results. Each takes its tolerance from the caller, because what is
/// attainable depends on the quantity: residuals scale with n·ε·‖H‖, vectors with ε‖H‖ / gap.
/// </summary>
public static class EigenAssert
{
    public static void Ascending(double[] values)
    {
        for (int k = 1; k < values.Length; k++)
            Assert.True(values[k - 1] <= values[k], $"eigenvalue {k - 1} = {values[k - 1]:R} exceeds eigenvalue {k} = {values[k]:R}");
    }

    /// <summary>max |(H V − S V Λ)_{ik}| ≤ tolerance, with S = I when <paramref name="s"/> is null.</summary>
    public static void Residual(double[] h, double[]? s, RealEigenResult r, double tolerance)
    {
        int n = r.Dimension;
        double worst = 0;
        for (int k = 0; k < r.Count; k++)
            for (int i = 0; i < n; i++)
            {
                double hv = 0, sv = 0;
                for (int j = 0; j < n; j++)
                {
                    hv += h[j * n + i] * r.Component(j, k);
                    sv += (s is null ? (i == j ? 1 : 0) : s[j * n + i]) * r.Component(j, k);
                }
                worst = Math.Max(worst, Math.Abs(hv - r.Values[k] * sv));
            }
        Assert.True(worst <= tolerance, $"max residual {worst:E3} exceeds {tolerance:E3}");
    }

    public static void Residual(Complex[] h, ComplexEigenResult r, double tolerance)
    {
        int n = r.Dimension;
        double worst = 0;
        for (int k = 0; k < r.Count; k++)
            for (int i = 0; i < n; i++)
            {
                Complex hv = 0;
                for (int j = 0; j < n; j++) hv += h[j * n + i] * r.Component(j, k);
                worst = Math.Max(worst, (hv - r.Values[k] * r.Component(i, k)).Magnitude);
            }
        Assert.True(worst <= tolerance, $"max residual {worst:E3} exceeds {tolerance:E3}");
    }

    /// <summary>max |(Vᵀ S V − I)_{kl}| ≤ tolerance, with S = I when <paramref name="s"/> is null.</summary>
    public static void Orthonormal(double[]? s, RealEigenResult r, double tolerance)
    {
        int n = r.Dimension;
        double worst = 0;
        for (int k = 0; k < r.Count; k++)
            for (int l = 0; l < r.Count; l++)
            {
                double dot = 0;
                for (int j = 0; j < n; j++)
                    for (int i = 0; i < n; i++)
                    {
                        double sij = s is null ? (i == j ? 1 : 0) : s[j * n + i];
                        if (sij != 0) dot += r.Component(i, k) * sij * r.Component(j, l);
                    }
                worst = Math.Max(worst, Math.Abs(dot - (k == l ? 1 : 0)));
            }
        Assert.True(worst <= tolerance, $"max deviation of VᵀSV from I is {worst:E3}, allowed {tolerance:E3}");
    }

    public static void Orthonormal(ComplexEigenResult r, double tolerance)
    {
        int n = r.Dimension;
        double worst = 0;
        for (int k = 0; k < r.Count; k++)
            for (int l = 0; l < r.Count; l++)
            {
                Complex dot = 0;
                for (int i = 0; i < n; i++) dot += Complex.Conjugate(r.Component(i, k)) * r.Component(i, l);
                worst = Math.Max(worst, (dot - (k == l ? 1 : 0)).Magnitude);
            }
        Assert.True(worst <= tolerance, $"max deviation of VᴴV from I is {worst:E3}, allowed {tolerance:E3}");
    }

    /// <summary>
    /// The stated convention, checked from its definition: the first component whose magnitude is within
    /// a relative 1e-12 of the column's largest is real and strictly positive.
    /// </summary>
    public static void PhaseConvention(RealEigenResult r)
    {
        int n = r.Dimension;
        for (int k = 0; k < r.Count; k++)
        {
            double max = Enumerable.Range(0, n).Max(i => Math.Abs(r.Component(i, k)));
            int first = Enumerable.Range(0, n).First(i => Math.Abs(r.Component(i, k)) >= max * (1 - 1e-12));
            Assert.True(r.Component(first, k) > 0, $"column {k}: pinned component {first} is {r.Component(first, k):R}, not positive");
        }
    }

    public static void PhaseConvention(ComplexEigenResult r)
    {
        int n = r.Dimension;
        for (int k = 0; k < r.Count; k++)
        {
            double max = Enumerable.Range(0, n).Max(i => r.Component(i, k).Magnitude);
            int first = Enumerable.Range(0, n).First(i => r.Component(i, k).Magnitude >= max * (1 - 1e-12));
            Complex pinned = r.Component(first, k);
            Assert.True(pinned.Imaginary == 0 && pinned.Real > 0, $"column {k}: pinned component {first} is {pinned}, not real positive");
        }
    }
}
