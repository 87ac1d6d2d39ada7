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
}
