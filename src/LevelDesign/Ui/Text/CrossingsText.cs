using LevelDesign.Core.Presentation;
using LevelDesign.Core.Sweeps;
using LevelDesign.Ui.Compute;

namespace LevelDesign.Ui.Text;

/// <summary>
/// The crossings page: one row per crossing (labels, gap, bias, the lower purity of the two states there, and the
/// nearest named operating point with its distance), each column as wide as its contents. On a page too narrow for
/// all, the nearest-point column goes first, then the purity column; the rows keep their ranking.
/// </summary>
public static class CrossingsText
{
    /// <summary>Rows above the first crossing; row i of the list is crossing i − HeaderLines.</summary>
    public const int HeaderLines = 2;

    /// <param name="points">The file's operating points as values of the swept axis (see <see cref="CrossingSearch.OperatingPoints"/>).</param>
    /// <param name="width">Columns for a row (after the list's "›" marker); columns are as wide as their contents.</param>
    public static IReadOnlyList<TextLine> Build(IReadOnlyList<CrossingMark> marks, SweepResult? sweep, string? axisName, bool pending,
        Func<double, string> formatBias, int width = 100, IReadOnlyList<(string Name, double Value)>? points = null)
    {
        if (sweep is null) return [new TextLine("no sweep yet: F5 starts one")];
        if (sweep.Plan.Axes.Count != 1) return [new TextLine("crossings are searched along one-axis sweeps")];
        if (!sweep.Completed) return Wrapped("the sweep was cancelled; crossings are searched on a finished sweep", width);
        if (pending) return Wrapped("⟳ searching for crossings (each is refined between sweep points)…", width);
        if (marks.Count == 0) return Wrapped("no crossings or near-approaches inside the sweep", width);
        bool ranked = marks.Any(m => m.Crossing.DistanceToOperatingPoint is not null);
        var rows = CrossingReport.Rows(marks.Select(m => m.Crossing).ToList(), points ?? []);
        var labels = marks.Select(m => $"{m.LabelA}↔{m.LabelB}").ToList();
        var gaps = marks.Select(m => Numbers.MHz(m.Crossing.GapGHz, 1)).ToList();
        var biases = marks.Select(m => formatBias(m.Crossing.Bias) + (m.Crossing.Refined ? "" : " edge")).ToList();
        var purities = marks.Select(m => m.Crossing.Purity.ToString("0.000", System.Globalization.CultureInfo.InvariantCulture)).ToList();
        var nearest = rows.Select(r => r.NearestPoint is string name ? $"{name} {formatBias(r.Distance!.Value)} away" : "").ToList();
        bool anyNearest = nearest.Any(n => n.Length > 0);
        string axis = axisName ?? "bias";
        int labelWidth = Math.Max("crossing".Length, labels.Max(l => l.Length));
        int gapWidth = Math.Max("gap MHz".Length, gaps.Max(g => g.Length));
        int biasWidth = Math.Max(axis.Length, biases.Max(b => b.Length));
        int purityWidth = "purity".Length;
        int nearestWidth = Math.Max("nearest point".Length, nearest.Max(n => n.Length));
        // On a narrow page the gap and bias columns close up, then the nearest-point column goes, then purity.
        int Length(int space, bool purity, bool near) =>
            3 + labelWidth + 1 + gapWidth + space + biasWidth + (purity ? 2 + purityWidth : 0) + (near ? 2 + nearestWidth : 0);
        bool showNearest = anyNearest && Length(1, true, true) <= width;
        bool showPurity = Length(1, true, showNearest) <= width;
        string space = Length(2, showPurity, showNearest) <= width ? "  " : " ";
        string Row(string number, string label, string gap, string bias, string purity, string near) =>
            $"{number,2} {label.PadRight(labelWidth)} {gap.PadLeft(gapWidth)}{space}{bias.PadLeft(biasWidth)}"
            + (showPurity ? "  " + purity.PadLeft(purityWidth) : "") + (showNearest ? "  " + near : "");
        var lines = new List<TextLine>
        {
            new(TextFit.Cut(ranked ? "nearest to the file's operating points first" : "in bias order (no operating point on this axis)", width), Heading: true),
            new(Row("", "crossing", "gap MHz", axis, "purity", "nearest point").TrimEnd()),
        };
        for (int i = 0; i < marks.Count; i++)
            lines.Add(new TextLine(Row((i + 1).ToString(), labels[i], gaps[i], biases[i], purities[i], nearest[i]).TrimEnd()));
        return lines;
    }

    private static IReadOnlyList<TextLine> Wrapped(string text, int width) => TextFit.Wrap(text, width).Select(l => new TextLine(l)).ToList();
}
