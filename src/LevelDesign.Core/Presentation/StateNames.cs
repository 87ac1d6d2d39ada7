namespace LevelDesign.Core.Presentation;

/// <summary>
/// The one human name of a bare product state, used by every command, page, export and plot: each excited element as
/// its id followed by its level ("qa1 ra1"), "ground" when all are in 0. An id that ends in a digit takes a ':' before
/// its level ("q2:1 c1:1"), so q2 in level 1 never reads as "q21".
/// </summary>
public static class StateNames
{
    public static string Of(IReadOnlyList<string> elementIds, IReadOnlyList<int> levels)
    {
        var parts = new List<string>();
        for (int i = 0; i < levels.Count; i++)
            if (levels[i] != 0) parts.Add(Level(elementIds[i], levels[i]));
        return parts.Count == 0 ? "ground" : string.Join(" ", parts);
    }

    /// <summary>One element in one level: "qa1", "q2:1".</summary>
    public static string Level(string elementId, int level) =>
        elementId.Length > 0 && char.IsAsciiDigit(elementId[^1]) ? $"{elementId}:{level}" : $"{elementId}{level}";
}
