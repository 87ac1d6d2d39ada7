using LevelDesign.Core.Sweeps;
using LevelDesign.Ui.Compute;

namespace LevelDesign.Ui.Text;

/// <summary>The crossings page: one row per crossing (labels, gap, bias, distance to the nearest operating point).</summary>
public static class CrossingsText
{
    /// <summary>Rows above the first crossing; row i of the list is crossing i − HeaderLines.</summary>
    public const int HeaderLines = 2;

    public static IReadOnlyList<TextLine> Build(IReadOnlyList<CrossingMark> marks, SweepResult? sweep, string? axisName, bool pending,
        Func<double, string> formatBias)
    {
        if (sweep is null) return [new TextLine("no sweep yet: F5 starts one")];
        if (sweep.Plan.Axes.Count != 1) return [new TextLine("crossings are searched along one-axis sweeps")];
        if (!sweep.Completed) return [new TextLine("the sweep was cancelled; crossings are searched on a finished sweep")];
        if (pending) return [new TextLine("⟳ searching for crossings (each is refined between sweep points)…")];
        if (marks.Count == 0) return [new TextLine("no crossings or near-approaches inside the sweep")];
        bool ranked = marks.Any(m => m.Crossing.DistanceToOperatingPoint is not null);
        var lines = new List<TextLine>
        {
            new(ranked ? "nearest to the file's operating points first" : "in bias order (no operating point on this axis)", Heading: true),
            new($"   {"crossing",-18}{"gap MHz",8}  {axisName}{(ranked ? "  (from point)" : "")}"),
        };
        for (int i = 0; i < marks.Count; i++)
        {
            var c = marks[i].Crossing;
            string labels = $"{marks[i].LabelA}↔{marks[i].LabelB}";
            string distance = c.DistanceToOperatingPoint is double d ? $"  ({formatBias(d)})" : "";
            string unrefined = c.Refined ? "" : " edge";
            lines.Add(new TextLine($"{i + 1,2} {labels,-18}{Numbers.MHz(c.GapGHz, 1),8}  {formatBias(c.Bias)}{unrefined}{distance}"));
        }
        return lines;
    }
}
