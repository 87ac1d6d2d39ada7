using System.Globalization;
using System.Text;
using System.Text.Json;
using LevelDesign.Core.Composite;
using LevelDesign.Core.Files;
using LevelDesign.Core.Sweeps;
using LevelDesign.Ui.Text;

namespace LevelDesign.Ui.Export;

/// <summary>
/// Writes the current sweep (one row per point: axis values, every named quantity, then the frequency of
/// every labelled state) or the states table at one point, as CSV or JSON. Numbers in GHz, invariant culture.
/// </summary>
public static class TableExport
{
    public static void Sweep(SweepResult sweep, string path)
    {
        var axisNames = sweep.Plan.Axes.Select(a => a.Path).ToList();
        var quantityNames = sweep.Points.SelectMany(p => p.Quantities.Keys).Distinct().Order(StringComparer.Ordinal).ToList();
        var labels = sweep.Points.SelectMany(p => Enumerable.Range(0, p.Spectrum.Count).Select(k => LabelNames.OfDressed(p.Spectrum, k)))
            .Distinct().ToList();
        var header = axisNames.Concat(quantityNames).Concat(labels.Select(l => "f[" + l + "]")).ToList();
        var rows = sweep.Points.Select(p =>
        {
            var byLabel = Enumerable.Range(0, p.Spectrum.Count).ToDictionary(k => LabelNames.OfDressed(p.Spectrum, k), k => p.Spectrum.Energies[k]);
            return p.AxisValues
                .Concat(quantityNames.Select(q => p.Quantities.TryGetValue(q, out double v) ? v : double.NaN))
                .Concat(labels.Select(l => byLabel.TryGetValue(l, out double f) ? f : double.NaN))
                .ToList();
        }).ToList();
        Write(path, header, rows, new Dictionary<string, object>
        {
            ["kind"] = "sweep",
            ["completed"] = sweep.Completed,
            ["units"] = "GHz (axis values in their own units)",
        });
    }

    public static void States(DressedSpectrum spectrum, string where, string path)
    {
        var header = new List<string> { "index", "frequency_ghz", "purity" };
        var rows = Enumerable.Range(0, spectrum.Count)
            .Select(k => new List<double> { k, spectrum.Energies[k], spectrum.Labels[k].Purity }).ToList();
        var labels = Enumerable.Range(0, spectrum.Count).Select(k => LabelNames.OfDressed(spectrum, k)).ToList();
        if (Path.GetExtension(path).Equals(".json", StringComparison.OrdinalIgnoreCase))
        {
            var states = Enumerable.Range(0, spectrum.Count).Select(k => new Dictionary<string, object>
            {
                ["label"] = labels[k], ["frequency_ghz"] = Json(spectrum.Energies[k]), ["purity"] = Json(spectrum.Labels[k].Purity),
                ["ambiguous"] = spectrum.Labels[k].Ambiguous,
            });
            AtomicFile.Write(path, JsonSerializer.Serialize(new Dictionary<string, object> { ["kind"] = "states", ["at"] = where, ["states"] = states },
                new JsonSerializerOptions { WriteIndented = true }));
            return;
        }
        var text = new StringBuilder("label,frequency_ghz,purity,ambiguous\n");
        for (int k = 0; k < spectrum.Count; k++)
            text.Append(CultureInfo.InvariantCulture, $"{Csv(labels[k])},{spectrum.Energies[k]:R},{spectrum.Labels[k].Purity:R},{spectrum.Labels[k].Ambiguous}\n");
        AtomicFile.Write(path, text.ToString());
    }

    private static void Write(string path, List<string> header, List<List<double>> rows, Dictionary<string, object> meta)
    {
        if (Path.GetExtension(path).Equals(".json", StringComparison.OrdinalIgnoreCase))
        {
            meta["columns"] = header;
            meta["rows"] = rows.Select(r => r.Select(Json).ToList()).ToList();
            AtomicFile.Write(path, JsonSerializer.Serialize(meta, new JsonSerializerOptions { WriteIndented = true }));
            return;
        }
        var text = new StringBuilder(string.Join(",", header.Select(Csv))).Append('\n');
        foreach (var row in rows)
            text.Append(string.Join(",", row.Select(v => double.IsFinite(v) ? v.ToString("R", CultureInfo.InvariantCulture) : ""))).Append('\n');
        AtomicFile.Write(path, text.ToString());
    }

    private static object Json(double v) => double.IsFinite(v) ? v : null!;

    private static string Csv(string s) => s.Contains(',') || s.Contains('"') ? "\"" + s.Replace("\"", "\"\"") + "\"" : s;
}
