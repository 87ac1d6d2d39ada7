using System.Globalization;

namespace LevelDesign.Core.Presentation;

/// <summary>
/// Times (T1, T2, T_φ limits) for reading: three significant digits — they are model estimates, to be confirmed by
/// measurement — with the prefix that puts the number in [1, 1000): "39.6 µs", "3.32 ms", "1.20 s".
/// </summary>
public static class DurationText
{
    private static readonly (string Unit, double Seconds)[] Prefixes = [("s", 1), ("ms", 1e-3), ("µs", 1e-6), ("ns", 1e-9)];

    public static string Format(double seconds)
    {
        if (double.IsPositiveInfinity(seconds)) return "no limit";
        if (!double.IsFinite(seconds)) return "—";
        double magnitude = Math.Abs(seconds);
        if (magnitude >= 1000) return seconds.ToString("0", CultureInfo.InvariantCulture) + " s";
        var (unit, scale) = Prefixes.FirstOrDefault(p => magnitude >= p.Seconds, Prefixes[^1]);
        double value = seconds / scale;
        int decimals = Math.Abs(value) >= 100 ? 0 : Math.Abs(value) >= 10 ? 1 : 2;
        return value.ToString("F" + decimals, CultureInfo.InvariantCulture) + " " + unit;
    }
}
