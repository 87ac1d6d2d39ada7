namespace LevelDesign.Core.Couplers;

/// <summary>How two elements are linked; each kind implies default operators and form.</summary>
public enum CouplerKind
{
    /// <summary>charge·charge: n_A ⊗ n_B, counter-rotating terms kept.</summary>
    Capacitive,
    /// <summary>flux·flux: φ_A ⊗ φ_B, counter-rotating terms kept.</summary>
    Inductive,
    /// <summary>a_A† a_B + a_A a_B† (rotating-wave form).</summary>
    Exchange,
    /// <summary>User-chosen operator pair.</summary>
    Custom,
}
