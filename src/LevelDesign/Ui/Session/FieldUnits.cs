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
        "ic" or "ic1" or "ic2" => UnitKind.Current,
        "rn" or "rn1" or "rn2" => UnitKind.Resistance,
        "inductance" => UnitKind.Inductance,
        _ => UnitKind.Frequency,
    };

    /// <summary>Digits shown in the form; the file keeps whatever was typed.</summary>
    public const int DisplayDigits = 6;

    /// <summary>A value for reading: rounded to <see cref="DisplayDigits"/> significant digits.</summary>
    public static string Display(double value, UnitKind kind, int digits = DisplayDigits)
    {
        if (!double.IsFinite(value) || value == 0) return Format(value, kind);
        double scale = Math.Pow(10, digits - 1 - (int)Math.Floor(Math.Log10(Math.Abs(value))));
        return Format(Math.Round(value * scale) / scale, kind);
    }

    public static string Format(double value, UnitKind kind) =>
        double.IsFinite(value) ? QuantityFormatter.Format(value, kind) : value.ToString(System.Globalization.CultureInfo.InvariantCulture);
}
