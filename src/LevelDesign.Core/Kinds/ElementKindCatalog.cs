using LevelDesign.Core.Elements;
using LevelDesign.Core.Units;

namespace LevelDesign.Core.Kinds;

/// <summary>
/// Every element kind the tool knows: each concrete <see cref="ElementKindInfo"/> in this assembly, found once at
/// first use, so adding a kind needs no list to be edited.
/// </summary>
public static class ElementKindCatalog
{
    private static readonly Lazy<IReadOnlyList<ElementKindInfo>> Found = new(() =>
        typeof(ElementKindInfo).Assembly.GetTypes()
            .Where(t => t.IsSubclassOf(typeof(ElementKindInfo)) && !t.IsAbstract)
            .Select(t => (ElementKindInfo)Activator.CreateInstance(t)!)
            .OrderBy(k => k.Order).ToArray());

    public static IReadOnlyList<ElementKindInfo> All => Found.Value;

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
