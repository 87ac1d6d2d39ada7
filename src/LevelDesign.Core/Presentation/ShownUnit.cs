using System.Globalization;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Units;

namespace LevelDesign.Core.Presentation;

/// <summary>
/// The unit a control or parameter value is shown in by every table, export, page and plot axis: the unit the device
/// file writes that value in (a coil current typed "0.15 mA" is shown in mA everywhere), else the kind's plain unit
/// (GHz, Φ0). Values inside the engine stay in base units; this converts at the edge only.
/// </summary>
public sealed record ShownUnit(UnitKind Kind, string Symbol, double BasePerUnit)
{
    /// <summary>Significant digits of a control value shown for reading (enough to tell sweep points apart).</summary>
    public const int ReadingDigits = 6;

    public static readonly ShownUnit Plain = new(UnitKind.Dimensionless, "", 1);

    /// <summary>The unit of a sweep axis, bias or parameter path of <paramref name="document"/>.</summary>
    public static ShownUnit Of(DeviceDocument? document, string path)
    {
        if (document?.Bias(path) is BiasDefinition bias)
        {
            if (bias.ControlKind != UnitKind.Dimensionless)
                return FromText(document.ValueTextOf($"biases.{path}.value"), bias.ControlKind) ?? Default(bias.ControlKind);
            // a plain-number control moves its target in the target's own unit (Φ0 for a flux)
            return Default(ParameterKinds.OfPath(bias.Target));
        }
        var kind = ParameterKinds.OfPath(path);
        string? written = document?.ValueTextOf("elements." + path) ?? document?.ValueTextOf("couplers." + path);
        return FromText(written, kind) ?? Default(kind);
    }

    /// <summary>The kind's own unit: GHz for frequencies, Φ0 for flux, the unprefixed SI unit otherwise.</summary>
    public static ShownUnit Default(UnitKind kind) => kind switch
    {
        UnitKind.Dimensionless => Plain,
        UnitKind.Frequency => new(kind, "GHz", 1),
        _ => UnitCatalog.DefaultFor(kind) is { } u ? new(kind, u.CanonicalSymbol, Math.Pow(10, u.BaseExponent)) : Plain,
    };

    /// <summary>The unit written after the number in <paramref name="text"/> ("0.15 mA" → mA), if it is of <paramref name="kind"/>.</summary>
    public static ShownUnit? FromText(string? text, UnitKind kind)
    {
        if (string.IsNullOrWhiteSpace(text)) return null;
        string t = text.Trim().Trim('"');
        int end = 0;
        while (end < t.Length && (char.IsAsciiDigit(t[end]) || t[end] is '.' or '+' or '-' or '_'
               || (t[end] is 'e' or 'E' && end + 1 < t.Length && (char.IsAsciiDigit(t[end + 1]) || t[end + 1] is '+' or '-'))))
            end++;
        string symbol = t[end..].Trim();
        if (symbol.Length == 0 || !UnitCatalog.TryResolve(symbol, out var prefix, out var unit) || unit.Kind != kind) return null;
        string canonical = prefix.Symbol is "u" or "\u03BC" ? "\u00B5" : prefix.Symbol;
        return new ShownUnit(kind, canonical + unit.CanonicalSymbol, Math.Pow(10, prefix.Exponent + unit.BaseExponent) * unit.NonDecimalFactor);
    }

    /// <summary>A base-unit value in this unit, rounded to 12 significant digits so 0.00015 A reads 0.15 mA exactly.</summary>
    public double ToShown(double baseValue) =>
        double.IsFinite(baseValue) && baseValue != 0 ? Round(baseValue / BasePerUnit, 12) : baseValue / BasePerUnit;

    public double FromShown(double shown) => shown * BasePerUnit;

    /// <summary>"qc_flux (mA)", or the name alone for plain numbers.</summary>
    public string Caption(string name) => Symbol.Length == 0 ? name : $"{name} ({Symbol})";

    /// <summary>A value for reading: <paramref name="digits"/> significant digits and the symbol ("0.687310 mA" → "0.68731 mA").</summary>
    public string Text(double baseValue, int digits = ReadingDigits)
    {
        if (!double.IsFinite(baseValue)) return "—";
        string number = Round(ToShown(baseValue), digits).ToString("G" + digits, CultureInfo.InvariantCulture);
        if (number.Contains('E')) number = Round(ToShown(baseValue), digits).ToString("0.#################", CultureInfo.InvariantCulture);
        return Symbol.Length == 0 ? number : $"{number} {Symbol}";
    }

    /// <summary>A number for tables and files in this unit, full precision (round-trip).</summary>
    public string Number(double baseValue) =>
        double.IsFinite(baseValue) ? ToShown(baseValue).ToString("R", CultureInfo.InvariantCulture) : "";

    private static double Round(double value, int digits)
    {
        if (value == 0 || !double.IsFinite(value)) return value;
        return double.Parse(value.ToString("G" + digits, CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);
    }
}
