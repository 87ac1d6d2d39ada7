using System.Globalization;
using System.Text;

namespace LevelDesign.Core.Units;

/// <summary>
/// A number kept as decimal digits: value = ±<see cref="Digits"/> × 10^<see cref="Exponent"/>.
/// SI prefixes then only move the exponent, so "12 nH" becomes the digits "12" with exponent −9
/// and is converted to a double once, correctly rounded, giving exactly the literal 12e-9
/// (multiplying 12 × 1e-9 in doubles would give 1.2000000000000002e-8).
/// </summary>
internal readonly record struct DecimalNumber(bool Negative, string Digits, long Exponent)
{
    // Far beyond any double (which spans about 10^±324) but small enough to add exponents without overflow.
    private const long ExponentLimit = 100_000;

    /// <summary>True for zero (no significant digits).</summary>
    public bool IsZero => Digits.Length == 0;

    /// <summary>
    /// Reads the longest number at the start of <paramref name="text"/>: optional sign, digits with an
    /// optional point, optional exponent (e/E, optional sign, digits). ASCII digits only, invariant culture.
    /// Returns false when no digit is found, or when the exponent is absurdly long.
    /// </summary>
    public static bool TryScan(string text, out DecimalNumber number, out int consumed)
    {
        number = default;
        consumed = 0;
        int i = 0;
        bool negative = false;
        if (i < text.Length && (text[i] == '+' || text[i] == '-'))
        {
            negative = text[i] == '-';
            i++;
        }

        var digits = new StringBuilder();
        int fractionDigits = 0;
        bool sawDigit = false;
        while (i < text.Length && char.IsAsciiDigit(text[i]))
        {
            digits.Append(text[i++]);
            sawDigit = true;
        }
        if (i < text.Length && text[i] == '.')
        {
            i++;
            while (i < text.Length && char.IsAsciiDigit(text[i]))
            {
                digits.Append(text[i++]);
                fractionDigits++;
                sawDigit = true;
            }
        }
        if (!sawDigit)
            return false;

        long exponent = 0;
        // An 'e' counts as an exponent only when digits follow; otherwise it starts the unit (as in "5eV").
        if (i < text.Length && (text[i] == 'e' || text[i] == 'E'))
        {
            int j = i + 1;
            bool expNegative = false;
            if (j < text.Length && (text[j] == '+' || text[j] == '-'))
            {
                expNegative = text[j] == '-';
                j++;
            }
            int expStart = j;
            while (j < text.Length && char.IsAsciiDigit(text[j]))
                j++;
            if (j > expStart)
            {
                string expDigits = text[expStart..j].TrimStart('0');
                if (expDigits.Length > 9)
                    exponent = ExponentLimit; // saturate; reported as out of range by the caller
                else
                    exponent = expDigits.Length == 0 ? 0 : long.Parse(expDigits, CultureInfo.InvariantCulture);
                if (expNegative)
                    exponent = -exponent;
                i = j;
            }
        }

        number = Normalize(negative, digits.ToString(), exponent - fractionDigits);
        consumed = i;
        return true;
    }

    /// <summary>
    /// The value of <paramref name="value"/> rounded to <paramref name="significantDigits"/> digits,
    /// using .NET's exact ("E" format) rounding of the binary value, then stripped of trailing zeros.
    /// </summary>
    public static DecimalNumber FromDouble(double value, int significantDigits)
    {
        if (!double.IsFinite(value))
            throw new ArgumentOutOfRangeException(nameof(value), value, "value must be finite");
        if (value == 0)
            return new DecimalNumber(false, "", 0);
        // "E11" gives d.ddddddddddde+XXX: 12 significant digits.
        string s = value.ToString("E" + (significantDigits - 1).ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);
        int e = s.IndexOf('E');
        string mantissa = s[..e];
        long exponent = long.Parse(s[(e + 1)..], NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture);
        bool negative = mantissa.StartsWith('-');
        string digits = mantissa.TrimStart('-').Replace(".", "", StringComparison.Ordinal);
        return Normalize(negative, digits, exponent - (digits.Length - 1));
    }

    /// <summary>
    /// Correctly rounded double of this value × 10^<paramref name="shift"/>; may be ±∞ or 0 when out of range
    /// (callers check). .NET parses decimal strings with correct rounding, so no error is added here.
    /// </summary>
    public double ToDouble(long shift)
    {
        if (IsZero)
            return 0.0;
        long exponent = Math.Clamp(Exponent + shift, -ExponentLimit, ExponentLimit);
        string text = (Negative ? "-" : "") + Digits + "E" + exponent.ToString(CultureInfo.InvariantCulture);
        return double.Parse(text, NumberStyles.Float, CultureInfo.InvariantCulture);
    }

    /// <summary>
    /// Text of this value × 10^<paramref name="shift"/> in a form <see cref="TryScan"/> reads back exactly:
    /// positional for moderate magnitudes ("85", "0.031"), otherwise scientific ("1.5e-7").
    /// </summary>
    public string ToText(long shift)
    {
        if (IsZero)
            return "0";
        long exponent = Exponent + shift;
        int k = Digits.Length;
        long leading = exponent + k - 1; // power of ten of the first digit
        string sign = Negative ? "-" : "";
        if (leading >= -5 && leading < 15)
        {
            if (exponent >= 0)
                return sign + Digits + new string('0', (int)exponent);
            if (leading >= 0)
            {
                int split = (int)(leading + 1);
                return sign + Digits[..split] + "." + Digits[split..];
            }
            return sign + "0." + new string('0', (int)(-leading - 1)) + Digits;
        }
        string mantissa = k == 1 ? Digits : Digits[..1] + "." + Digits[1..];
        return sign + mantissa + "e" + leading.ToString(CultureInfo.InvariantCulture);
    }

    private static DecimalNumber Normalize(bool negative, string digits, long exponent)
    {
        digits = digits.TrimStart('0');
        if (digits.Length == 0)
            return new DecimalNumber(false, "", 0);
        int trailing = digits.Length - digits.TrimEnd('0').Length;
        return new DecimalNumber(negative, digits[..^trailing], Math.Clamp(exponent + trailing, -2 * ExponentLimit, 2 * ExponentLimit));
    }
}
