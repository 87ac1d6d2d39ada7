using System.Globalization;
using System.Text;

namespace LevelDesign.Core.Sweeps.Export;

/// <summary>CSV text of sweep tables, crossings and target roots (pure text producers; the caller writes files).</summary>
public static class CsvText
{
    public static string Sweep(SweepTable table)
    {
        var sb = new StringBuilder();
        sb.AppendLine($"# energies: GHz above the dressed ground; labels list levels of: {string.Join(",", table.ElementOrder)}; purity flag below {table.PurityThreshold}; 'purity Q' = lowest purity of the labelled states quantity Q is read from");
        var header = new List<string> { "point" };
        header.AddRange(table.AxisPaths);
        header.AddRange(table.Labels.Select(l => $"E {l}"));
        header.AddRange(table.Labels.Select(l => $"purity {l}"));
        header.AddRange(table.QuantityNames);
        header.AddRange(table.QuantityNames.Select(n => $"purity {n}"));
        header.AddRange(["ambiguous", "low_purity"]);
        sb.AppendLine(string.Join(",", header.Select(Quote)));
        foreach (var row in table.Rows)
        {
            var cells = new List<string> { row.Index.ToString(CultureInfo.InvariantCulture) };
            cells.AddRange(row.AxisValues.Select(Number));
            cells.AddRange(row.Energies.Select(Number));
            cells.AddRange(row.Purities.Select(Number));
            cells.AddRange(row.Quantities.Select(Number));
            cells.AddRange(table.QuantityNames.Select((_, i) => i < row.QuantityPurities.Count ? Number(row.QuantityPurities[i]) : ""));
            cells.Add(row.Ambiguous ? "1" : "0");
            cells.Add(row.LowPurity ? "1" : "0");
            sb.AppendLine(string.Join(",", cells));
        }
        return sb.ToString();
    }

    public static string Crossings(IEnumerable<Crossing> crossings)
    {
        var sb = new StringBuilder("label_a,label_b,bias,gap_ghz,purity,refined,distance_to_operating_point\n");
        foreach (var c in crossings)
            sb.AppendLine(string.Join(",", Quote(c.LabelA), Quote(c.LabelB), Number(c.Bias), Number(c.GapGHz), Number(c.Purity),
                c.Refined ? "1" : "0", c.DistanceToOperatingPoint is double d ? Number(d) : ""));
        return sb.ToString();
    }

    public static string Targets(IEnumerable<TargetRoot> roots)
    {
        var sb = new StringBuilder("quantity,target,bias,value,residual,refined\n");
        foreach (var r in roots)
            sb.AppendLine(string.Join(",", Quote(r.Quantity), Number(r.Target), Number(r.Bias), Number(r.Value), Number(r.Residual), r.Refined ? "1" : "0"));
        return sb.ToString();
    }

    private static string Number(double x) => double.IsFinite(x) ? x.ToString("R", CultureInfo.InvariantCulture) : "";

    private static string Quote(string s) => s.IndexOfAny([',', '"', '\n']) >= 0 ? "\"" + s.Replace("\"", "\"\"") + "\"" : s;
}
