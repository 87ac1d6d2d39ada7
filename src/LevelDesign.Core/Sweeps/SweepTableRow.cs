namespace LevelDesign.Core.Sweeps;

/// <summary>
/// One sweep point as plain data: axis values, energies and purities of the tracked labels (NaN when a label
/// is not among the computed states), derived quantities by name, and the point's flags.
/// </summary>
public sealed record SweepTableRow(int Index, IReadOnlyList<double> AxisValues, IReadOnlyList<double> Energies,
    IReadOnlyList<double> Purities, IReadOnlyList<double> Quantities, bool Ambiguous, bool LowPurity)
{
    /// <summary>Per quantity (same order), the lowest purity of the labelled states it is read from.</summary>
    public IReadOnlyList<double> QuantityPurities { get; init; } = [];
}
