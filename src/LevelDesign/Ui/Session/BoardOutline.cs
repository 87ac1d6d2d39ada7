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
            nodes.Add(new BoardNode(BoardNodeKind.Element, e.Id, 2, $"{e.Id}  {ElementKinds.Key(e.Kind)}"));
        nodes.Add(new BoardNode(BoardNodeKind.Group, "couplers", 1, $"couplers ({device.Couplers.Count})"));
        foreach (var c in device.Couplers)
            nodes.Add(new BoardNode(BoardNodeKind.Coupler, c.Id, 2, $"{c.Id}  {c.ElementA}–{c.ElementB}"));
        nodes.Add(new BoardNode(BoardNodeKind.Group, "biases", 1, $"biases ({document.Biases.Count})"));
        foreach (var b in document.Biases)
            nodes.Add(new BoardNode(BoardNodeKind.Bias, b.Name, 2, $"{b.Name} → {b.Target}"));
        return nodes;
    }

    public static IReadOnlyList<FieldRow> Fields(DeviceDocument document, BoardNode node)
    {
        var device = document.Device;
        switch (node.Kind)
        {
            case BoardNodeKind.Element:
            {
                var element = device.Element(node.Id);
                var rows = new List<FieldRow> { new("kind", ElementKinds.Key(element.Kind), null, "") };
                foreach (var (name, value) in element.Parameters)
                {
                    var kind = FieldUnits.Of(name);
                    rows.Add(new FieldRow(name, FieldUnits.Format(value, kind), $"elements.{element.Id}.{name}", kind.ExampleText()));
                }
                rows.Add(new FieldRow("levels kept", device.Truncation.LevelsOf(element.Id).ToString(), null, ""));
                rows.Add(new FieldRow("operators", string.Join(" ", element.OperatorNames), null, ""));
                return rows;
            }
            case BoardNodeKind.Coupler:
            {
                var c = device.Couplers.First(x => x.Id == node.Id);
                var rows = new List<FieldRow>
                {
                    new("kind", c.Kind.ToString().ToLowerInvariant(), null, ""),
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
                rows.Add(new FieldRow(name, FieldUnits.Format(value, unit), $"couplers.{c.Id}.{name}", unit.ExampleText()));
                return rows;
            }
            case BoardNodeKind.Bias:
            {
                var b = document.Biases.First(x => x.Name == node.Id);
                return
                [
                    new("target", b.Target, null, ""),
                    new("value", FieldUnits.Format(b.Value, UnitKind.Dimensionless), $"biases.{b.Name}.value", "control value, e.g. \"0.25\""),
                    new("period", FieldUnits.Format(b.Period, UnitKind.Dimensionless), $"biases.{b.Name}.period", "control units per Φ0"),
                    new("offset", FieldUnits.Format(b.Offset, UnitKind.Dimensionless), $"biases.{b.Name}.offset", "control value at zero"),
                ];
            }
            case BoardNodeKind.Device:
            {
                var t = device.Truncation;
                return
                [
                    new("name", device.Name, null, ""),
                    new("file", document.Path, null, ""),
                    new("levels each", t.DefaultLevels.ToString(), null, ""),
                    new("max excitations", t.MaxExcitations?.ToString() ?? "none", null, ""),
                    new("max bare energy", t.MaxBareEnergyGHz is double e ? FieldUnits.Format(e, UnitKind.Frequency) : "none", null, ""),
                    new("operating points", string.Join(", ", document.Points.Select(p => p.Name)), null, ""),
                    new("sweeps", string.Join(", ", document.Sweeps.Select(s => s.Name)), null, ""),
                ];
            }
            default:
                return [];
        }
    }
}
