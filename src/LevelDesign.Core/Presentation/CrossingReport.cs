using System.Globalization;
using System.Text;
using System.Text.Json.Nodes;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Sweeps;

namespace LevelDesign.Core.Presentation;

/// <summary>
/// Crossings found along a sweep, as a table, CSV or JSON: the two labels, the bias of closest approach (in the
/// bias's control unit, and the parameter it moves), the minimum gap 2g_eff in MHz, the lower purity of the two
/// states there, and the nearest named operating point with its distance.
/// </summary>
public static class CrossingReport
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    /// <summary>One crossing with the name of the operating point nearest to it (null when none are named).</summary>
    public sealed record Row(Crossing Crossing, string? NearestPoint, double? Distance);

    public static IReadOnlyList<Row> Rows(IReadOnlyList<Crossing> crossings, IReadOnlyList<(string Name, double Value)> points) =>
        crossings.Select(c =>
        {
            if (points.Count == 0) return new Row(c, null, null);
            var nearest = points.MinBy(p => Math.Abs(p.Value - c.Bias));
            return new Row(c, nearest.Name, Math.Abs(nearest.Value - c.Bias));
        }).ToArray();

    public static string Table(DeviceDocument document, SweepAxis axis, IReadOnlyList<Row> rows)
    {
        var ids = document.Device.Elements.Select(e => e.Id).ToArray();
        var unit = ShownUnit.Of(document, axis.Path);
        var (path, _) = SweepFiles.ParameterOf(document, axis.Path, 0);
        var parameterUnit = ShownUnit.Of(document, path);
        var b = new StringBuilder();
        b.AppendLine($"device {document.Device.Name}: {rows.Count} crossing(s) along {axis.Path} from {unit.Text(axis.Start)} to {unit.Text(axis.Stop)}");
        b.AppendLine("gap = minimum separation of the two dressed states sharing the labels' character (2g_eff at an avoided crossing); purity = the lower of the two there");
        b.AppendLine();
        string header = $"{"#",3}  {"state A",-14} {"state B",-14} {unit.Caption(axis.Path),16} {parameterUnit.Caption(path),14} {"gap MHz",11} {"purity",7}  nearest point";
        b.AppendLine(header);
        for (int i = 0; i < rows.Count; i++)
        {
            var c = rows[i].Crossing;
            var (_, parameter) = SweepFiles.ParameterOf(document, axis.Path, c.Bias);
            string near = rows[i].NearestPoint is string n ? $"{n} ({unit.Text(rows[i].Distance!.Value, 4)} away)" : "";
            string edge = c.Refined ? "" : "  (at the bracket edge: not refined)";
            b.AppendLine(string.Create(Inv, $"{i + 1,3}  {Core.Presentation.StateNames.Of(ids, c.StateA),-14} {Core.Presentation.StateNames.Of(ids, c.StateB),-14} {unit.ToShown(c.Bias),16:G8} {parameterUnit.ToShown(parameter),14:G8} {c.GapGHz * 1e3,11:0.0000} {c.Purity,7:0.0000}  {near}{edge}"));
        }
        return b.ToString();
    }

    public static string Csv(DeviceDocument document, SweepAxis axis, IReadOnlyList<Row> rows)
    {
        var ids = document.Device.Elements.Select(e => e.Id).ToArray();
        var (path, _) = SweepFiles.ParameterOf(document, axis.Path, 0);
        var unit = ShownUnit.Of(document, axis.Path);
        var parameterUnit = ShownUnit.Of(document, path);
        var b = new StringBuilder($"# bias {axis.Path} in {(unit.Symbol.Length == 0 ? "plain numbers" : unit.Symbol)}; gap in MHz; ranked by distance to the nearest operating point (in the bias's unit)\n");
        b.AppendLine($"rank,state_a,state_b,label_a,label_b,{CsvCells.Text(unit.Caption(axis.Path))},{CsvCells.Text(parameterUnit.Caption(path))},gap_mhz,purity,refined,nearest_point,distance");
        for (int i = 0; i < rows.Count; i++)
        {
            var c = rows[i].Crossing;
            var (_, parameter) = SweepFiles.ParameterOf(document, axis.Path, c.Bias);
            b.AppendLine(string.Join(",", (i + 1).ToString(Inv), CsvCells.Text(Core.Presentation.StateNames.Of(ids, c.StateA)), CsvCells.Text(Core.Presentation.StateNames.Of(ids, c.StateB)),
                CsvCells.Text(c.LabelA), CsvCells.Text(c.LabelB), unit.Number(c.Bias), parameterUnit.Number(parameter),
                CsvCells.Number(c.GapGHz * 1e3), CsvCells.Number(c.Purity), c.Refined ? "1" : "0",
                CsvCells.Text(rows[i].NearestPoint ?? ""), rows[i].Distance is double d ? unit.Number(d) : ""));
        }
        return b.ToString();
    }

    public static string Json(DeviceDocument document, SweepAxis axis, IReadOnlyList<Row> rows, bool completed)
    {
        var ids = document.Device.Elements.Select(e => e.Id).ToArray();
        var list = new JsonArray();
        var unit = ShownUnit.Of(document, axis.Path);
        for (int i = 0; i < rows.Count; i++)
        {
            var c = rows[i].Crossing;
            var (path, parameter) = SweepFiles.ParameterOf(document, axis.Path, c.Bias);
            list.AddNode(new JsonObject
            {
                ["rank"] = i + 1,
                ["state_a"] = Core.Presentation.StateNames.Of(ids, c.StateA),
                ["state_b"] = Core.Presentation.StateNames.Of(ids, c.StateB),
                ["label_a"] = c.LabelA,
                ["label_b"] = c.LabelB,
                ["bias"] = JsonValues.Number(unit.ToShown(c.Bias)),
                ["bias_unit"] = unit.Symbol,
                ["parameter"] = new JsonObject { [path] = JsonValues.Number(parameter) },
                ["gap_mhz"] = JsonValues.Number(c.GapGHz * 1e3),
                ["purity"] = JsonValues.Number(c.Purity),
                ["refined"] = c.Refined,
                ["nearest_point"] = rows[i].NearestPoint,
                ["distance"] = rows[i].Distance is double d ? JsonValues.Number(unit.ToShown(d)) : null,
            });
        }
        return JsonValues.Write(new JsonObject
        {
            ["device"] = document.Device.Name,
            ["axis"] = SweepFiles.Axis(document, axis),
            ["element_order"] = new JsonArray(ids.Select(x => (JsonNode)x).ToArray()),
            ["completed"] = completed,
            ["gap"] = "minimum separation of the two dressed states sharing the labels' character (2g_eff at an avoided crossing), MHz",
            ["crossings"] = list,
        }) + Environment.NewLine;
    }
}
