namespace LevelDesign.Core.Elements;

/// <summary>The kinds of few-level element a device can hold. File keys use <see cref="ElementKinds.Key"/>.</summary>
public enum ElementKind
{
    Transmon,
    TunableTransmon,
    Fluxonium,
    KerrOscillator,
    Resonator,
    LevelList,
}
