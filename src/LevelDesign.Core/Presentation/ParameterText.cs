using LevelDesign.Core.Units;

namespace LevelDesign.Core.Presentation;

/// <summary>
/// A model parameter's value for reading (forms, board, status lines): rounded to a few significant digits, with the
/// engineering prefix the value's size calls for ("210 MHz", "85 fF"). The file keeps whatever was typed.
/// </summary>
public static class ParameterText
{
    /// <summary>Digits shown in forms and messages.</summary>
    public const int DisplayDigits = 6;

    public static string Display(double value, UnitKind kind, int digits = DisplayDigits)
    {
        if (!double.IsFinite(value) || value == 0) return Format(value, kind);
        double scale = Math.Pow(10, digits - 1 - (int)Math.Floor(Math.Log10(Math.Abs(value))));
        return Format(Math.Round(value * scale) / scale, kind);
    }

    /// <summary>Exactly (12 significant digits, reads back to the same number).</summary>
    public static string Format(double value, UnitKind kind) =>
        double.IsFinite(value) ? QuantityFormatter.Format(value, kind) : value.ToString(System.Globalization.CultureInfo.InvariantCulture);
}
