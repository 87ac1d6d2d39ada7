using System.Globalization;

namespace LevelDesign.Ui.Text;

/// <summary>Fixed-width numbers for tables (invariant culture).</summary>
public static class Numbers
{
    public static string GHz(double value, int decimals = 4) =>
        double.IsFinite(value) ? value.ToString("F" + decimals, CultureInfo.InvariantCulture) : "—";

    public static string MHz(double ghz, int decimals = 3) =>
        double.IsFinite(ghz) ? (ghz * 1000).ToString("F" + decimals, CultureInfo.InvariantCulture) : "—";

    public static string Plain(double value, int decimals = 4) =>
        double.IsFinite(value) ? value.ToString("F" + decimals, CultureInfo.InvariantCulture) : "—";
}
