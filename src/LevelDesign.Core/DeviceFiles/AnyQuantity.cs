using System.Globalization;
using LevelDesign.Core.DeviceFiles.Source;
using LevelDesign.Core.Units;

namespace LevelDesign.Core.DeviceFiles;

/// <summary>A control value whose kind is set by its unit: a plain number, or e.g. "2.1 mA" or "0.4 V".</summary>
public static class AnyQuantity
{
    private static readonly UnitKind[] Order =
        [UnitKind.Dimensionless, UnitKind.Flux, UnitKind.Current, UnitKind.Voltage, UnitKind.Frequency, UnitKind.Capacitance, UnitKind.Inductance, UnitKind.Resistance, UnitKind.Time];

    public static bool TryParse(string text, out double value, out UnitKind kind)
    {
        foreach (var k in Order)
            if (QuantityParser.TryParse(text, k, out value, out _)) { kind = k; return true; }
        value = 0;
        kind = UnitKind.Dimensionless;
        return false;
    }

    public static string? TextOf(SourceValue v) => v.Kind switch
    {
        SourceValueKind.String => v.Text,
        SourceValueKind.Integer or SourceValueKind.Float => v.Number.ToString("R", CultureInfo.InvariantCulture),
        _ => null,
    };
}
