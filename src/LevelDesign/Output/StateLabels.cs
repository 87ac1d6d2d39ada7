using System.Text.Json.Nodes;
using LevelDesign.Core.Composite;

namespace LevelDesign.Output;

/// <summary>Writes bare product states as element id → level: "qa1 ra1" for text (Core.Presentation.StateNames), an object for JSON.</summary>
public static class StateLabels
{
    public static string Text(DressedSpectrum s, int bareIndex) =>
        Core.Presentation.StateNames.Of(s.Device.Elements.Select(e => e.Id).ToArray(), s.Basis.States[bareIndex]);

    public static JsonObject Json(DressedSpectrum s, int bareIndex)
    {
        var levels = s.Basis.States[bareIndex];
        var o = new JsonObject();
        for (int e = 0; e < levels.Length; e++) o[s.Device.Elements[e].Id] = levels[e];
        return o;
    }
}
