using LevelDesign.Core.Kinds;
using LevelDesign.Core.Presentation;
using LevelDesign.Core.Couplers;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Elements;
using LevelDesign.Core.Units;

namespace LevelDesign.Ui.Session;

/// <summary>Turns a document into the board tree (elements, couplers, biases) and the form rows of one node.</summary>
public static class BoardOutline
{
    public static IReadOnlyList<BoardNode> Nodes(DeviceDocument document)
    {
        var device = document.Device;
        var nodes = new List<BoardNode> { new(BoardNodeKind.Device, "", 0, $"device {device.Name}") };
        nodes.Add(new BoardNode(BoardNodeKind.Group, "elements", 1, $"elements ({device.Elements.Count})"));
        foreach (var e in device.Elements)
            nodes.Add(new BoardNode(BoardNodeKind.Element, e.Id, 2, $"{e.Id}  {ElementKindCatalog.Of(e).Name}"));
        nodes.Add(new BoardNode(BoardNodeKind.Group, "couplers", 1, $"couplers ({device.Couplers.Count})"));
        foreach (var c in device.Couplers)
            nodes.Add(new BoardNode(BoardNodeKind.Coupler, c.Id, 2, $"{c.Id}  {c.ElementA}–{c.ElementB}"));
        nodes.Add(new BoardNode(BoardNodeKind.Group, "biases", 1, $"biases ({document.Biases.Count})"));
        foreach (var b in document.Biases)
            nodes.Add(new BoardNode(BoardNodeKind.Bias, b.Name, 2, $"{b.Name} → {b.Target}"));
        if (document.Points.Count > 0)
        {
            nodes.Add(new BoardNode(BoardNodeKind.Group, "points", 1, $"points ({document.Points.Count})"));
            foreach (var p in document.Points)
                nodes.Add(new BoardNode(BoardNodeKind.Point, p.Name, 2, $"{p.Name}  {PointText(document, p)}"));
        }
        return nodes;
    }

    /// <summary>An operating point's bias values in their control units ("qc_flux 0.15 mA, qa_flux 0").</summary>
    public static string PointText(DeviceDocument document, OperatingPoint point) =>
        string.Join(", ", point.BiasValues.Select(v => $"{v.Key} {ShownUnit.Of(document, v.Key).Text(v.Value)}"));

    /// <summary>The circuit-form key in the file from which a model parameter is computed, e.g. ec from capacitance.</summary>
    private static string? DerivedFrom(DeviceDocument document, Element element, string name)
    {
        string id = element.Id;
        foreach (var key in ElementKindCatalog.Of(element).CircuitFormsOf(name))
            if (document.ValueTextOf($"elements.{id}.{key}") is not null) return "from " + key;
        if (name == "ec" && document.ValueTextOf("capacitance_matrix.nodes") is not null) return "from [capacitance_matrix]";
        return null;
    }

    private static string ControlUnitHint(BiasDefinition bias) =>
        bias.ControlKind == UnitKind.Dimensionless ? ", a plain number" : $", {bias.ControlKind.WithArticle()} such as {bias.ControlKind.ExampleText()}";

    /// <param name="here">The couplers as resolved at the point last computed (for the fixed coefficient and g here), if any.</param>
    public static IReadOnlyList<FieldRow> Fields(DeviceDocument document, BoardNode node, IReadOnlyList<ResolvedCoupler>? here = null)
    {
        var device = document.Device;
        switch (node.Kind)
        {
            case BoardNodeKind.Element:
            {
                var element = device.Element(node.Id);
                var rows = new List<FieldRow> { new("kind", ElementKindCatalog.Of(element).Name, null, "") };
                var fileKeys = ElementKindCatalog.Of(element).FileKeys;
                foreach (var (name, value) in element.Parameters)
                {
                    var kind = ParameterKinds.Of(name);
                    string path = $"elements.{element.Id}.{name}";
                    string shown = ParameterText.Display(value, kind);
                    // The file's biases override element values: show where the value comes from and edit the bias.
                    if (document.Biases.FirstOrDefault(b => b.Target == $"{element.Id}.{name}") is { } bias)
                        rows.Add(new FieldRow(name, shown, $"biases.{bias.Name}.value",
                            $"sets {bias.Target} through bias {bias.Name}; control value{ControlUnitHint(bias)}",
                            QuantityFormatter.Format(bias.Value, bias.ControlKind), Note: $"← bias {bias.Name}", ShortNote: $"← {bias.Name}"));
                    else if (document.ValueTextOf(path) is string written)
                        rows.Add(new FieldRow(name, shown, path, kind.ExampleText(), written));
                    else if (DerivedFrom(document, element, name) is string source)
                        rows.Add(new FieldRow(name, shown, null, "", Note: $"({source})", ShortNote: ""));
                    else if (fileKeys.Contains(name))
                        rows.Add(new FieldRow(name, shown, path, kind.ExampleText() + " (not in the file yet: the edit adds it)"));
                    else
                        rows.Add(new FieldRow(name, shown, null, ""));
                }
                // Values the file gives in circuit form (capacitance, junction currents or resistances, inductance).
                foreach (var key in fileKeys.Where(k => k is not ("kind" or "levels") && !element.Parameters.ContainsKey(k)))
                    if (document.ValueTextOf($"elements.{element.Id}.{key}") is string text && !text.StartsWith('['))
                        rows.Add(new FieldRow(key, text, $"elements.{element.Id}.{key}", ParameterKinds.Of(key).ExampleText()));
                // kept levels and the basis size are edited like any value; the file gains the key when it lacks it
                var kindInfo = ElementKindCatalog.Of(element);
                string levelsPath = $"elements.{element.Id}.levels";
                rows.Add(new FieldRow("levels", device.Truncation.LevelsOf(element.Id).ToString(), levelsPath,
                    element.MaxLevels is int most ? $"bare levels kept, 2 … {most}" : "bare levels kept, a whole number ≥ 2",
                    Note: document.ValueTextOf(levelsPath) is null ? "([truncation] default_levels)" : null, ShortNote: ""));
                if (kindInfo.MaxBasisSize is int largest)
                {
                    string basisPath = $"elements.{element.Id}.basis_size";
                    string? basis = document.ValueTextOf(basisPath);
                    rows.Add(new FieldRow("basis_size", basis ?? "auto", basisPath,
                        $"natural basis size, 3 … {largest} (leave the key out to grow it until the kept levels converge)", EditText: basis ?? ""));
                }
                rows.Add(new FieldRow("operators", string.Join(" ", element.OperatorNames), null, ""));
                return rows;
            }
            case BoardNodeKind.Coupler:
            {
                var c = device.Couplers.First(x => x.Id == node.Id);
                var rows = new List<FieldRow>
                {
                    new("kind", CouplerKindInfo.Of(c.Kind).Name, null, ""),
                    new("links", $"{c.ElementA}.{c.OperatorA} · {c.ElementB}.{c.OperatorB}", null, ""),
                    new("form", c.Form == CouplerForm.Exchange ? "exchange (rotating wave)" : "full", null, ""),
                };
                var (name, value, unit) = c.Strength switch
                {
                    CouplingStrength.Coefficient k => ("coefficient", k.GHz, UnitKind.Frequency),
                    CouplingStrength.TargetG g => ("g", g.GHz, UnitKind.Frequency),
                    CouplingStrength.Capacitance f => ("capacitance", f.Farad, UnitKind.Capacitance),
                    _ => ("strength", double.NaN, UnitKind.Dimensionless),
                };
                string strengthPath = $"couplers.{c.Id}.{name}";
                rows.Add(document.ValueTextOf(strengthPath) is string written
                    ? new FieldRow(name, ParameterText.Display(value, unit), strengthPath, unit.ExampleText(), written)
                    : new FieldRow(name, ParameterText.Display(value, unit), null, "", Note: "(from [capacitance_matrix])", ShortNote: ""));
                if (here?.FirstOrDefault(r => r.Id == c.Id) is ResolvedCoupler resolved)
                {
                    // the coefficient is fixed hardware; g follows the elements' matrix elements at this point
                    string at = resolved.ConvertedAt is { } point ? $"(g converted at the {point.PointName} point)" : "";
                    rows.Add(new FieldRow("coefficient", ParameterText.Display(resolved.CoefficientGHz, UnitKind.Frequency), null, "", Note: at, ShortNote: ""));
                    rows.Add(new FieldRow("g here", ParameterText.Display(resolved.GHereGHz, UnitKind.Frequency), null, "", Note: "(at the point computed)", ShortNote: ""));
                }
                return rows;
            }
            case BoardNodeKind.Bias:
            {
                var b = document.Biases.First(x => x.Name == node.Id);
                return
                [
                    new("target", b.Target, null, ""),
                    new("value", QuantityFormatter.Format(b.Value, b.ControlKind), $"biases.{b.Name}.value", "control value" + ControlUnitHint(b)),
                    new("period", QuantityFormatter.Format(b.Period, b.ControlKind), $"biases.{b.Name}.period", "control per unit of the target"),
                    new("offset", QuantityFormatter.Format(b.Offset, b.ControlKind), $"biases.{b.Name}.offset", "control value at target zero"),
                    new("sets", $"{b.Target} = {ParameterText.Format(b.ToParameter(b.Value), ParameterKinds.Of(b.Target[(b.Target.LastIndexOf('.') + 1)..]))}", null, ""),
                ];
            }
            case BoardNodeKind.Point:
            {
                var point = document.Points.First(x => x.Name == node.Id);
                var rows = new List<FieldRow>();
                foreach (var (name, value) in point.BiasValues)
                {
                    var bias = document.Bias(name)!;
                    rows.Add(new FieldRow(name, ShownUnit.Of(document, name).Text(value), $"points.{point.Name}.{name}",
                        "control value" + ControlUnitHint(bias), Note: $"→ {bias.Target}", ShortNote: ""));
                }
                return rows;
            }
            case BoardNodeKind.Device:
            {
                var t = device.Truncation;
                return
                [
                    new("name", device.Name, null, ""),
                    new("file", document.Path, null, ""),
                    new("levels each", t.DefaultLevels.ToString(), "truncation.default_levels", "bare levels kept per element, a whole number ≥ 2"),
                    new("max excitations", t.MaxExcitations?.ToString() ?? "none", "truncation.max_excitations",
                        "keep product states with at most this many excitations, a whole number ≥ 1", EditText: t.MaxExcitations?.ToString() ?? ""),
                    new("max bare energy", t.MaxBareEnergyGHz is double e ? ParameterText.Format(e, UnitKind.Frequency) : "none", "truncation.max_bare_energy",
                        "keep product states below this bare energy, " + UnitKind.Frequency.ExampleText(), EditText: t.MaxBareEnergyGHz is null ? "" : null),
                    new("purity threshold", document.PurityThreshold.ToString("0.###", System.Globalization.CultureInfo.InvariantCulture), "device.purity_threshold",
                        "below this purity a result's labels count as hybridized, 0 … 1"),
                    new("operating points", string.Join(", ", document.Points.Select(p => p.Name)), null, ""),
                    new("sweeps", string.Join(", ", document.Sweeps.Select(s => s.Name)), null, ""),
                ];
            }
            default:
                return [];
        }
    }
}
