namespace LevelDesign.Ui.Text;

/// <summary>
/// Fitting text into a given number of columns: wrap at spaces, cut with a visible "…", or keep the most
/// important of several parts. Every character used on the screens is one column wide, so length = columns.
/// </summary>
public static class TextFit
{
    public const char Ellipsis = '…';

    /// <summary>The text if it fits, otherwise its start and "…" (never silently cut).</summary>
    public static string Cut(string text, int width)
    {
        if (width <= 0) return "";
        if (text.Length <= width) return text;
        return width == 1 ? Ellipsis.ToString() : text[..(width - 1)].TrimEnd() + Ellipsis;
    }

    /// <summary>Cut to the width, then padded with spaces to exactly that width.</summary>
    public static string Pad(string text, int width) => width <= 0 ? "" : Cut(text, width).PadRight(width);

    /// <summary>
    /// Items joined by <paramref name="separator"/> into lines of at most <paramref name="width"/>, a new line only between
    /// items, so a choice such as "r resonator" is never split across two lines.
    /// </summary>
    public static string Packed(string head, IEnumerable<string> items, int width, string separator = " · ")
    {
        var lines = new List<string> { head };
        foreach (var item in items)
        {
            string last = lines[^1];
            bool empty = last == head;
            if (!empty && last.Length + separator.Length + item.Length > width) lines.Add(new string(' ', head.Length) + item);
            else lines[^1] = empty ? last + item : last + separator + item;
        }
        return string.Join("\n", lines);
    }

    /// <summary>Words wrapped into lines of at most <paramref name="width"/>; a word longer than a line is split.</summary>
    public static IEnumerable<string> Wrap(string text, int width) => Wrap(text, width, width);

    /// <summary>As <see cref="Wrap(string, int)"/>, with a different width for the first line and for the others.</summary>
    public static IEnumerable<string> Wrap(string text, int firstWidth, int restWidth)
    {
        // leading spaces are an indent of the first line, not empty words
        string body = text.TrimStart(' ');
        string lead = text[..(text.Length - body.Length)];
        if (lead.Length > 0 && lead.Length < firstWidth)
        {
            bool first = true;
            foreach (var wrapped in Wrap(body, firstWidth - lead.Length, restWidth))
            {
                yield return first ? lead + wrapped : wrapped;
                first = false;
            }
            yield break;
        }
        int width = Math.Max(1, firstWidth);
        var line = "";
        foreach (var piece in text.Split(' '))
        {
            var word = piece;
            if (line.Length > 0 && line.Length + 1 + word.Length > width)
            {
                yield return line;
                line = "";
                width = Math.Max(1, restWidth);
            }
            while (line.Length == 0 && word.Length > width)
            {
                yield return word[..width];
                word = word[width..];
                width = Math.Max(1, restWidth);
            }
            line = line.Length == 0 ? word : line + " " + word;
        }
        if (line.Length > 0) yield return line;
    }

    /// <summary>
    /// Wrapped lines, each paragraph (split at '\n') starting a new line, every line after the first indented by
    /// <paramref name="indent"/>; at most <paramref name="maxLines"/>, the last one ending in "…" when more were left out.
    /// </summary>
    public static IReadOnlyList<string> WrapLines(string text, int width, int maxLines = int.MaxValue, string indent = "")
    {
        width = Math.Max(1, width);
        var lines = new List<string>();
        foreach (var paragraph in text.Split('\n'))
        {
            // only the very first line starts at the margin: later paragraphs are indented like continuation lines
            int first = lines.Count == 0 ? width : width - indent.Length;
            var wrapped = Wrap(paragraph, first, width - indent.Length).ToList();
            if (wrapped.Count == 0) lines.Add("");
            for (int i = 0; i < wrapped.Count; i++) lines.Add(lines.Count == 0 ? wrapped[i] : indent + wrapped[i]);
        }
        if (lines.Count <= maxLines || maxLines < 1) return lines;
        var kept = lines.Take(maxLines).ToList();
        string last = kept[^1];
        kept[^1] = last.Length + 2 <= width ? last + " " + Ellipsis : last[..(width - 1)] + Ellipsis;
        return kept;
    }

    /// <summary>
    /// Joins the parts that fit in <paramref name="width"/> with <paramref name="separator"/>, in their given order;
    /// when not all fit, the parts with the largest <c>Rank</c> (least important) are left out first. The last part
    /// left is cut with "…" if it alone is too long, or left out too when <paramref name="cutLast"/> is false.
    /// </summary>
    public static string KeepMostImportant(IReadOnlyList<(string Text, int Rank)> parts, int width, string separator, bool cutLast = true)
    {
        var kept = parts.Where(p => p.Text.Length > 0).ToList();
        while (kept.Count > 1 && Joined(kept, separator).Length > width)
            kept.Remove(kept.MaxBy(p => p.Rank));
        string joined = Joined(kept, separator);
        return joined.Length <= width ? joined : cutLast ? Cut(joined, width) : "";
    }

    private static string Joined(IEnumerable<(string Text, int Rank)> parts, string separator) =>
        string.Join(separator, parts.Select(p => p.Text));
}
