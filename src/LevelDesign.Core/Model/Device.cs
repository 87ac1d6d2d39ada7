using LevelDesign.Core.Couplers;
using LevelDesign.Core.Elements;

namespace LevelDesign.Core.Model;

/// <summary>A chip as a network of elements and couplers, with its truncation. Immutable.</summary>
public sealed record Device(string Name, IReadOnlyList<Element> Elements, IReadOnlyList<Coupler> Couplers, Truncation Truncation)
{
    /// <summary>The couplers; a g without a conversion point is given one: its elements as they are here.</summary>
    public IReadOnlyList<Coupler> Couplers { get; init; } = WithMissingGReferences(Couplers, Elements);

    /// <summary>
    /// A copy whose couplers given as g are converted at this device's present values (the file's reference point
    /// when called on the device read from a file); <paramref name="biasedPaths"/> adds parameters that biases move.
    /// </summary>
    public Device WithGReferencesHere(string pointName, IReadOnlyCollection<string>? biasedPaths = null) =>
        this with { Couplers = Couplers.Select(c => ReferenceHere(c, Elements, pointName, biasedPaths) is GReference at ? c.WithGReference(at) : c).ToArray() };

    private static IReadOnlyList<Coupler> WithMissingGReferences(IReadOnlyList<Coupler> couplers, IReadOnlyList<Element> elements)
    {
        if (!couplers.Any(c => c.Strength is CouplingStrength.TargetG { At: null })) return couplers;
        return couplers.Select(c => c.Strength is CouplingStrength.TargetG { At: null } && ReferenceHere(c, elements, GReference.ReferencePoint, null) is GReference at
            ? c.WithGReference(at) : c).ToArray();
    }

    private static GReference? ReferenceHere(Coupler c, IReadOnlyList<Element> elements, string pointName, IReadOnlyCollection<string>? biasedPaths)
    {
        if (c.Strength is not CouplingStrength.TargetG) return null;
        var a = elements.FirstOrDefault(e => e.Id == c.ElementA);
        var b = elements.FirstOrDefault(e => e.Id == c.ElementB);
        return a is null || b is null ? null : GReference.Of(pointName, a, b, biasedPaths);
    }

    public int IndexOf(string elementId)
    {
        for (int i = 0; i < Elements.Count; i++) if (Elements[i].Id == elementId) return i;
        return -1;
    }

    public Element Element(string elementId) =>
        IndexOf(elementId) is int i and >= 0 ? Elements[i] : throw new KeyNotFoundException($"no element '{elementId}'");

    /// <summary>Reads a numeric parameter by path "element.parameter" or "coupler.parameter".</summary>
    public double GetParameter(string path)
    {
        var (owner, name) = ParameterPath.Split(path);
        int i = IndexOf(owner);
        if (i >= 0)
            return Elements[i].Parameters.TryGetValue(name, out double v)
                ? v
                : throw new ArgumentException($"element '{owner}' has no parameter '{name}' (it has: {string.Join(", ", Elements[i].Parameters.Keys)})");
        var coupler = Couplers.FirstOrDefault(c => c.Id == owner)
                      ?? throw new ArgumentException($"'{path}': no element or coupler named '{owner}'");
        return coupler.GetParameter(name);
    }

    /// <summary>A copy with one parameter changed, by path "element.parameter" or "coupler.parameter".</summary>
    public Device WithParameter(string path, double value)
    {
        var (owner, name) = ParameterPath.Split(path);
        int i = IndexOf(owner);
        if (i >= 0)
        {
            var elements = Elements.ToArray();
            elements[i] = elements[i].WithParameter(name, value);
            return this with { Elements = elements };
        }
        int c = Couplers.ToList().FindIndex(x => x.Id == owner);
        if (c < 0) throw new ArgumentException($"'{path}': no element or coupler named '{owner}'");
        var couplers = Couplers.ToArray();
        couplers[c] = couplers[c].WithParameter(name, value);
        return this with { Couplers = couplers };
    }

    /// <summary>All problems found in elements, couplers and ids (empty when valid), each with the part it concerns.</summary>
    public IReadOnlyList<ModelProblem> Validate()
    {
        var problems = new List<ModelProblem>();
        foreach (var group in Elements.GroupBy(e => e.Id).Where(g => g.Count() > 1)) problems.Add(ModelProblem.OfElement(group.Key, $"duplicate element id '{group.Key}'"));
        foreach (var group in Couplers.GroupBy(c => c.Id).Where(g => g.Count() > 1)) problems.Add(ModelProblem.OfCoupler(group.Key, $"duplicate coupler id '{group.Key}'"));
        foreach (var e in Elements)
        {
            foreach (var p in e.Validate()) problems.Add(ModelProblem.OfElement(e.Id, $"element '{e.Id}': {p}"));
            if (Truncation.LevelsOf(e.Id) < 2) problems.Add(ModelProblem.OfElement(e.Id, $"element '{e.Id}': at least 2 levels must be kept"));
        }
        foreach (var c in Couplers)
        {
            foreach (var (id, op) in new[] { (c.ElementA, c.OperatorA), (c.ElementB, c.OperatorB) })
            {
                int i = IndexOf(id);
                if (i < 0) problems.Add(ModelProblem.OfCoupler(c.Id, $"coupler '{c.Id}' names unknown element '{id}'"));
                else if (!Elements[i].OperatorNames.Contains(op))
                    problems.Add(ModelProblem.OfCoupler(c.Id, $"coupler '{c.Id}': element '{id}' has no operator '{op}' (it offers: {string.Join(", ", Elements[i].OperatorNames)})"));
            }
            if (c.ElementA == c.ElementB) problems.Add(ModelProblem.OfCoupler(c.Id, $"coupler '{c.Id}' links element '{c.ElementA}' to itself"));
        }
        return problems;
    }
}
