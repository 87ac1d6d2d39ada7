using System.Globalization;

namespace LevelDesign.Core.Units;

/// <summary>
/// Strict parser for one value with an optional SI-prefixed unit, checked against the field's kind.
/// Grammar: [sign] number [whitespace] [prefix unit], invariant culture, e.g. "5.1 GHz", "-0.2GHz",
/// "1.2e-3 eV", "8.5 kOhm". Prefixes: f p n µ/μ/u m k M G T. Units: Hz, eV (frequency, via E/h),
/// F, H, A, Ω/Ohm/ohm, V, s, Φ0/Phi0 (flux).
/// Results are in the kind's base unit: GHz for frequency, otherwise F, H, A, Ω, V, s, Φ0, or 1.
/// A bare number is accepted for frequency (meaning GHz, our energy scale), for flux (meaning Φ0)
/// and for plain numbers; any other kind requires a unit, because "92" alone is ambiguous.
/// Range checks belong to the caller: negative values parse.
/// </summary>
public static class QuantityParser
{
    /// <summary>Parses <paramref name="text"/>; on failure returns false and a one-line message saying what was expected.</summary>
    /// <summary>
    /// Largest magnitude accepted in a base unit (GHz, F, H, A, Ω, Φ0): far beyond any circuit, small enough that
    /// products in a Hamiltonian (E·n², E·cos, a sweep's stop − start) stay finite instead of turning into NaN.
    /// </summary>
    public const double MaxMagnitude = 1e15;

    /// <summary>As <see cref="TryParse"/>, and refuses magnitudes above <see cref="MaxMagnitude"/>: for values that reach a model.</summary>
    public static bool TryParseModelValue(string? text, UnitKind expected, out double valueInBaseUnit, out string error)
    {
        if (!TryParse(text, expected, out valueInBaseUnit, out error)) return false;
        if (Math.Abs(valueInBaseUnit) <= MaxMagnitude) return true;
        error = $"\"{text!.Trim()}\" is too large to compute with (magnitude above {MaxMagnitude:0e0} in base units: GHz, Φ0, F, H, A, Ω)";
        return false;
    }

    public static bool TryParse(string? text, UnitKind expected, out double valueInBaseUnit, out string error)
    {
        bool ok = TryParseQuantity(text, expected, out var quantity, out error);
        valueInBaseUnit = ok ? quantity.BaseValue : 0.0;
        return ok;
    }

    /// <summary>As <see cref="TryParse"/>, also keeping the unit text as typed (e.g. "MHz") for writing back.</summary>
    public static bool TryParseQuantity(string? text, UnitKind expected, out Quantity quantity, out string error)
    {
        quantity = default;
        error = "";
        string expectation = $"this field is {expected.WithArticle()} (expected e.g. {expected.ExampleText()})";

        if (string.IsNullOrWhiteSpace(text))
        {
            error = $"empty value; {expectation}";
            return false;
        }

        string s = text.Trim();
        if (LooksNonFinite(s))
        {
            error = $"\"{s}\" is not a finite number; {expectation}";
            return false;
        }

        if (!DecimalNumber.TryScan(s, out var number, out int consumed))
        {
            error = $"\"{s}\" does not start with a number; {expectation}";
            return false;
        }

        string rest = s[consumed..];
        if (rest.Length >= 2 && rest[0] == ',' && char.IsAsciiDigit(rest[1]))
        {
            // Decimal comma from a non-English locale; say exactly how to fix it.
            error = $"\"{s}\" uses a comma: write decimals with a point, e.g. \"{s[..consumed]}.{rest[1..]}\"";
            return false;
        }

        string unitText = rest.TrimStart();
        SiPrefix prefix;
        UnitDefinition? unit;
        if (unitText.Length == 0)
        {
            if (expected is not (UnitKind.Frequency or UnitKind.Flux or UnitKind.Dimensionless))
            {
                string typical = expected.TypicalUnit();
                error = $"\"{s}\" has no unit; this field is {expected.WithArticle()} and units are required (e.g. \"{s} {typical}\")";
                return false;
            }
            // Bare frequency means GHz and bare flux means Φ0: both are the base unit, so no scaling.
            prefix = SiPrefix.None;
            unit = null;
        }
        else if (!UnitCatalog.TryResolve(unitText, out prefix, out unit))
        {
            error = $"\"{s}\": unknown unit \"{unitText}\"; {expectation}" + Suggestion(unitText, expected);
            return false;
        }
        else if (unit.Kind != expected)
        {
            error = $"\"{s}\" is {unit.Kind.WithArticle()}, but {expectation}";
            return false;
        }

        double value;
        if (unit is null || unit.IsDecimal)
        {
            long shift = prefix.Exponent + (unit?.BaseExponent ?? 0);
            value = number.ToDouble(shift);
        }
        else
        {
            // eV: scale by the prefix exactly first, then apply e/h once.
            value = number.ToDouble(prefix.Exponent + unit.BaseExponent) * unit.NonDecimalFactor;
        }

        if (!double.IsFinite(value))
        {
            error = $"\"{s}\" is out of range; {expectation}";
            return false;
        }

        if (value == 0 && !number.IsZero)
        {
            error = $"\"{s}\" is too small to represent; {expectation}";
            return false;
        }

        // Avoid a "-0" that would later print as a negative zero.
        quantity = new Quantity(value == 0 ? 0.0 : value, expected, unitText);
        return true;
    }

    /// <summary>Parses or throws <see cref="FormatException"/> carrying the same message as <see cref="TryParse"/>.</summary>
    public static double Parse(string text, UnitKind expected) =>
        TryParse(text, expected, out double value, out string error) ? value : throw new FormatException(error);

    private static bool LooksNonFinite(string s)
    {
        string body = s.TrimStart('+', '-');
        return body.StartsWith("nan", StringComparison.OrdinalIgnoreCase)
            || body.StartsWith("inf", StringComparison.OrdinalIgnoreCase)
            || body.StartsWith('∞');
    }

    private static string Suggestion(string unitText, UnitKind expected)
    {
        var matches = UnitCatalog.CaseInsensitiveMatches(unitText, expected);
        if (matches.Count == 0)
            return "";
        return " — did you mean " + string.Join(" or ", matches.Select(m => $"\"{m}\"")) + "? (units are case-sensitive)";
    }
}
