namespace LevelDesign.Core.Analysis;

/// <summary>The conventions printed beside every reported quantity.</summary>
public static class Conventions
{
    public const string Energies = "E/h in GHz above the dressed ground state; labels are the bare product state of largest one-to-one overlap";
    public const string Transitions = "f01 = E(1) − E(0), f12 = E(2) − E(1) with all other elements in 0; anharmonicity α = f12 − f01";
    public const string LambShift = "Lamb shift = dressed f01 − bare f01";
    public const string DispersiveShift = "2χ = ω_r(qubit in 1) − ω_r(qubit in 0) = [E(1q,1r) − E(1q,0r)] − [E(0q,1r) − E(0q,0r)]";
    public const string ZZ = "ζ = E11 − E10 − E01 + E00 of dressed, labelled states";
    public const string Purity = "purity = |⟨label|dressed⟩|²; components = largest |⟨bare|dressed⟩|²";
    public const string QuantityPurity =
        "each quantity carries the lowest purity of the labelled states it is read from; below the purity threshold " +
        "(default 0.9) its labels are hybridized and the value is flagged '!'";
    public const string Coupling = "couplings are hardware: a g is converted once at the reference point (or g_at) and the coefficient stays fixed; g here = |c·⟨0|op_A|1⟩·⟨0|op_B|1⟩| at this point";

    /// <summary>One default purity threshold for the command line, the terminal UI and files ([device] purity_threshold).</summary>
    public const double DefaultPurityThreshold = 0.9;

    public const string Purcell = "Purcell γ = κ × (resonator-excited weight in the dressed qubit 1 state); T1 limit = 1/(2πγ)";
    public const string LimitsOfModel =
        "Limits of the model: a lumped-element model with truncated bases; couplings, stray capacitances and losses are as entered. " +
        "Confirm with electromagnetic simulation and measurement before committing a design.";
}
