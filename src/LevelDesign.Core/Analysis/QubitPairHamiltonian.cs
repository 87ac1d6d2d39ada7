using System.Numerics;

namespace LevelDesign.Core.Analysis;

/// <summary>
/// The effective Hamiltonian of two qubits on their computational states |a b⟩ = |00⟩, |01⟩, |10⟩, |11⟩ (every other
/// element in its ground state), in GHz, written as H = Σ h_PQ·P⊗Q (P on qubit a). Derived: J_eff = h_XX + h_YY (the
/// exchange J(σ⁺σ⁻ + σ⁻σ⁺) = (J/2)(XX + YY), = Re⟨10|H|01⟩), the counter-rotating K = h_XX − h_YY (K(σ⁺σ⁺ + σ⁻σ⁻),
/// = Re⟨00|H|11⟩, oscillating at f_a + f_b and dropped by a rotating-wave picture), ζ = 4h_ZZ, f_a = −2h_ZI,
/// f_b = −2h_IZ, and the residual √(Σh²) of every other term. <see cref="ComputationalWeights"/> is each labelled dressed state's weight on the four bare
/// computational states; below the threshold the block diagonalisation is ill-conditioned.
/// </summary>
public sealed record QubitPairHamiltonian(
    string QubitA,
    string QubitB,
    Complex[,] Matrix,
    IReadOnlyList<double> DressedEnergies,
    IReadOnlyDictionary<string, double> PauliTerms,
    IReadOnlyList<double> ComputationalWeights,
    IReadOnlyList<double> Purities,
    double Threshold)
{
    public static readonly string[] BasisLabels = ["00", "01", "10", "11"];

    public double JEff => Term("XX") + Term("YY");

    public double CounterRotating => Term("XX") - Term("YY");

    public double ZZ => 4 * Term("ZZ");

    public double FrequencyA => -2 * Term("ZI");

    public double FrequencyB => -2 * Term("IZ");

    /// <summary>|⟨10|H|01⟩|: the exchange magnitude including any XY − YX part (equals |J_eff| for a real Hamiltonian).</summary>
    public double ExchangeMagnitude => Complex.Abs(Matrix[2, 1]);

    public double Residual
    {
        get
        {
            double sum = 0;
            foreach (var (name, value) in PauliTerms)
                if (name is not ("II" or "ZI" or "IZ" or "ZZ" or "XX" or "YY")) sum += value * value;
            return Math.Sqrt(sum);
        }
    }

    public double MinComputationalWeight => ComputationalWeights.Count == 0 ? double.NaN : ComputationalWeights.Min();

    /// <summary>True when a labelled computational state is missing or hybridized with non-computational states below the threshold.</summary>
    public bool IllConditioned => !(MinComputationalWeight >= Threshold);

    private double Term(string name) => PauliTerms.TryGetValue(name, out double v) ? v : double.NaN;
}
