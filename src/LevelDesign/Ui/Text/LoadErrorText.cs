using LevelDesign.Core.DeviceFiles;

namespace LevelDesign.Ui.Text;

/// <summary>A bad file's errors, each with the offending line and a caret under the column.</summary>
public static class LoadErrorText
{
    /// <param name="width">Columns available; long messages wrap so no reason is cut off.</param>
    public static IReadOnlyList<TextLine> Build(IReadOnlyList<DeviceFileError> errors, string? fileText, int width = 100)
    {
        var fileLines = fileText?.Split('\n') ?? [];
        var lines = new List<TextLine>();
        lines.AddRange(TextFit.Wrap($"⚠ The device file has {errors.Count} error(s); nothing was computed.", width).Select(l => new TextLine(l, Warning: true, Heading: true)));
        lines.AddRange(TextFit.Wrap("F2 fixes the first value listed here (until the file loads); or fix the file and press Ctrl+L; Ctrl+Q quits.", width).Select(l => new TextLine(l)));
        lines.Add(new TextLine(""));
        foreach (var e in errors)
        {
            string field = string.IsNullOrEmpty(e.Field) ? "" : $" [{e.Field}]";
            lines.AddRange(TextFit.WrapLines($"✗ {Path.GetFileName(e.File)}:{e.Line}:{e.Column}{field}: {e.Message}", Math.Max(20, width), indent: "  ")
                .Select(l => new TextLine(l, Warning: true)));
            if (e.Line >= 1 && e.Line <= fileLines.Length)
            {
                string source = fileLines[e.Line - 1].TrimEnd('\r').Replace('\t', ' ');
                var (shown, caret) = Around(source, e.Column, width - Gutter);
                lines.Add(new TextLine($"  {e.Line,4} │ {shown}"));
                if (caret >= 1) lines.Add(new TextLine($"       │ {new string(' ', caret - 1)}^"));
            }
            lines.Add(new TextLine(""));
        }
        return lines;
    }

    /// <summary>Columns taken by "  1234 │ " before a source line.</summary>
    private const int Gutter = 9;

    /// <summary>
    /// The part of a source line that fits in <paramref name="room"/> columns and holds the error's column, with "…"
    /// where text was left out, and where the caret goes in it (0: no caret).
    /// </summary>
    public static (string Text, int Caret) Around(string source, int column, int room)
    {
        room = Math.Max(10, room);
        if (source.Length <= room) return (source, column);
        int start = 0;
        if (column > room - 5)
        {
            start = Math.Min(column - (room / 2), source.Length - (room - 1));
            start = Math.Max(1, start);
        }
        string part = start > 0 ? "…" + source[start..] : source;
        int caret = column < 1 ? 0 : column - start + (start > 0 ? 1 : 0);
        return (TextFit.Cut(part, room), caret);
    }
}
