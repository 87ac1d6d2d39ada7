namespace LevelDesign.Plots;

/// <summary>What the vertical axis of a spectrum plot shows.</summary>
public enum SpectrumScale
{
    /// <summary>Transition frequencies from the dressed ground state, E_k − E_0 (GHz).</summary>
    FromGround,
    /// <summary>Energies in the frame where the bare ground is 0 (GHz), so the ground level's own shift shows.</summary>
    Energies,
}
