using LevelDesign.Core.DeviceFiles.Source;
using LevelDesign.Core.Model;
using LevelDesign.Core.Units;

namespace LevelDesign.Core.DeviceFiles;

/// <summary>Reads [biases.NAME]: target parameter path, control value, and optional period and offset (same unit).</summary>
public static class BiasReader
{
    public static readonly IReadOnlyList<string> Keys = ["target", "value", "period", "offset"];

    public static BiasDefinition? Read(string name, SourceTable table, ErrorList errors, Device device)
    {
        string path = "biases." + name;
        int before = errors.Count;
        var r = new TableReader(table, path, errors, Keys.ToHashSet());
        string? target = r.Text("target", true, "the parameter it moves, e.g. target = \"qa.flux\"");
        if (target is not null)
        {
            try { device.GetParameter(target); }
            catch (ArgumentException e) { r.Error("target", $"'{target}' is not a parameter of this device: {e.Message}"); }
        }
        var read = new Dictionary<string, (double Value, UnitKind Kind, bool Plain)>();
        foreach (var key in new[] { "value", "period", "offset" })
        {
            if (r.Entry(key) is not SourceEntry e) continue;
            string? text = AnyQuantity.TextOf(e.Value);
            if (text is null || !AnyQuantity.TryParse(text, out double v, out var kind))
            {
                errors.At(e.Value, r.Field(key), $"expected a number or a value with a unit (e.g. 0.1 or \"2.1 mA\"), found {e.Value.Describe()}");
                continue;
            }
            if (!double.IsFinite(v)) { errors.At(e.Value, r.Field(key), "must be finite"); continue; }
            read[key] = (v, kind, kind == UnitKind.Dimensionless);
        }
        if (!r.Has("value")) r.Missing("value", "the control value, e.g. value = 0.1");
        var withUnits = read.Where(kv => !kv.Value.Plain).ToList();
        var controlKind = withUnits.Count > 0 ? withUnits[0].Value.Kind : UnitKind.Dimensionless;
        if (controlKind == UnitKind.Flux) controlKind = UnitKind.Dimensionless;
        foreach (var (key, (v, kind, plain)) in read)
        {
            var k = kind == UnitKind.Flux ? UnitKind.Dimensionless : kind;
            if (k != controlKind && !(plain && v == 0))
                r.Error(key, $"{key} is {(plain ? "a plain number" : kind.WithArticle())} but {withUnits[0].Key} is {controlKind.WithArticle()}; give value, period and offset in the same unit");
        }
        if (read.TryGetValue("period", out var p) && p.Value == 0) r.Error("period", "period must not be 0 (it is control units per unit of the parameter)");
        if (errors.Count > before || target is null) return null;
        return new BiasDefinition(name, target, read["value"].Value, read.TryGetValue("period", out var pp) ? pp.Value : 1,
            read.TryGetValue("offset", out var o) ? o.Value : 0) { ControlKind = controlKind };
    }
}
