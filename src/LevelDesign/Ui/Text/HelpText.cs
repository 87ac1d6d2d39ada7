using LevelDesign.Core.Analysis;
using LevelDesign.Core.Eigen;

namespace LevelDesign.Ui.Text;

/// <summary>The help page: every key, the marks used, and (on L) the limits of the model and all conventions.</summary>
public static class HelpText
{
    /// <param name="width">Columns available; descriptions wrap under their key so nothing is cut off.</param>
    public static IReadOnlyList<TextLine> Keys(int width = 100)
    {
        var lines = new List<TextLine> { new("Keys", Heading: true) };
        int room = Math.Max(20, width - 30);
        foreach (var (keys, what) in KeyHelp.All)
        {
            var wrapped = Wrap(what, room).ToList();
            lines.Add(new TextLine($"  {keys,-27} {wrapped[0]}"));
            foreach (var more in wrapped.Skip(1)) lines.Add(new TextLine($"  {"",-27} {more}"));
        }
        lines.Add(new TextLine(""));
        lines.Add(new TextLine("Marks", Heading: true));
        lines.Add(new TextLine("  ● unsaved changes    ⚠ file changed on disk    " + StatesTableText.Legend));
        lines.Add(new TextLine("  × crossing on the spectrum    ┊ bias cursor    ⟳ computing"));
        lines.Add(new TextLine(""));
        lines.Add(new TextLine("Press L for the limits of the model and the conventions used.", Heading: true));
        return lines;
    }

    public static IReadOnlyList<TextLine> Limits(int width = 100) =>
    [
        new("Limits of the model", Heading: true),
        .. Wrap(Conventions.LimitsOfModel, Math.Max(20, width - 3)).Select(l => new TextLine("  " + l)),
        new(""),
        new("Conventions", Heading: true),
        .. new[] { Conventions.Energies, Conventions.Transitions, Conventions.LambShift, Conventions.DispersiveShift,
                   Conventions.ZZ, Conventions.Purity, Conventions.Purcell }
            .SelectMany(c => Wrap(c, Math.Max(20, width - 3))).Select(l => new TextLine("  " + l)),
        new(""),
        new("Eigensolver", Heading: true),
        new("  " + EigenSolvers.Describe()),
        new(""),
        new("Press L again for the keys.", Heading: true),
    ];

    public static IEnumerable<string> Wrap(string text, int width)
    {
        var line = "";
        foreach (var word in text.Split(' '))
        {
            if (line.Length + word.Length + 1 > width && line.Length > 0) { yield return line; line = ""; }
            line = line.Length == 0 ? word : line + " " + word;
        }
        if (line.Length > 0) yield return line;
    }
}
