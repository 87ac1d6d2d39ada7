using System.Text.Json.Nodes;
using LevelDesign.Core.Composite;
using LevelDesign.Core.Model;

namespace LevelDesign.Core.Presentation;

/// <summary>
/// The one human name of a bare product state, used by every command, page, export and plot: each excited element as
/// its id followed by its level ("qa1 ra1"), "ground" when all are in 0. An id that ends in a digit takes a ':' before
/// its level ("q2:1 c1:1"), so q2 in level 1 never reads as "q21". Machine-readable outputs add the level tuple
/// ("|0,1,0⟩", levels in the device's element order) and the element → level object.
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

    public static string Of(Device device, IReadOnlyList<int> levels) => Of(device.Elements.Select(e => e.Id).ToArray(), levels);

    /// <summary>The name of the bare state a dressed state is labelled by.</summary>
    public static string OfDressed(DressedSpectrum spectrum, int dressedIndex) => Of(spectrum.Device, spectrum.LabelLevels(dressedIndex));

    /// <summary>The name of a product state of the basis, by its index.</summary>
    public static string OfBare(DressedSpectrum spectrum, int bareIndex) => Of(spectrum.Device, spectrum.Basis.States[bareIndex]);

    /// <summary>One element in one level: "qa1", "q2:1".</summary>
    public static string Level(string elementId, int level) =>
        elementId.Length > 0 && char.IsAsciiDigit(elementId[^1]) ? $"{elementId}:{level}" : $"{elementId}{level}";

    /// <summary>The level tuple "|0,1,0⟩" of machine-readable outputs.</summary>
    public static string Tuple(IReadOnlyList<int> levels) => "|" + string.Join(",", levels) + "⟩";

    /// <summary>Element id → level, for JSON.</summary>
    public static JsonObject Json(DressedSpectrum spectrum, int bareIndex)
    {
        var levels = spectrum.Basis.States[bareIndex];
        var o = new JsonObject();
        for (int e = 0; e < levels.Length; e++) o[spectrum.Device.Elements[e].Id] = levels[e];
        return o;
    }

    /// <summary>Total excitation number of a state (its manifold).</summary>
    public static int Excitations(IReadOnlyList<int> levels) => levels.Sum();
}
