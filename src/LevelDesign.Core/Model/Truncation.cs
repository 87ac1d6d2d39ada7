using LevelDesign.Core.Elements;

namespace LevelDesign.Core.Model;

/// <summary>
/// How the composite space is cut: levels kept per element (default <see cref="DefaultLevels"/>), an optional
/// cap on total excitations Σ level_i, an optional cap on bare energy above the bare ground (GHz), and optional
/// natural-basis sizes per element (otherwise grown until converged).
/// </summary>
public sealed record Truncation
{
    public IReadOnlyDictionary<string, int> Levels { get; init; } = new Dictionary<string, int>();
    public int DefaultLevels { get; init; } = 4;
    public int? MaxExcitations { get; init; }
    public double? MaxBareEnergyGHz { get; init; }
    public IReadOnlyDictionary<string, int> BasisSizes { get; init; } = new Dictionary<string, int>();

    public int LevelsOf(string elementId) => Levels.TryGetValue(elementId, out int n) ? n : DefaultLevels;

    public int? BasisSizeOf(string elementId) => BasisSizes.TryGetValue(elementId, out int n) ? n : null;

    /// <summary>
    /// Every cutoff raised, for the convergence check: +2 levels each (never past an element's <see cref="Element.MaxLevels"/>),
    /// +1 excitation, +20% energy window, bigger bases.
    /// </summary>
    public Truncation Raised(IEnumerable<Element> elements)
    {
        var levels = elements.ToDictionary(e => e.Id, e => Math.Min(LevelsOf(e.Id) + 2, e.MaxLevels ?? int.MaxValue));
        var sizes = BasisSizes.ToDictionary(kv => kv.Key, kv => kv.Value + 10);
        return this with
        {
            Levels = levels,
            DefaultLevels = DefaultLevels + 2,
            MaxExcitations = MaxExcitations + 1,
            MaxBareEnergyGHz = MaxBareEnergyGHz * 1.2,
            BasisSizes = sizes,
        };
    }
}
