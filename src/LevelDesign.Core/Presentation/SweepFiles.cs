using System.Globalization;
using System.Text;
using System.Text.Json.Nodes;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Eigen;
using LevelDesign.Core.Sweeps;

namespace LevelDesign.Core.Presentation;

/// <summary>
/// The one CSV and JSON form of a sweep, written by the `sweep` command and the terminal UI's export alike: a commented
/// header (device, completion, label mode, each axis in the unit the file uses for it and what it moves, units,
/// conventions, solver, limits of the model), then one row per point with the axis values in their shown unit,
/// energies, purities, derived quantities with their purities, and the ambiguity and low-purity flags.
/// </summary>
public static class SweepFiles
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    /// <summary>How the sweep ended, for the header: completed, cancelled, or stopped at a failing point.</summary>
    private static string Ending(DeviceDocument document, SweepResult sweep) =>
        sweep.Completed ? "completed"
        : sweep.Failure is { } failure ? $"stopped: the point at {FailedAt(document, sweep, failure)} failed ({TerminalText.Clean(failure.Error.Message).ReplaceLineEndings(" ")}); only the points computed before it"
        : "cancelled: only the points computed";

    /// <summary>The failing point's axis values in the file's units ("qc_flux = 0.75 mA").</summary>
    public static string FailedAt(DeviceDocument document, SweepResult sweep, SweepFailure failure) =>
        string.Join(", ", sweep.Plan.Axes.Select((a, i) => $"{a.Path} = {ShownUnit.Of(document, a.Path).Text(failure.AxisValues[i])}"));

    public static string Csv(DeviceDocument document, SweepResult sweep, SweepTable table)
    {
        var b = new StringBuilder();
        b.AppendLine($"# LevelDesign sweep of device {document.Device.Name}; {Ending(document, sweep)}; labels by {LabelMode(sweep)}");
        foreach (var a in sweep.Plan.Axes)
        {
            var unit = ShownUnit.Of(document, a.Path);
            string mapping = document.Bias(a.Path) is BiasDefinition bias
                ? string.Create(Inv, $" -> {bias.Target} = (value - {unit.Number(bias.Offset)})/{unit.Number(bias.Period)}") : "";
            string links = string.Concat(a.Links.Select(l => string.Create(Inv, $"; {l.Path} = {l.Scale:R}*{a.Path} + {l.Shift:R} (base units)")));
            b.AppendLine($"# axis {a.Path} in {(unit.Symbol.Length == 0 ? "plain numbers" : unit.Symbol)}{mapping}{links}");
        }
        b.AppendLine($"# states: {string.Join("; ", table.Names.Select((n, i) => $"{n} = {table.Labels[i]}"))} (levels of {string.Join(",", table.ElementOrder)})");
        b.AppendLine("# energies and quantities in GHz; E = energy above the dressed ground; " + Analysis.Conventions.Transitions + "; "
                     + Analysis.Conventions.DispersiveShift + "; " + Analysis.Conventions.ZZ);
        b.AppendLine(string.Create(Inv, $"# purity flag below {table.PurityThreshold}; 'purity Q' = lowest purity of the labelled states quantity Q is read from"));
        b.AppendLine($"# eigensolver: {EigenSolvers.Describe()}");
        b.AppendLine("# limits of the model: " + Analysis.Conventions.LimitsOfModel);
        var header = new List<string> { "point" };
        header.AddRange(sweep.Plan.Axes.Select(a => ShownUnit.Of(document, a.Path).Caption(a.Path)));
        header.AddRange(table.Names.Select(n => $"E {n} (GHz)"));
        header.AddRange(table.Names.Select(n => $"purity {n}"));
        header.AddRange(table.QuantityNames.Select(n => $"{n} (GHz)"));
        header.AddRange(table.QuantityNames.Select(n => $"purity {n}"));
        header.AddRange(["ambiguous", "low_purity"]);
        b.AppendLine(string.Join(",", header.Select(CsvCells.Text)));
        var units = sweep.Plan.Axes.Select(a => ShownUnit.Of(document, a.Path)).ToArray();
        foreach (var row in table.Rows)
        {
            var cells = new List<string> { row.Index.ToString(Inv) };
            cells.AddRange(row.AxisValues.Select((x, i) => units[i].Number(x)));
            cells.AddRange(row.Energies.Select(CsvCells.Number));
            cells.AddRange(row.Purities.Select(CsvCells.Number));
            cells.AddRange(row.Quantities.Select(CsvCells.Number));
            cells.AddRange(table.QuantityNames.Select((_, i) => i < row.QuantityPurities.Count ? CsvCells.Number(row.QuantityPurities[i]) : ""));
            cells.Add(row.Ambiguous ? "1" : "0");
            cells.Add(row.LowPurity ? "1" : "0");
            b.AppendLine(string.Join(",", cells));
        }
        return b.ToString();
    }

    public static string Json(DeviceDocument document, SweepResult sweep, SweepTable table)
    {
        var units = sweep.Plan.Axes.Select(a => ShownUnit.Of(document, a.Path)).ToArray();
        var points = new JsonArray();
        foreach (var row in table.Rows)
        {
            var parameters = new JsonObject();
            for (int a = 0; a < sweep.Plan.Axes.Count; a++)
            {
                var axis = sweep.Plan.Axes[a];
                double x = row.AxisValues[a];
                var (path, value) = ParameterOf(document, axis.Path, x);
                parameters[path] = JsonValues.Number(value);
                foreach (var link in axis.Links)
                {
                    var (linkedPath, linkedValue) = ParameterOf(document, link.Path, link.Scale * x + link.Shift);
                    parameters[linkedPath] = JsonValues.Number(linkedValue);
                }
            }
            points.AddNode(new JsonObject
            {
                ["index"] = row.Index,
                ["axis_values"] = Numbers(row.AxisValues.Select((x, i) => units[i].ToShown(x))),
                ["energies"] = Numbers(row.Energies),
                ["purities"] = Numbers(row.Purities),
                ["quantities"] = Numbers(row.Quantities),
                ["quantity_purities"] = Numbers(row.QuantityPurities),
                ["ambiguous"] = row.Ambiguous,
                ["low_purity"] = row.LowPurity,
                ["parameters"] = parameters,
            });
        }
        var o = new JsonObject
        {
            ["device"] = document.Device.Name,
            ["completed"] = sweep.Completed,
            ["failed_at"] = sweep.Failure is { } failure ? FailedAt(document, sweep, failure) : null,
            ["label_mode"] = LabelMode(sweep),
            ["axes"] = Strings(table.AxisPaths),
            ["axis_details"] = new JsonArray(sweep.Plan.Axes.Select(a => (JsonNode)Axis(document, a)).ToArray()),
            ["energy_unit"] = "GHz above the dressed ground",
            ["quantity_unit"] = "GHz",
            ["element_order"] = Strings(table.ElementOrder),
            ["labels"] = Strings(table.Labels),
            ["names"] = Strings(table.Names),
            ["quantities"] = Strings(table.QuantityNames),
            ["purity_threshold"] = table.PurityThreshold,
            ["points"] = points,
            ["conventions"] = ConventionsText.Json(),
            ["eigensolver"] = EigenSolvers.Describe(),
            ["limits_of_model"] = Analysis.Conventions.LimitsOfModel,
        };
        return JsonValues.Write(o) + Environment.NewLine;
    }

    /// <summary>An axis as JSON: path, its shown unit, range in that unit, what a bias moves, links.</summary>
    public static JsonObject Axis(DeviceDocument document, SweepAxis axis)
    {
        var unit = ShownUnit.Of(document, axis.Path);
        var o = new JsonObject
        {
            ["vary"] = axis.Path,
            ["unit"] = unit.Symbol,
            ["start"] = JsonValues.Number(unit.ToShown(axis.Start)),
            ["stop"] = JsonValues.Number(unit.ToShown(axis.Stop)),
            ["count"] = axis.Count,
        };
        if (document.Bias(axis.Path) is BiasDefinition bias)
            o["bias"] = new JsonObject
            {
                ["target"] = bias.Target, ["period"] = JsonValues.Number(unit.ToShown(bias.Period)), ["offset"] = JsonValues.Number(unit.ToShown(bias.Offset)),
                ["mapping"] = "parameter = (control − offset) / period",
            };
        o["links"] = new JsonArray(axis.Links.Select(l => (JsonNode)new JsonObject
        {
            ["path"] = l.Path, ["scale"] = l.Scale, ["shift"] = l.Shift,
            ["rule"] = "value = scale·axis + shift (base units: A, V, GHz, Φ0)",
        }).ToArray());
        return o;
    }

    /// <summary>The parameter a bias or path moves, and that parameter's value for a control value (base units).</summary>
    public static (string Path, double Value) ParameterOf(DeviceDocument document, string name, double value) =>
        document.Bias(name) is BiasDefinition bias ? (bias.Target, bias.ToParameter(value)) : (name, value);

    private static string LabelMode(SweepResult sweep) => sweep.Plan.Labels == Sweeps.LabelMode.ByCharacter ? "character" : "order";

    private static JsonArray Numbers(IEnumerable<double> xs) => new(xs.Select(JsonValues.Number).ToArray());

    private static JsonArray Strings(IEnumerable<string> xs) => new(xs.Select(x => (JsonNode)x).ToArray());
}
