using LevelDesign.Core.Analysis;
using LevelDesign.Core.Composite;

namespace LevelDesign.Core.Sweeps;

/// <summary>Reads one named derived quantity ("qa.f01", "zz:qa:qb", ...) with a clear message when the name is unknown.</summary>
public static class QuantityLookup
{
    public static double Value(IReadOnlyDictionary<string, double> quantities, string name) =>
        quantities.TryGetValue(name, out double v)
            ? v
            : throw new ArgumentException($"no quantity '{name}' (available: {string.Join(", ", quantities.Keys)})");

    public static double Value(DressedSpectrum spectrum, string name) => Value(DerivedQuantities.From(spectrum).Named(), name);
}
