using System.Globalization;

namespace LevelDesign.Core.Tests.Support;

/// <summary>Reads the committed SciPy reference CSV files under tests/reference/data ('#' lines are comments).</summary>
public static class ReferenceData
{
    public static string Directory
    {
        get
        {
            var dir = new DirectoryInfo(AppContext.BaseDirectory);
            while (dir is not null && !System.IO.Directory.Exists(Path.Combine(dir.FullName, "tests", "reference", "data")))
                dir = dir.Parent;
            return dir is null
                ? throw new DirectoryNotFoundException("tests/reference/data not found above " + AppContext.BaseDirectory)
                : Path.Combine(dir.FullName, "tests", "reference", "data");
        }
    }

    public static IReadOnlyList<Dictionary<string, string>> Rows(string fileName)
    {
        var lines = File.ReadAllLines(Path.Combine(Directory, fileName))
            .Where(l => !l.StartsWith('#') && l.Trim().Length > 0).ToArray();
        var header = lines[0].Split(',').Select(h => h.Trim()).ToArray();
        return lines.Skip(1).Select(l =>
        {
            var cells = l.Split(',');
            var row = new Dictionary<string, string>();
            for (int i = 0; i < header.Length; i++) row[header[i]] = cells[i].Trim();
            return row;
        }).ToArray();
    }

    public static double Number(this Dictionary<string, string> row, string column) =>
        double.Parse(row[column], CultureInfo.InvariantCulture);
}
