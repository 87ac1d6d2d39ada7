using System.Globalization;
using System.Text;
using System.Text.Json.Nodes;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Sweeps;
using LevelDesign.Core.Units;

namespace LevelDesign.Core.Presentation;

/// <summary>A fit's outcome: fitted values in the units the file uses, bounds reached, and each target's residual.</summary>
public static class FitReport
{
    public static string Table(DeviceDocument document, IReadOnlyList<FitParameter> parameters, IReadOnlyList<FitField> fields, FitResult result)
    {
        var b = new StringBuilder();
        b.AppendLine($"device {document.Device.Name}: fit {(result.Converged ? "ended" : "stopped")} after {result.Iterations} iteration(s): {result.Message}");
        b.AppendLine();
        b.AppendLine($"{"parameter",-16} {"start",-18} {"fitted",-20} {"bounds",-30} note");
        for (int i = 0; i < parameters.Count; i++)
        {
            var p = parameters[i];
            var f = fields[i];
            string note = result.AtBounds.Contains(p.Path) ? "ON A BOUND: the target may want a value outside" : f.Refusal is null ? "" : "cannot be written back (see --write)";
            b.AppendLine($"{p.Path,-16} {f.Display(p.Initial),-18} {f.Display(result.Values[p.Path]),-20} {f.Display(p.Lower) + " … " + f.Display(p.Upper),-30} {note}");
        }
        b.AppendLine();
        b.AppendLine($"{"target",-20} {"wanted",-16} {"achieved",-22} {"residual",-16} purity");
        foreach (var r in result.Residuals)
            b.AppendLine($"{Name(r.Target),-20} {Freq(r.Target.Value),-16} {Freq(r.Achieved),-22} {Freq(r.Residual),-16} " +
                         (double.IsFinite(r.Purity) ? r.Purity.ToString("0.0000", System.Globalization.CultureInfo.InvariantCulture) : "—") +
                         (r.Purity < document.PurityThreshold ? " ! hybridized: the label of a state it is read from cannot be trusted" : ""));
        return b.ToString();
    }

    public static string Json(DeviceDocument document, IReadOnlyList<FitParameter> parameters, IReadOnlyList<FitField> fields, FitResult result)
    {
        var ps = new JsonArray();
        for (int i = 0; i < parameters.Count; i++)
        {
            var p = parameters[i];
            var f = fields[i];
            ps.AddNode(new JsonObject
            {
                ["path"] = p.Path,
                ["field"] = f.FieldPath,
                ["start"] = JsonValues.Number(p.Initial),
                ["fitted"] = JsonValues.Number(result.Values[p.Path]),
                ["fitted_text"] = f.Display(result.Values[p.Path]),
                ["lower"] = JsonValues.Number(p.Lower),
                ["upper"] = JsonValues.Number(p.Upper),
                ["unit"] = ShownUnit.Default(f.Kind).Symbol,
                ["at_bound"] = result.AtBounds.Contains(p.Path),
                ["write_refusal"] = f.Refusal,
            });
        }
        var ts = new JsonArray();
        foreach (var r in result.Residuals)
            ts.AddNode(new JsonObject
            {
                ["quantity"] = r.Target.Quantity,
                ["settings"] = new JsonObject((r.Target.Settings ?? new Dictionary<string, double>()).Select(kv => KeyValuePair.Create(kv.Key, JsonValues.Number(kv.Value)))),
                ["target_ghz"] = JsonValues.Number(r.Target.Value),
                ["achieved_ghz"] = JsonValues.Number(r.Achieved),
                ["residual_ghz"] = JsonValues.Number(r.Residual),
                ["purity"] = JsonValues.Number(r.Purity),
                ["hybridized"] = r.Purity < document.PurityThreshold,
            });
        return JsonValues.Write(new JsonObject
        {
            ["device"] = document.Device.Name,
            ["converged"] = result.Converged,
            ["iterations"] = result.Iterations,
            ["message"] = result.Message,
            ["parameters"] = ps,
            ["targets"] = ts,
            ["residual_weighting"] = "every residual in units of 1 MHz",
        }) + Environment.NewLine;
    }

    private static string Name(FitTarget t) =>
        t.Settings is { Count: > 0 } s ? $"{t.Quantity}@{string.Join(",", s.Select(kv => $"{kv.Key}={kv.Value.ToString("G6", CultureInfo.InvariantCulture)}"))}" : t.Quantity;

    private static string Freq(double ghz) => double.IsFinite(ghz) ? QuantityFormatter.Format(ghz, UnitKind.Frequency) : "—";
}
