using System.Globalization;

namespace LevelDesign.Core.Presentation;

/// <summary>
/// The one rule for writing a frequency-valued result (level, transition, α, g, 2χ, ZZ, J_eff, rates in GHz): the SI
/// prefix that puts the number in [1, 1000), and as many decimals as the quantity's resolution allows — so ZZ reads
/// "-9.335818 MHz" or "-11.975 kHz", never "-9335.818 kHz", and a level "5.123457 GHz".
/// </summary>
public static class FrequencyText
{
    /// <summary>Levels, transitions, anharmonicities, couplings: 1 kHz (far below any model uncertainty).</summary>
    public const double LevelResolutionGHz = 1e-6;

    /// <summary>Small shifts (2χ, ZZ, J_eff, Purcell rates): 1 Hz, the engine's agreement with an independent rebuild.</summary>
    public const double ShiftResolutionGHz = 1e-9;

    private static readonly (string Unit, double GHz)[] Prefixes = [("GHz", 1), ("MHz", 1e-3), ("kHz", 1e-6), ("Hz", 1e-9)];

    /// <summary>The resolution for a named quantity: shifts (zz, chi2, jeff, purcell) to 1 Hz, everything else to 1 kHz.</summary>
    public static double ResolutionOf(string quantity)
    {
        string q = quantity.TrimStart();
        return q.StartsWith("zz", StringComparison.Ordinal) || q.StartsWith("chi", StringComparison.Ordinal)
               || q.StartsWith("jeff", StringComparison.Ordinal) || q.Contains("purcell", StringComparison.Ordinal)
            ? ShiftResolutionGHz : LevelResolutionGHz;
    }

    public static string Format(double ghz, double resolutionGHz = LevelResolutionGHz)
    {
        if (!double.IsFinite(ghz)) return "—";
        double magnitude = Math.Abs(ghz);
        var (unit, scale) = Prefixes.FirstOrDefault(p => magnitude >= p.GHz, Prefixes[^1]);
        // decimals so that one unit of the last digit is the resolution (none below the resolution's own unit)
        int decimals = Math.Max(0, (int)Math.Round(Math.Log10(scale / resolutionGHz)));
        double rounded = Math.Round(ghz / scale, decimals);
        if (rounded == 0) return "0 " + (resolutionGHz >= 1e-6 ? "kHz" : "Hz");
        return rounded.ToString("F" + decimals, CultureInfo.InvariantCulture) + " " + unit;
    }

    /// <summary>Four significant digits with the prefix ("178.5 MHz", "-52.80 kHz"), for axis ticks.</summary>
    public static string Short(double ghz)
    {
        if (!double.IsFinite(ghz)) return "—";
        double magnitude = Math.Abs(ghz);
        var (unit, scale) = Prefixes.FirstOrDefault(p => magnitude >= p.GHz, Prefixes[^1]);
        double value = ghz / scale;
        int decimals = Math.Abs(value) >= 100 ? 1 : Math.Abs(value) >= 10 ? 2 : 3;
        return value.ToString("F" + decimals, CultureInfo.InvariantCulture) + " " + unit;
    }

    /// <summary>Same, for a named quantity (its resolution from its name).</summary>
    public static string Of(string quantity, double ghz) => Format(ghz, ResolutionOf(quantity));
}
