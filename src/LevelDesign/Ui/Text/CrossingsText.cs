using LevelDesign.Core.Sweeps;
using LevelDesign.Ui.Compute;

namespace LevelDesign.Ui.Text;

/// <summary>
/// The crossings page: one row per crossing (labels, gap, bias, distance to the nearest operating point), each
/// column as wide as its contents; on a page too narrow for all, the distance column is left out.
/// </summary>
public static class CrossingsText
{
    /// <summary>Rows above the first crossing; row i of the list is crossing i − HeaderLines.</summary>
    public const int HeaderLines = 2;

    /// <param name="width">Columns for a row (after the list's "›" marker); columns are as wide as their contents.</param>
    public static IReadOnlyList<TextLine> Build(IReadOnlyList<CrossingMark> marks, SweepResult? sweep, string? axisName, bool pending,
        Func<double, string> formatBias, int width = 100)
    {
        if (sweep is null) return [new TextLine("no sweep yet: F5 starts one")];
        if (sweep.Plan.Axes.Count != 1) return [new TextLine("crossings are searched along one-axis sweeps")];
        if (!sweep.Completed) return Wrapped("the sweep was cancelled; crossings are searched on a finished sweep", width);
        if (pending) return Wrapped("⟳ searching for crossings (each is refined between sweep points)…", width);
        if (marks.Count == 0) return Wrapped("no crossings or near-approaches inside the sweep", width);
        bool ranked = marks.Any(m => m.Crossing.DistanceToOperatingPoint is not null);
        var labels = marks.Select(m => $"{m.LabelA}↔{m.LabelB}").ToList();
        var gaps = marks.Select(m => Numbers.MHz(m.Crossing.GapGHz, 1)).ToList();
        var biases = marks.Select(m => formatBias(m.Crossing.Bias) + (m.Crossing.Refined ? "" : " edge")).ToList();
        var distances = marks.Select(m => m.Crossing.DistanceToOperatingPoint is double d ? formatBias(d) : "").ToList();
        string axis = axisName ?? "bias";
        int labelWidth = Math.Max("crossing".Length, labels.Max(l => l.Length));
        int gapWidth = Math.Max("gap MHz".Length, gaps.Max(g => g.Length));
        int biasWidth = Math.Max(axis.Length, biases.Max(b => b.Length));
        int distanceWidth = Math.Max("distance".Length, distances.Max(d => d.Length));
        // On a narrow page the gap and bias columns close up, then the distance column goes (the rows still rank by it).
        int Length(int space, bool distance) => 3 + labelWidth + 1 + gapWidth + space + biasWidth + (distance ? 2 + distanceWidth : 0);
        bool showDistance = ranked && Length(1, true) <= width;
        string space = Length(2, showDistance) <= width ? "  " : " ";
        string Row(string number, string label, string gap, string bias, string distance) =>
            $"{number,2} {label.PadRight(labelWidth)} {gap.PadLeft(gapWidth)}{space}{bias.PadLeft(biasWidth)}{(showDistance ? "  " + distance.PadLeft(distanceWidth) : "")}";
        var lines = new List<TextLine>
        {
            new(TextFit.Cut(ranked ? "nearest to the file's operating points first" : "in bias order (no operating point on this axis)", width), Heading: true),
            new(Row("", "crossing", "gap MHz", axis, "distance")),
        };
        for (int i = 0; i < marks.Count; i++)
            lines.Add(new TextLine(Row((i + 1).ToString(), labels[i], gaps[i], biases[i], distances[i])));
        return lines;
    }

    private static IReadOnlyList<TextLine> Wrapped(string text, int width) => TextFit.Wrap(text, width).Select(l => new TextLine(l)).ToList();
}
