namespace LevelDesign.Core.Elements;

/// <summary>Text names of element kinds as used in device files and output.</summary>
public static class ElementKinds
{
    public static readonly IReadOnlyDictionary<ElementKind, string> Keys = new Dictionary<ElementKind, string>
    {
        [ElementKind.Transmon] = "transmon",
        [ElementKind.TunableTransmon] = "tunable_transmon",
        [ElementKind.Fluxonium] = "fluxonium",
        [ElementKind.KerrOscillator] = "kerr",
        [ElementKind.Resonator] = "resonator",
        [ElementKind.LevelList] = "level_list",
    };

    public static string Key(ElementKind kind) => Keys[kind];

    public static bool TryParse(string text, out ElementKind kind)
    {
        foreach (var (k, v) in Keys)
            if (v == text) { kind = k; return true; }
        kind = default;
        return false;
    }
}
