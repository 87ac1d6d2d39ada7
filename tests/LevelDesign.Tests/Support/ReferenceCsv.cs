using System.Globalization;

namespace LevelDesign.Tests.Support;

/// <summary>Reads the SciPy reference tables in tests/reference/data (comment lines start with '#').</summary>
public static class ReferenceCsv
{
    public static string Path(string fileName) => System.IO.Path.Combine(RepositoryPaths.Root, "tests", "reference", "data", fileName);

    public static IReadOnlyList<Dictionary<string, double>> Rows(string fileName)
    {
        var lines = File.ReadAllLines(Path(fileName)).Where(l => l.Length > 0 && !l.StartsWith('#')).ToArray();
        var header = lines[0].Split(',');
        return lines.Skip(1).Select(l => header.Zip(l.Split(','), (h, v) => (h, double.Parse(v, CultureInfo.InvariantCulture)))
            .ToDictionary(x => x.h, x => x.Item2)).ToArray();
    }

    /// <summary>Cells of one CSV line; a quoted cell may hold commas and doubled quotes (RFC 4180).</summary>
    public static string[] Cells(string line)
    {
        var cells = new List<string>();
        var cell = new System.Text.StringBuilder();
        bool quoted = false;
        for (int i = 0; i < line.Length; i++)
        {
            char c = line[i];
            if (quoted && c == '"' && i + 1 < line.Length && line[i + 1] == '"') { cell.Append('"'); i++; }
            else if (c == '"') quoted = !quoted;
            else if (c == ',' && !quoted) { cells.Add(cell.ToString()); cell.Clear(); }
            else cell.Append(c);
        }
        cells.Add(cell.ToString());
        return cells.ToArray();
    }
}
