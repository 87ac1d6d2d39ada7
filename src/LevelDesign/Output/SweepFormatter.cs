using System.Text;
using System.Text.Json.Nodes;
using LevelDesign.Core.Analysis;
using LevelDesign.Core.Composite;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Eigen;

namespace LevelDesign.Output;

/// <summary>Writes the points of a sweep: JSON (per point the same states and derived quantities as spectrum) or CSV (one row per point).</summary>
public static class SweepFormatter
{
    public sealed record Point(IReadOnlyList<double> Values, DressedSpectrum Spectrum);

    public static JsonObject Json(string deviceName, IReadOnlyList<SweepAxis> axes, IReadOnlyList<Point> points, int? shown, bool completed)
    {
        var axisArray = new JsonArray();
        foreach (var a in axes)
            axisArray.Add(new JsonObject
            {
                ["vary"] = a.Path, ["start"] = a.Start, ["stop"] = a.Stop, ["count"] = a.Count,
                ["links"] = new JsonArray(a.Links.Select(l => (JsonNode)new JsonObject { ["path"] = l.Path, ["scale"] = l.Scale, ["shift"] = l.Shift }).ToArray()),
            });
        var pointArray = new JsonArray();
        for (int i = 0; i < points.Count; i++)
        {
            var p = points[i];
            var values = new JsonObject();
            for (int a = 0; a < axes.Count; a++) values[axes[a].Path] = p.Values[a];
            pointArray.Add(new JsonObject
            {
                ["index"] = i,
                ["values"] = values,
                ["states"] = SpectrumFormatter.States(p.Spectrum, shown ?? p.Spectrum.Count),
                ["derived"] = SpectrumFormatter.Derived(DerivedQuantities.From(p.Spectrum)),
            });
        }
        return new JsonObject
        {
            ["device"] = deviceName,
            ["axes"] = axisArray,
            ["completed"] = completed,
            ["points"] = pointArray,
            ["conventions"] = SpectrumFormatter.Conventions(),
            ["eigensolver"] = EigenSolvers.Describe(),
            ["limits_of_model"] = Conventions.LimitsOfModel,
        };
    }

    /// <summary>
    /// One row per point: axis values, every named derived quantity (GHz), then the energy (GHz) of each state
    /// labelled as at the first point (so a column follows one bare character across the sweep).
    /// </summary>
    public static string Csv(IReadOnlyList<SweepAxis> axes, IReadOnlyList<Point> points, int? shown)
    {
        var b = new StringBuilder();
        if (points.Count == 0)
        {
            b.AppendLine(string.Join(",", axes.Select(a => SpectrumFormatter.Csv(a.Path))));
            return b.ToString();
        }
        var first = points[0].Spectrum;
        var names = DerivedQuantities.From(first).Named().Keys.ToList();
        int states = Math.Min(shown ?? first.Count, first.Count);
        var labels = Enumerable.Range(0, states).Select(k => first.Basis.States[first.Labels[k].BareIndex]).ToList();
        var header = axes.Select(a => a.Path)
            .Concat(names.Select(n => n + "_ghz"))
            .Concat(Enumerable.Range(0, states).Select(k => $"E[{StateLabels.Text(first, first.Labels[k].BareIndex)}]_ghz"));
        b.AppendLine(string.Join(",", header.Select(SpectrumFormatter.Csv)));
        foreach (var p in points)
        {
            var named = DerivedQuantities.From(p.Spectrum).Named();
            var cells = p.Values.Select(SpectrumFormatter.CsvNumber)
                .Concat(names.Select(n => SpectrumFormatter.CsvNumber(named.TryGetValue(n, out double v) ? v : double.NaN)))
                .Concat(labels.Select(l => SpectrumFormatter.CsvNumber(p.Spectrum.EnergyOf(l))));
            b.AppendLine(string.Join(",", cells));
        }
        return b.ToString();
    }
}
