namespace LevelDesign.Core.Couplers;

/// <summary>How the user gave a coupling's size.</summary>
public abstract record CouplingStrength
{
    private CouplingStrength() { }

    /// <summary>The coefficient c (GHz) of c·op_A ⊗ op_B directly.</summary>
    public sealed record Coefficient(double GHz) : CouplingStrength;

    /// <summary>
    /// A target g (GHz) between the lowest transitions: c = g / |⟨0|op_A|1⟩·⟨0|op_B|1⟩| using the bare matrix elements
    /// at the point <paramref name="At"/> (see <see cref="GReference"/>), so c stays fixed while biases move. A device
    /// fills in a missing point with its elements as given.
    /// </summary>
    public sealed record TargetG(double GHz, GReference? At = null) : CouplingStrength;

    /// <summary>
    /// A coupling capacitance (farad) between the two nodes; with node capacitances C_A, C_B taken from the
    /// elements' E_C, the weak-coupling coefficient of n_A n_B is 4e²C_g/(h·C_A·C_B). For exact treatment
    /// of strong or many couplings give the device's whole capacitance matrix instead.
    /// </summary>
    public sealed record Capacitance(double Farad) : CouplingStrength;
}
