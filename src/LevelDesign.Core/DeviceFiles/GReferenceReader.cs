using LevelDesign.Core.Couplers;
using LevelDesign.Core.DeviceFiles.Source;
using LevelDesign.Core.Elements;
using LevelDesign.Core.Model;

namespace LevelDesign.Core.DeviceFiles;

/// <summary>
/// Fixes where each coupler given as g is converted: at the file's reference point (every element at its values,
/// every bias at its value) or at the point a coupler names with <c>g_at</c>. The conversion is tried here, so a g
/// that cannot be converted there is reported at its own key with line and column.
/// </summary>
internal static class GReferenceReader
{
    public static Device Fix(Device device, IReadOnlyList<(string Id, SourceTable Table)> couplerTables, IReadOnlyList<OperatingPoint> points,
        IReadOnlyList<BiasDefinition> biases, ErrorList errors, Dictionary<Element, BareSpectrum> bare)
    {
        var biased = biases.Select(b => b.Target).ToHashSet();
        device = device.WithGReferencesHere(GReference.ReferencePoint, biased);
        var tables = couplerTables.ToDictionary(t => t.Id, t => t.Table);
        var couplers = device.Couplers.ToArray();
        for (int i = 0; i < couplers.Length; i++)
        {
            if (couplers[i].Strength is not CouplingStrength.TargetG g || !tables.TryGetValue(couplers[i].Id, out var table)) continue;
            string path = "couplers." + couplers[i].Id;
            var at = g.At;
            if (table.Find("g_at") is SourceEntry entry)
            {
                string? name = entry.Value.Kind == SourceValueKind.String ? entry.Value.Text : null;
                var point = points.FirstOrDefault(p => p.Name == name);
                if (point is null)
                {
                    errors.At(entry.Value, path + ".g_at", name is null
                        ? "g_at names an operating point, e.g. g_at = \"idle\""
                        : $"no operating point '{name}'{EditDistance.Suggestion(name, points.Select(p => p.Name))} (points: {string.Join(", ", points.Select(p => p.Name))})");
                    continue;
                }
                var there = AtPoint(device, point, biases);
                at = GReference.Of(point.Name, there.Element(couplers[i].ElementA), there.Element(couplers[i].ElementB), biased);
                couplers[i] = couplers[i].WithGReference(at);
            }
            var where = table.Find("g")?.Value;
            try
            {
                var opA = Bare(device, at!.Apply(device.Element(couplers[i].ElementA), 0), bare).Operator(couplers[i].OperatorA);
                var opB = Bare(device, at.Apply(device.Element(couplers[i].ElementB), 1), bare).Operator(couplers[i].OperatorB);
                CouplerResolver.LowestTransitionElement(couplers[i], opA, opB, at.PointName);
            }
            catch (Exception e) when (e is not OutOfMemoryException)
            {
                if (where is not null) errors.At(where, path + ".g", e.Message);
                else errors.At(table, path + ".g", e.Message);
            }
        }
        return device with { Couplers = couplers };
    }

    private static Device AtPoint(Device device, OperatingPoint point, IReadOnlyList<BiasDefinition> biases)
    {
        foreach (var (name, value) in point.BiasValues)
            if (biases.FirstOrDefault(b => b.Name == name) is BiasDefinition bias) device = device.WithParameter(bias.Target, bias.ToParameter(value));
        return device;
    }

    private static BareSpectrum Bare(Device device, Element element, Dictionary<Element, BareSpectrum> cache)
    {
        if (cache.TryGetValue(element, out var found)) return found;
        var spectrum = element.Diagonalise(device.Truncation.LevelsOf(element.Id), device.Truncation.BasisSizeOf(element.Id));
        cache[element] = spectrum;
        return spectrum;
    }
}
