using System.Globalization;
using System.Text;

namespace LevelDesign.Core.Spread.Export;

/// <summary>Every sample as one CSV line: drawn values, deviations (σ units), rule figures, rule results, pass, reason.</summary>
public static class SpreadCsv
{
    public static string Write(SpreadStudyHeader header, IReadOnlyList<SampleOutcome> outcomes)
    {
        var b = new StringBuilder();
        b.AppendLine($"# spread study of {header.DeviceName} ({header.DevicePath}), seed {header.Seed}, {header.Samples} samples; values in base units (GHz, F, Φ0); 'dev' in units of the parameter's total sigma; rule figures in GHz (purities plain, root rules: the root's bias, empty: none)");
        var columns = new List<string> { "sample" };
        columns.AddRange(header.Parameters);
        columns.AddRange(header.Parameters.Select(p => "dev " + p));
        columns.AddRange(header.Rules.Select(r => r.Name));
        columns.AddRange(header.Rules.Select(r => "pass " + r.Name));
        columns.AddRange(["pass", "error"]);
        b.AppendLine(string.Join(",", columns.Select(Quote)));
        foreach (var s in outcomes)
        {
            var cells = new List<string> { s.Index.ToString(CultureInfo.InvariantCulture) };
            cells.AddRange(s.Values.Select(Number));
            cells.AddRange(s.Deviations.Select(Number));
            cells.AddRange(s.Figures.Select(Number));
            cells.AddRange(s.Passed.Select(p => p ? "1" : "0"));
            cells.Add(s.Pass ? "1" : "0");
            cells.Add(s.Error is null ? "" : Quote(s.Error));
            b.AppendLine(string.Join(",", cells));
        }
        return b.ToString();
    }

    private static string Number(double x) => double.IsFinite(x) ? x.ToString("R", CultureInfo.InvariantCulture) : "";

    private static string Quote(string s) => s.IndexOfAny([',', '"', '\n']) >= 0 ? "\"" + s.Replace("\"", "\"\"") + "\"" : s;
}
