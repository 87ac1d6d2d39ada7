using System.Globalization;

namespace LevelDesign.Core.Presentation;

/// <summary>CSV cells: numbers in full precision (invariant culture, empty when not finite), text quoted when needed.</summary>
public static class CsvCells
{
    public static string Number(double x) => double.IsFinite(x) ? x.ToString("R", CultureInfo.InvariantCulture) : "";

    public static string Text(string s) => s.IndexOfAny([',', '"', '\n', '\r', ';']) >= 0 ? "\"" + s.Replace("\"", "\"\"") + "\"" : s;
}
