using LevelDesign.Core.Units;

namespace LevelDesign.Ui.Session;

/// <summary>Which unit kind each parameter symbol holds, so the form shows and accepts the file's unit syntax.</summary>
public static class FieldUnits
{
    public static UnitKind Of(string parameter) => parameter switch
    {
        "flux" => UnitKind.Flux,
        "ng" or "asymmetry" or "value" or "period" or "offset" => UnitKind.Dimensionless,
        "capacitance" => UnitKind.Capacitance,
        _ => UnitKind.Frequency,
    };

    public static string Format(double value, UnitKind kind) =>
        double.IsFinite(value) ? QuantityFormatter.Format(value, kind) : value.ToString(System.Globalization.CultureInfo.InvariantCulture);
}
