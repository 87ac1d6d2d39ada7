namespace LevelDesign.Core.Analysis;

/// <summary>Whether a channel relaxes the qubit (adds to 1/T1) or only dephases it (adds to 1/T_φ).</summary>
public enum CoherenceChannelKind
{
    Relaxation,
    Dephasing,
}
