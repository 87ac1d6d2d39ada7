namespace LevelDesign.Core.Units;

/// <summary>
/// Writes a base-unit value (GHz, F, H, A, Ω, V, s, Φ0 or 1) as readable text that
/// <see cref="QuantityParser"/> reads back. The value is first rounded to 12 significant digits;
/// the prefix is then applied by moving the decimal exponent, so no floating-point noise appears
/// ("85 MHz", never "84.99999999999999 MHz") and values with ≤12 digits round-trip exactly.
/// </summary>
public static class QuantityFormatter
{
    /// <summary>Significant digits written; enough for any designed value, few enough to hide binary rounding.</summary>
    public const int SignificantDigits = 12;

    /// <summary>
    /// Formats <paramref name="baseValue"/> of <paramref name="kind"/>. With <paramref name="preferredUnitText"/>
    /// (e.g. "MHz", "kOhm", "meV") that unit is used; it must belong to <paramref name="kind"/>.
    /// Without it an engineering prefix is chosen (mantissa in [1, 1000)); flux is written in Φ0 and
    /// plain numbers without a unit.
    /// </summary>
    public static string Format(double baseValue, UnitKind kind, string? preferredUnitText = null)
    {
        if (!double.IsFinite(baseValue))
            throw new ArgumentOutOfRangeException(nameof(baseValue), baseValue, "only finite values can be formatted");

        if (!string.IsNullOrEmpty(preferredUnitText))
        {
            if (!UnitCatalog.TryResolve(preferredUnitText, out var prefix, out var unit))
                throw new ArgumentException($"unknown unit \"{preferredUnitText}\"", nameof(preferredUnitText));
            if (unit.Kind != kind)
                throw new ArgumentException(
                    $"unit \"{preferredUnitText}\" is for {unit.Kind.WithArticle()}, not {kind.WithArticle()}",
                    nameof(preferredUnitText));
            return Write(baseValue, unit, prefix, preferredUnitText);
        }

        var defaultUnit = UnitCatalog.DefaultFor(kind);
        if (defaultUnit is null)
            return DecimalNumber.FromDouble(baseValue, SignificantDigits).ToText(0);

        if (kind == UnitKind.Flux)
            return Write(baseValue, defaultUnit, SiPrefix.None, defaultUnit.CanonicalSymbol);

        var rounded = DecimalNumber.FromDouble(baseValue, SignificantDigits);
        if (rounded.IsZero)
        {
            // Zero has no magnitude to pick a prefix from; use the base unit (GHz for frequency).
            var basePrefix = SiPrefix.ForOutput(-defaultUnit.BaseExponent) ?? SiPrefix.None;
            return Write(0.0, defaultUnit, basePrefix, basePrefix.Symbol + defaultUnit.CanonicalSymbol);
        }

        // Power of ten of the leading digit, measured in the unprefixed unit (Hz rather than GHz).
        long leading = rounded.Exponent + rounded.Digits.Length - 1 - defaultUnit.BaseExponent;
        int engineering = (int)Math.Clamp(FloorToMultipleOfThree(leading), -15, 12);
        var chosen = SiPrefix.ForOutput(engineering)!;
        return Write(baseValue, defaultUnit, chosen, chosen.Symbol + defaultUnit.CanonicalSymbol);
    }

    private static string Write(double baseValue, UnitDefinition unit, SiPrefix prefix, string unitText)
    {
        // Non-decimal units (eV) need one real division; decimal ones are shifted exactly below.
        double inUnit = unit.IsDecimal ? baseValue : baseValue / unit.NonDecimalFactor;
        var rounded = DecimalNumber.FromDouble(inUnit, SignificantDigits);
        long shift = -(prefix.Exponent + unit.BaseExponent);
        return rounded.ToText(shift) + " " + unitText;
    }

    private static long FloorToMultipleOfThree(long x) => 3 * (long)Math.Floor(x / 3.0);
}
