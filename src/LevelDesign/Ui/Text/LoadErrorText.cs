using LevelDesign.Core.DeviceFiles;

namespace LevelDesign.Ui.Text;

/// <summary>A bad file's errors, each with the offending line and a caret under the column.</summary>
public static class LoadErrorText
{
    /// <param name="width">Columns available; long messages wrap so no reason is cut off.</param>
    public static IReadOnlyList<TextLine> Build(IReadOnlyList<DeviceFileError> errors, string? fileText, int width = 100)
    {
        var fileLines = fileText?.Split('\n') ?? [];
        var lines = new List<TextLine>
        {
            new($"⚠ The device file has {errors.Count} error(s); nothing was computed.", Warning: true, Heading: true),
            new("F2 fixes the first value listed here (until the file loads); or fix the file and press Ctrl+L; Ctrl+Q quits."),
            new(""),
        };
        foreach (var e in errors)
        {
            string field = string.IsNullOrEmpty(e.Field) ? "" : $" [{e.Field}]";
            var wrapped = HelpText.Wrap($"✗ {Path.GetFileName(e.File)}:{e.Line}:{e.Column}{field}: {e.Message}", Math.Max(20, width)).ToList();
            lines.Add(new TextLine(wrapped[0], Warning: true));
            lines.AddRange(wrapped.Skip(1).Select(w => new TextLine("  " + w, Warning: true)));
            if (e.Line >= 1 && e.Line <= fileLines.Length)
            {
                string source = fileLines[e.Line - 1].TrimEnd('\r').Replace('\t', ' ');
                lines.Add(new TextLine($"  {e.Line,4} │ {source}"));
                if (e.Column >= 1) lines.Add(new TextLine($"       │ {new string(' ', e.Column - 1)}^"));
            }
            lines.Add(new TextLine(""));
        }
        return lines;
    }
}
