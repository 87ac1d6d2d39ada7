using LevelDesign.Core.Elements;

namespace LevelDesign.Core.Couplers;

/// <summary>
/// Where a coupler given as g is converted to its coefficient: the values that the bias-type parameters of its
/// two elements (flux, offset charge, and any parameter a bias of the file moves) have at that point. A coupling
/// is hardware, so the conversion is made there once and the coefficient stays fixed while biases move; the
/// elements' other parameters (E_J, E_C, ...) are taken as they are, so a fit of them re-converts g for the
/// fitted design.
/// </summary>
public sealed record GReference(string PointName, IReadOnlyList<KeyValuePair<string, double>> SettingsA, IReadOnlyList<KeyValuePair<string, double>> SettingsB)
{
    /// <summary>Name used when the point is the file's own values with every bias at its value.</summary>
    public const string ReferencePoint = "reference";

    /// <summary>The point where <paramref name="a"/> and <paramref name="b"/> are as given.</summary>
    public static GReference Of(string pointName, Element a, Element b, IReadOnlyCollection<string>? biasedPaths = null) =>
        new(pointName, Settings(a, biasedPaths), Settings(b, biasedPaths));

    /// <summary>The element with its bias-type parameters moved to this point (side 0 = A, 1 = B).</summary>
    public Element Apply(Element element, int side)
    {
        foreach (var (name, value) in side == 0 ? SettingsA : SettingsB) element = element.WithParameter(name, value);
        return element;
    }

    private static KeyValuePair<string, double>[] Settings(Element e, IReadOnlyCollection<string>? biasedPaths)
    {
        var names = e.BiasParameters.ToList();
        if (biasedPaths is not null)
            foreach (string path in biasedPaths)
                if (path.StartsWith(e.Id + ".", StringComparison.Ordinal) && path[(e.Id.Length + 1)..] is var name && !names.Contains(name))
                    names.Add(name);
        return names.Where(e.Parameters.ContainsKey).Select(n => KeyValuePair.Create(n, e.Parameters[n])).ToArray();
    }

    // Value equality, so that devices (and couplers) compare by what they mean.
    public bool Equals(GReference? other) =>
        other is not null && PointName == other.PointName && SettingsA.SequenceEqual(other.SettingsA) && SettingsB.SequenceEqual(other.SettingsB);

    public override int GetHashCode() => HashCode.Combine(PointName, SettingsA.Count, SettingsB.Count);
}
