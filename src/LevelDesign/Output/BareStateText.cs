namespace LevelDesign.Output;

/// <summary>A product state given as levels in element order, written with element ids: "qa1 qc1", or "ground".</summary>
public static class BareStateText
{
    public static string Of(IReadOnlyList<string> elementIds, IReadOnlyList<int> levels)
    {
        var parts = new List<string>();
        for (int e = 0; e < levels.Count; e++)
            if (levels[e] != 0) parts.Add($"{elementIds[e]}{levels[e]}");
        return parts.Count == 0 ? "ground" : string.Join(" ", parts);
    }
}
