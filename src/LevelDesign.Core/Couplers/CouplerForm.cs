namespace LevelDesign.Core.Couplers;

/// <summary>
/// Full: c·op_A ⊗ op_B (+ Hermitian conjugate when that product is not Hermitian).
/// Exchange: c·(op_A† ⊗ op_B + op_A ⊗ op_B†), the rotating-wave form.
/// </summary>
public enum CouplerForm
{
    Full,
    Exchange,
}
