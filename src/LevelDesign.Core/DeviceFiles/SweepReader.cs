using LevelDesign.Core.DeviceFiles.Source;
using LevelDesign.Core.Model;
using LevelDesign.Core.Units;

namespace LevelDesign.Core.DeviceFiles;

/// <summary>
/// Reads [sweeps.NAME]: vary (a bias name or parameter path), from, to, count, optional links = [{ path, scale, shift }],
/// and an optional second axis second = { vary, from, to, count }.
/// </summary>
public static class SweepReader
{
    public static readonly IReadOnlyList<string> Keys = ["vary", "from", "to", "count", "links", "second"];
    private static readonly IReadOnlyList<string> AxisKeys = ["vary", "from", "to", "count", "links"];
    private static readonly IReadOnlyList<string> LinkKeys = ["path", "scale", "shift"];

    public static SweepDefinition? Read(string name, SourceTable table, ErrorList errors, Device device, IReadOnlyDictionary<string, BiasDefinition> biases)
    {
        string path = "sweeps." + name;
        int before = errors.Count;
        var r = new TableReader(table, path, errors, Keys.ToHashSet());
        var axes = new List<SweepAxis>();
        if (Axis(r, device, biases) is SweepAxis first) axes.Add(first);
        if (r.Entry("second") is SourceEntry second)
        {
            if (second.Value.Kind != SourceValueKind.Table)
                errors.At(second.Value, r.Field("second"), "expected an inline table such as second = { vary = \"qb_flux\", from = 0, to = 0.5, count = 51 }");
            else if (Axis(new TableReader(second.Value.Table!, r.Field("second"), errors, AxisKeys.ToHashSet()), device, biases) is SweepAxis axis2)
                axes.Add(axis2);
        }
        if (errors.Count == before)
            foreach (string problem in Sweeps.SweepGrid.AxisProblems(axes)) errors.At(table, path, problem);
        return errors.Count > before ? null : new SweepDefinition(name, axes);
    }

    /// <summary>The unit kind of a sweep target: a bias's control kind, or the parameter's own kind.</summary>
    public static UnitKind KindOf(string target, IReadOnlyDictionary<string, BiasDefinition> biases) =>
        biases.TryGetValue(target, out var b) ? (b.ControlKind == UnitKind.Dimensionless ? UnitKind.Flux : b.ControlKind)
        : ParameterKinds.Of(target.Contains('.') ? target[(target.LastIndexOf('.') + 1)..] : target);

    private static bool IsTarget(string target, Device device, IReadOnlyDictionary<string, BiasDefinition> biases, out string problem)
    {
        problem = "";
        if (biases.ContainsKey(target)) return true;
        if (target.Contains('.'))
        {
            try { device.GetParameter(target); return true; }
            catch (ArgumentException e) { problem = e.Message; return false; }
        }
        problem = $"no bias '{target}'{EditDistance.Suggestion(target, biases.Keys)}; give a bias name or a parameter path such as \"qa.flux\"";
        return false;
    }

    private static SweepAxis? Axis(TableReader r, Device device, IReadOnlyDictionary<string, BiasDefinition> biases)
    {
        string? vary = r.Text("vary", true, "a bias name or parameter path");
        int? count = r.Integer("count", 2, 1_000_000, true);
        if (vary is null) return null;
        if (!IsTarget(vary, device, biases, out string problem)) { r.Error("vary", problem); return null; }
        var kind = KindOf(vary, biases);
        double? from = r.Quantity("from", kind, true);
        double? to = r.Quantity("to", kind, true);
        var links = new List<LinkedPath>();
        if (r.Entry("links") is SourceEntry e)
        {
            if (e.Value.Kind != SourceValueKind.Array || e.Value.Items.Any(i => i.Kind != SourceValueKind.Table))
                r.Error("links", "expected an array of inline tables, e.g. links = [{ path = \"qb_flux\", scale = -1, shift = 0.5 }]");
            else
                for (int i = 0; i < e.Value.Items.Count; i++)
                {
                    var lr = new TableReader(e.Value.Items[i].Table!, $"{r.Field("links")}[{i}]", r.Errors, LinkKeys.ToHashSet());
                    string? p = lr.Text("path", true, "the bias or parameter path moved along");
                    double scale = lr.Quantity("scale", UnitKind.Dimensionless) ?? 1;
                    if (p is null) continue;
                    if (!IsTarget(p, device, biases, out string linkProblem)) { lr.Error("path", linkProblem); continue; }
                    double shift = lr.Quantity("shift", KindOf(p, biases)) ?? 0;
                    links.Add(new LinkedPath(p, scale, shift));
                }
        }
        return from is double a && to is double b && count is int n ? new SweepAxis(vary, a, b, n, links) : null;
    }
}
