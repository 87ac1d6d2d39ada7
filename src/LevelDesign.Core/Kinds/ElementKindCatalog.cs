using LevelDesign.Core.Elements;
using LevelDesign.Core.Units;

namespace LevelDesign.Core.Kinds;

/// <summary>
/// Every element kind the tool knows. The list is written out rather than found by reflection, because the
/// ahead-of-time compiled executable cannot enumerate types at run time (and the list costs no start-up time);
/// <c>ElementKindCatalogTests</c> fails when a concrete <see cref="ElementKindInfo"/> is missing here.
/// </summary>
public static class ElementKindCatalog
{
    private static readonly ElementKindInfo[] Listed =
        new ElementKindInfo[]
        {
            new TransmonKind(), new TunableTransmonKind(), new FluxoniumKind(), new KerrKind(), new ResonatorKind(),
            new LevelListKind(),
        }.OrderBy(k => k.Order).ToArray();

    public static IReadOnlyList<ElementKindInfo> All => Listed;

    public static IReadOnlyList<string> Names => All.Select(k => k.Name).ToArray();

    public static ElementKindInfo? Named(string name) => All.FirstOrDefault(k => k.Name == name);

    /// <summary>The kind of an element (by its physics record's type).</summary>
    public static ElementKindInfo Of(Element element) =>
        All.FirstOrDefault(k => k.ElementType == element.GetType())
        ?? throw new InvalidOperationException($"no kind describes {element.GetType().Name}");

    /// <summary>The unit kind of a key or model parameter of any element kind; null when no kind has it.</summary>
    public static UnitKind? UnitOf(string key) =>
        All.SelectMany(k => k.Keys).FirstOrDefault(k => k.Name == key)?.Unit;

    /// <summary>Keys that give some model parameter in circuit form, and the parameters they give.</summary>
    public static IReadOnlyList<string> CircuitFormKeys =>
        All.SelectMany(k => k.Keys).Where(k => k.IsCircuitForm).SelectMany(k => k.Gives.Append(k.Name)).Distinct().ToArray();
}
