namespace LevelDesign.Ui.Text;

/// <summary>
/// Which key hints fit on one line: all of them with keys written in full if they fit, else with short keys
/// ("^S"), else the lowest-ranked ones are left out, in their places, until the rest fits.
/// </summary>
public static class KeyBarText
{
    public const string Separator = "  ";

    public static IReadOnlyList<(string Key, string Label)> Fit(IReadOnlyList<KeyHint> hints, int width)
    {
        var full = hints.Select(h => (h.Key, h.Label)).ToList();
        if (Length(full) <= width) return full;
        var kept = hints.ToList();
        bool cut = false;
        while (Length(Shown(kept, cut)) > width && kept.Any(h => h.Rank > 0))
        {
            kept.Remove(kept.Where(h => h.Rank > 0).MaxBy(h => h.Rank)!);
            cut = true;
        }
        return Shown(kept, cut);
    }

    /// <summary>The fitted bar as plain text.</summary>
    public static string Line(IReadOnlyList<KeyHint> hints, int width) =>
        TextFit.Cut(string.Join(Separator, Fit(hints, width).Select(p => $"{p.Key} {p.Label}")), width);

    /// <summary>
    /// The entries for a bar of <paramref name="width"/> columns and where they start: one column in, unless
    /// starting at the edge fits more (all keys in full at exactly 120 columns, say).
    /// </summary>
    public static (IReadOnlyList<(string Key, string Label)> Items, int Indent) Layout(IReadOnlyList<KeyHint> hints, int width)
    {
        var indented = Fit(hints, width - 1);
        var edge = Fit(hints, width);
        return Length(edge) > Length(indented) ? (edge, 0) : (indented, 1);
    }

    private static List<(string Key, string Label)> Shown(IEnumerable<KeyHint> hints, bool cut) =>
        hints.Select(h => (h.ShortKey, cut && h.LabelWhenCut is not null ? h.LabelWhenCut : h.Label)).ToList();

    public static int Length(IReadOnlyList<(string Key, string Label)> items) =>
        items.Sum(i => i.Key.Length + 1 + i.Label.Length) + Separator.Length * Math.Max(0, items.Count - 1);
}
