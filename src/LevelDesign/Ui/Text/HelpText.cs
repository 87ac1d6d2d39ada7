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
            var wrapped = TextFit.Wrap(what, room).ToList();
            lines.Add(new TextLine($"  {keys,-27} {wrapped[0]}"));
            foreach (var more in wrapped.Skip(1)) lines.Add(new TextLine($"  {"",-27} {more}"));
        }
        lines.Add(new TextLine(""));
        lines.Add(new TextLine("Marks", Heading: true));
        lines.AddRange(Indented("● unsaved changes   ⚠ file changed on disk   ⟳ computing", width));
        lines.AddRange(Indented(StatesTableText.Legend(Core.Analysis.Conventions.DefaultPurityThreshold) + " (the file's [device] purity_threshold)", width));
        lines.AddRange(Indented("× crossing on the spectrum   ┊ bias cursor   … text cut to fit (Enter on a row, or a wider terminal, shows it whole)", width));
        lines.Add(new TextLine(""));
        lines.Add(new TextLine("Press L for the limits of the model and the conventions used.", Heading: true));
        return lines;
    }

    public static IReadOnlyList<TextLine> Limits(int width = 100) =>
    [
        new("Limits of the model", Heading: true),
        .. Indented(Conventions.LimitsOfModel, width),
        new(""),
        new("Conventions", Heading: true),
        .. new[] { Conventions.Energies, Conventions.Transitions, Conventions.LambShift, Conventions.DispersiveShift,
                   Conventions.ZZ, Conventions.Purity, Conventions.Purcell }
            .SelectMany(c => Indented(c, width)),
        new(""),
        new("Eigensolver", Heading: true),
        .. Indented(EigenSolvers.Describe(), width),
        new(""),
        new("Press L again for the keys.", Heading: true),
    ];

    /// <summary>A paragraph wrapped to the page and indented by two columns.</summary>
    private static IEnumerable<TextLine> Indented(string text, int width) =>
        TextFit.Wrap(text, Math.Max(20, width - 3)).Select(l => new TextLine("  " + l));
}
