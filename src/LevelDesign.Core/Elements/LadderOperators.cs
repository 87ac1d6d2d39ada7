using LevelDesign.Core.Linear;

namespace LevelDesign.Core.Elements;

/// <summary>
/// For anharmonic elements, "a" is defined in the bare eigenbasis as Σ_k sqrt(k+1)|k⟩⟨k+1|
/// (the oscillator ladder on the element's own levels), and "adag" its adjoint. This is the usual
/// meaning of the exchange (rotating-wave) coupling between qubit-like elements.
/// </summary>
internal static class LadderOperators
{
    public static OperatorMatrix Lowering(int levels)
    {
        var a = new OperatorMatrix(levels);
        for (int k = 0; k + 1 < levels; k++) a[k, k + 1] = Math.Sqrt(k + 1);
        return a;
    }

    public static BareSpectrum Add(BareSpectrum spectrum)
    {
        var ops = new Dictionary<string, OperatorMatrix>(spectrum.Operators);
        var a = Lowering(spectrum.Levels);
        ops["a"] = a;
        ops["adag"] = a.Adjoint();
        return new BareSpectrum(spectrum.ElementId, spectrum.Energies, ops, spectrum.Basis);
    }
}
