using LevelDesign.Core.Composite;

namespace LevelDesign.Core.Sweeps;

/// <summary>
/// One computed sweep point: its axis values, the dressed spectrum, the derived quantities by name
/// (see DerivedQuantities.Named), and whether label carrying from the neighbour was ambiguous here.
/// </summary>
public sealed record SweepPoint(int Index, IReadOnlyList<double> AxisValues, DressedSpectrum Spectrum,
    IReadOnlyDictionary<string, double> Quantities, bool Ambiguous)
{
    /// <summary>For each quantity, the lowest purity of the labelled states it is read from (DerivedQuantities.NamedPurities).</summary>
    public IReadOnlyDictionary<string, double> QuantityPurities { get; init; } = new Dictionary<string, double>();

    /// <summary>
    /// Everything derived from this point's spectrum, computed while its vectors were there (a large sweep keeps no
    /// vectors, see <see cref="DressedSpectrum.HasVectors"/>, so they cannot be derived again from <see cref="Spectrum"/>).
    /// </summary>
    public required Analysis.DerivedQuantities Derived { get; init; }
}
