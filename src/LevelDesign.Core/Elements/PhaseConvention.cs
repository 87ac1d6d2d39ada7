using System.Numerics;
using LevelDesign.Core.Linear;

namespace LevelDesign.Core.Elements;

/// <summary>
/// The one rule that fixes the free phase of every bare eigenstate of an element with a charge operator: each
/// ⟨k−1|n|k⟩ is made −i times a positive number, as for an oscillator with n = i·n_zpf(a† − a). Then an anharmonic
/// element's <c>n</c> agrees with its ladder <c>a</c> in the harmonic limit, so a device that couples one element
/// through both gives the same physics whatever phases the eigensolver returned.
/// </summary>
/// <remarks>
/// A state whose ⟨k−1|n|k⟩ vanishes (a selection rule) takes its phase from the largest ⟨j|n|k⟩, j &lt; k, by the
/// same rule; a state that n does not reach from below keeps the solver's phase. The phases are applied to every
/// operator of the element together, which is a change of gauge: energies and couplings through the same
/// operators are unchanged.
/// </remarks>
public static class PhaseConvention
{
    /// <summary>Below this fraction of the largest |n| element a matrix element counts as zero.</summary>
    public const double NegligibleRelative = 1e-9;

    public static BareSpectrum Apply(BareSpectrum spectrum)
    {
        if (!spectrum.Operators.TryGetValue("n", out var n) || n.Size < 2) return spectrum;
        var phases = Phases(n);
        var ops = new Dictionary<string, OperatorMatrix>();
        foreach (var (name, op) in spectrum.Operators) ops[name] = Rephased(op, phases);
        return new BareSpectrum(spectrum.ElementId, spectrum.Energies, ops, spectrum.Basis);
    }

    /// <summary>u_k such that conj(u_j)·n_jk·u_k = −i·|n_jk| for the reference j of each k (u_0 = 1).</summary>
    public static Complex[] Phases(OperatorMatrix n)
    {
        int size = n.Size;
        var u = new Complex[size];
        u[0] = Complex.One;
        double negligible = NegligibleRelative * n.MaxAbs();
        for (int k = 1; k < size; k++)
        {
            int j = k - 1;
            if (Complex.Abs(n[j, k]) <= negligible)
                for (int i = 0; i < k; i++)
                    if (Complex.Abs(n[i, k]) > Complex.Abs(n[j, k])) j = i;
            Complex m = n[j, k];
            double size_m = Complex.Abs(m);
            // conj(u_j)·m·u_k = −i|m|  ⇔  u_k = −i·u_j·conj(m)/|m|
            u[k] = size_m <= negligible ? Complex.One : -Complex.ImaginaryOne * u[j] * Complex.Conjugate(m) / size_m;
        }
        return u;
    }

    private static OperatorMatrix Rephased(OperatorMatrix op, Complex[] u)
    {
        var result = new OperatorMatrix(op.Size);
        for (int j = 0; j < op.Size; j++)
            for (int k = 0; k < op.Size; k++)
            {
                Complex z = Complex.Conjugate(u[j]) * op[j, k] * u[k];
                // keep exact zeros and purely real/imaginary values free of rounding residue
                result[j, k] = new Complex(Clean(z.Real, z.Magnitude), Clean(z.Imaginary, z.Magnitude));
            }
        return result;
    }

    private static double Clean(double part, double magnitude) => Math.Abs(part) <= 1e-15 * magnitude ? 0 : part;
}
