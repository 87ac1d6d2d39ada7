namespace LevelDesign.Core.Composite;

/// <summary>
/// What one point computes: the number of lowest eigenpairs, a description for the output, and, when the selection
/// names element pairs, the pairs whose ZZ / 2χ are reported (null: every pair, as for a whole manifold).
/// </summary>
public sealed record SelectedStates(int Count, string Description, ISet<(int, int)>? Pairs)
{
    public static SelectedStates Lowest(int count) => new(count, $"the lowest {count} states", null);
}
