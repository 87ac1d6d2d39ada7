using System.Text.Json.Nodes;
using LevelDesign.Core.Composite;

namespace LevelDesign.Output;

/// <summary>Writes bare product states as element id → level: "qa1 ra1" for text, an object for JSON.</summary>
public static class StateLabels
{
    public static string Text(DressedSpectrum s, int bareIndex)
    {
        var levels = s.Basis.States[bareIndex];
        var parts = new List<string>();
        for (int e = 0; e < levels.Length; e++)
            if (levels[e] != 0) parts.Add($"{s.Device.Elements[e].Id}{levels[e]}");
        return parts.Count == 0 ? "ground" : string.Join(" ", parts);
    }

    public static JsonObject Json(DressedSpectrum s, int bareIndex)
    {
        var levels = s.Basis.States[bareIndex];
        var o = new JsonObject();
        for (int e = 0; e < levels.Length; e++) o[s.Device.Elements[e].Id] = levels[e];
        return o;
    }
}
