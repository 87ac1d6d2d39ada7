using LevelDesign.Core.Analysis;
using LevelDesign.Core.Composite;

namespace LevelDesign.Core.Sweeps;

/// <summary>
/// Reads one named derived quantity ("qa.f01", "zz:qa:qb", ...) or a sum of them ("qa.f01 - qb.f01", see
/// <see cref="QuantityExpression"/>), with a clear message when a name is unknown.
/// </summary>
public static class QuantityLookup
{
    public static double Value(IReadOnlyDictionary<string, double> quantities, string name)
    {
        if (quantities.TryGetValue(name, out double v)) return v;
        if (QuantityExpression.Parse(name, null, out _) is { IsSingle: false } expression) return expression.Value(quantities);
        throw new ArgumentException($"no quantity '{name}' (available: {string.Join(", ", quantities.Keys)})");
    }

    /// <summary>The lowest purity of the labelled states a quantity (or every term of a sum) is read from.</summary>
    public static double Purity(IReadOnlyDictionary<string, double> purities, string name) =>
        purities.TryGetValue(name, out double p) ? p
        : QuantityExpression.Parse(name, null, out _) is { } expression ? expression.Purity(purities) : double.NaN;

    public static double Value(DressedSpectrum spectrum, string name) => Value(DerivedQuantities.From(spectrum).Named(), name);
}
