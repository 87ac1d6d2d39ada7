using System.Text.Json.Nodes;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Units;

namespace LevelDesign.Output;

/// <summary>Says in which unit an axis value is written (control values are in the base unit of the bias's kind).</summary>
public static class AxisUnitText
{
    public static string BaseUnit(UnitKind kind) => kind switch
    {
        UnitKind.Frequency => "GHz",
        UnitKind.Flux => "Φ0",
        UnitKind.Current => "A",
        UnitKind.Voltage => "V",
        UnitKind.Capacitance => "F",
        UnitKind.Inductance => "H",
        UnitKind.Resistance => "Ω",
        UnitKind.Time => "s",
        _ => "",
    };

    /// <summary>The unit of values of a bias (its control unit) or parameter path (its own base unit).</summary>
    public static string Of(DeviceDocument document, string name) =>
        document.Bias(name) is BiasDefinition bias
            ? bias.ControlKind == UnitKind.Dimensionless ? BaseUnit(ParameterKinds.Of(ParameterName(bias.Target))) : BaseUnit(bias.ControlKind)
            : BaseUnit(ParameterKinds.Of(ParameterName(name)));

    /// <summary>The parameter a bias or path moves, and the value of that parameter for a control value.</summary>
    public static (string Path, double Value) Parameter(DeviceDocument document, string name, double value) =>
        document.Bias(name) is BiasDefinition bias ? (bias.Target, bias.ToParameter(value)) : (name, value);

    public static JsonObject Describe(DeviceDocument document, SweepAxis axis)
    {
        var o = new JsonObject
        {
            ["vary"] = axis.Path,
            ["unit"] = Of(document, axis.Path),
            ["start"] = axis.Start,
            ["stop"] = axis.Stop,
            ["count"] = axis.Count,
        };
        if (document.Bias(axis.Path) is BiasDefinition bias)
            o["bias"] = new JsonObject
            {
                ["target"] = bias.Target, ["period"] = bias.Period, ["offset"] = bias.Offset,
                ["mapping"] = "parameter = (control − offset) / period",
            };
        o["links"] = new JsonArray(axis.Links.Select(l => (JsonNode)new JsonObject
        {
            ["path"] = l.Path, ["scale"] = l.Scale, ["shift"] = l.Shift, ["unit"] = Of(document, l.Path),
            ["rule"] = "value = scale·axis + shift (base units)",
        }).ToArray());
        return o;
    }

    private static string ParameterName(string path) => path[(path.LastIndexOf('.') + 1)..];
}
