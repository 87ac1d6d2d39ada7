using System.Text;
using System.Text.Json.Nodes;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Eigen;
using LevelDesign.Core.Sweeps;
using LevelDesign.Core.Sweeps.Export;

namespace LevelDesign.Output;

/// <summary>
/// The sweep's table (Core's <see cref="SweepTable"/> written by CsvText/JsonText) with what a reader needs
/// around it: the device, axis units and bias mappings, label mode, whether the sweep completed, conventions.
/// </summary>
public static class SweepReport
{
    public static string Json(DeviceDocument document, SweepResult sweep, SweepTable table)
    {
        var o = JsonNode.Parse(JsonText.Sweep(table))!.AsObject();
        var header = new JsonObject
        {
            ["device"] = document.Device.Name,
            ["completed"] = sweep.Completed,
            ["label_mode"] = sweep.Plan.Labels == LabelMode.ByCharacter ? "character" : "order",
            ["axis_details"] = new JsonArray(sweep.Plan.Axes.Select(a => (JsonNode)AxisUnitText.Describe(document, a)).ToArray()),
        };
        // the parameter each bias axis moves (e.g. qc.flux in Φ0), beside its control value, and every linked target
        foreach (var point in o["points"]!.AsArray())
        {
            var values = point!["axis_values"]!.AsArray();
            var parameters = new JsonObject();
            for (int a = 0; a < sweep.Plan.Axes.Count; a++)
            {
                var axis = sweep.Plan.Axes[a];
                double x = (double)values[a]!;
                var (path, value) = AxisUnitText.Parameter(document, axis.Path, x);
                parameters[path] = JsonValues.Number(value);
                foreach (var link in axis.Links)
                {
                    var (linkedPath, linkedValue) = AxisUnitText.Parameter(document, link.Path, link.Scale * x + link.Shift);
                    parameters[linkedPath] = JsonValues.Number(linkedValue);
                }
            }
            point["parameters"] = parameters;
        }
        foreach (var (key, value) in o.ToArray()) { o.Remove(key); header[key] = value; }
        header["conventions"] = SpectrumFormatter.Conventions();
        header["eigensolver"] = EigenSolvers.Describe();
        header["limits_of_model"] = Core.Analysis.Conventions.LimitsOfModel;
        return JsonValues.Write(header) + Environment.NewLine;
    }

    public static string Csv(DeviceDocument document, SweepResult sweep, SweepTable table)
    {
        var b = new StringBuilder();
        b.AppendLine($"# device {document.Device.Name}; {(sweep.Completed ? "completed" : "cancelled: only the points computed")}; labels by {(sweep.Plan.Labels == LabelMode.ByCharacter ? "character" : "order")}");
        foreach (var a in sweep.Plan.Axes)
        {
            string unit = AxisUnitText.Of(document, a.Path);
            string mapping = document.Bias(a.Path) is BiasDefinition bias ? $" -> {bias.Target} = (value - {bias.Offset:R})/{bias.Period:R}" : "";
            string links = string.Concat(a.Links.Select(l => $"; {l.Path} = {l.Scale:R}*{a.Path} + {l.Shift:R}"));
            b.AppendLine($"# axis {a.Path} in {(unit.Length == 0 ? "plain numbers" : unit)}{mapping}{links}");
        }
        b.AppendLine("# quantities in GHz: " + Core.Analysis.Conventions.Transitions + "; " + Core.Analysis.Conventions.DispersiveShift + "; " + Core.Analysis.Conventions.ZZ);
        b.Append(CsvText.Sweep(table));
        return b.ToString();
    }
}
