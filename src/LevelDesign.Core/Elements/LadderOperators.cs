using LevelDesign.Core.Linear;

namespace LevelDesign.Core.Elements;

/// <summary>
/// For anharmonic elements, "a" is defined in the bare eigenbasis as Σ_k sqrt(k+1)|k⟩⟨k+1|
/// (the oscillator ladder on the element's own levels), and "adag" its adjoint. This is the usual
/// meaning of the exchange (rotating-wave) coupling between qubit-like elements. The bare states' phases follow
/// <see cref="PhaseConvention"/> first, so this ladder agrees with the element's n in the harmonic limit.
/// </summary>
internal static class LadderOperators
{
    public static OperatorMatrix Lowering(int levels)
    {
        var a = new OperatorMatrix(levels);
        for (int k = 0; k + 1 < levels; k++) a[k, k + 1] = Math.Sqrt(k + 1);
        return a;
    }

    /// <summary>Applies the phase convention and adds a and adag (an "a" the element already defines is kept).</summary>
    public static BareSpectrum Add(BareSpectrum spectrum)
    {
        spectrum = PhaseConvention.Apply(spectrum);
        var ops = new Dictionary<string, OperatorMatrix>(spectrum.Operators);
        var a = ops.TryGetValue("a", out var given) ? given : Lowering(spectrum.Levels);
        ops["a"] = a;
        ops["adag"] = a.Adjoint();
        return new BareSpectrum(spectrum.ElementId, spectrum.Energies, ops, spectrum.Basis);
    }
}
