using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Units;

namespace LevelDesign.Core.DeviceFiles;

/// <summary>
/// Where a fitted device parameter ("qa.ej_sum", "qa_qb.g") is written in the file ("elements.qa.ej_sum",
/// "couplers.qa_qb.g") and in which unit. A parameter the file does not write directly (given as ej1/ej2,
/// a capacitance, a capacitance matrix) or that a bias sets has a refusal instead: writing it would change the
/// device in another way than the fit did.
/// </summary>
public sealed record FitField(string DevicePath, UnitKind Kind, string? FieldPath, string UnitText, string? Refusal)
{
    /// <summary>Keys that give the same physical quantity another way, named in the refusal.</summary>
    private static readonly string[] OtherForms = [.. Kinds.ElementKindCatalog.CircuitFormKeys, "g", "coefficient"];

    public static FitField Of(DeviceDocument document, string devicePath)
    {
        int dot = devicePath.LastIndexOf('.');
        string owner = devicePath[..dot], key = devicePath[(dot + 1)..];
        var kind = ParameterKinds.Of(key);
        string table = document.Device.IndexOf(owner) >= 0 ? "elements" : "couplers";
        if (table == "couplers" && key == "capacitance") kind = UnitKind.Capacitance;
        string field = $"{table}.{owner}.{key}";
        if (document.Biases.FirstOrDefault(b => b.Target == devicePath) is BiasDefinition bias)
            return new FitField(devicePath, kind, null, "", $"{devicePath} is set by bias '{bias.Name}' at every point; fit a bias value by hand (biases.{bias.Name}.value) instead");
        string? text = document.ValueTextOf(field);
        if (text is null)
        {
            var present = OtherForms.Where(k => document.ValueTextOf($"{table}.{owner}.{k}") is not null).ToArray();
            string how = present.Length > 0 ? $"it is given there by {string.Join(", ", present)}" : "it comes from elsewhere (e.g. [capacitance_matrix])";
            return new FitField(devicePath, kind, null, "", $"{document.Path} does not write {field}: {how}; --write would need a conversion, so it is refused (the fitted value is still reported)");
        }
        if (!QuantityParser.TryParseQuantity(text, kind, out var quantity, out string error))
            return new FitField(devicePath, kind, null, "", $"{field} = \"{text}\" cannot be read back as {kind}: {error}");
        return new FitField(devicePath, kind, field, quantity.UnitText, null);
    }

    /// <summary>The value written as the file writes this field: same unit, or a plain number where the file has one.</summary>
    public string Format(double value) =>
        UnitText.Length > 0 ? QuantityFormatter.Format(value, Kind, UnitText) : QuantityFormatter.Format(value, UnitKind.Dimensionless);

    /// <summary>For reports: in the file's unit when known, otherwise with a readable prefix.</summary>
    public string Display(double value) =>
        FieldPath is null ? QuantityFormatter.Format(value, Kind) : UnitText.Length > 0 ? Format(value) : Format(value) + BareUnit();

    private string BareUnit() => Kind switch { UnitKind.Frequency => " (GHz)", UnitKind.Flux => " (Φ0)", _ => "" };
}
