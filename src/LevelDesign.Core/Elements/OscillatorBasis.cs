using System.Numerics;
using LevelDesign.Core.Linear;

namespace LevelDesign.Core.Elements;

/// <summary>
/// Fluxonium H = 4E_C n² + ½E_L φ² − E_J cos(φ − 2πΦ/Φ0) in the Fock basis of its LC part:
/// ω_p = sqrt(8E_LE_C), φ = φ_zpf(a + a†) with φ_zpf = (2E_C/E_L)^{1/4}, n = i·n_zpf(a† − a) with
/// n_zpf = (E_L/32E_C)^{1/4}. Operators: n, phi, cos_phi = cos(φ − 2πΦ/Φ0), sin_phi = sin(φ − 2πΦ/Φ0).
/// </summary>
internal static class OscillatorBasis
{
    public static NaturalBasisProblem Build(double ec, double ej, double el, double flux, int size)
    {
        double omega = Math.Sqrt(8 * el * ec);
        double phiZpf = Math.Pow(2 * ec / el, 0.25);
        double nZpf = Math.Pow(el / (32 * ec), 0.25);
        double phase = 2 * Math.PI * flux;
        var d = DisplacementMatrix.RealPart(phiZpf, size);
        var cosPhi = new double[size, size];
        var sinPhi = new double[size, size];
        for (int m = 0; m < size; m++)
            for (int k = 0; k < size; k++)
            {
                int diff = Math.Abs(m - k);
                // i^diff splits the displacement into cos φ (even) and sin φ (odd) parts
                if (diff % 2 == 0) cosPhi[m, k] = ((diff / 2) % 2 == 0 ? 1 : -1) * d[m, k];
                else sinPhi[m, k] = (((diff - 1) / 2) % 2 == 0 ? 1 : -1) * d[m, k];
            }
        var h = new double[size, size];
        var cosShifted = new OperatorMatrix(size);
        var sinShifted = new OperatorMatrix(size);
        var n = new OperatorMatrix(size);
        var phi = new OperatorMatrix(size);
        double cp = Math.Cos(phase), sp = Math.Sin(phase);
        for (int m = 0; m < size; m++)
            for (int k = 0; k < size; k++)
            {
                double c = cosPhi[m, k] * cp + sinPhi[m, k] * sp;
                double s = sinPhi[m, k] * cp - cosPhi[m, k] * sp;
                cosShifted[m, k] = c;
                sinShifted[m, k] = s;
                h[m, k] = -ej * c + (m == k ? omega * (m + 0.5) : 0);
            }
        for (int k = 0; k + 1 < size; k++)
        {
            double root = Math.Sqrt(k + 1);
            phi[k, k + 1] = phi[k + 1, k] = phiZpf * root;
            n[k + 1, k] = new Complex(0, nZpf * root);   // i·n_zpf·a†
            n[k, k + 1] = new Complex(0, -nZpf * root);  // −i·n_zpf·a
        }
        var ops = new Dictionary<string, OperatorMatrix>
        {
            ["n"] = n, ["phi"] = phi, ["cos_phi"] = cosShifted, ["sin_phi"] = sinShifted,
        };
        return new NaturalBasisProblem(h, ops, new BasisInfo("oscillator", size));
    }

    public static BareSpectrum Solve(string id, double ec, double ej, double el, double flux, int levels, int? basisSize)
    {
        int start = Math.Max(50, levels + 30);
        return BasisConvergence.Solve(id, levels, basisSize, start, 20, 400, m => Build(ec, ej, el, flux, m));
    }
}
