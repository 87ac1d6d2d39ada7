using LevelDesign.Core.Analysis;
using LevelDesign.Core.Composite;

namespace LevelDesign.Ui.Text;

/// <summary>
/// The dressed-states table: label, frequency above the dressed ground, purity and top components.
/// Low-purity rows start with "!" (and ambiguous labels with "?"), so the mark survives without colour.
/// </summary>
public static class StatesTableText
{
    public const double LowPurity = 0.9;
    public const string Legend = "! purity < 0.90   ? label ambiguous";

    public static IReadOnlyList<TextLine> Build(DressedSpectrum spectrum, string where)
    {
        var lines = new List<TextLine>
        {
            new($"At {where}", Heading: true),
            new("f = E/h above the dressed ground, GHz; " + Legend),
            new($"  {"#",2} {"label",-10} {"f (GHz)",8} {"purity",6}  top components", Heading: true),
        };
        for (int k = 0; k < spectrum.Count; k++)
        {
            var label = spectrum.Labels[k];
            bool low = label.Purity < LowPurity;
            string mark = (low ? "!" : " ") + (label.Ambiguous ? "?" : " ");
            string components = string.Join("  ", label.Components.Where(c => c.Weight >= 0.005).Take(3)
                .Select(c => $"{LabelNames.OfBare(spectrum, c.BareIndex)} {c.Weight:0.00}"));
            lines.Add(new TextLine(
                $"{mark}{k,2} {Fit(LabelNames.OfDressed(spectrum, k), 10),-10} {Numbers.GHz(spectrum.Energies[k]),8} {label.Purity,6:0.000}  {components}",
                Warning: low || label.Ambiguous));
        }
        lines.Add(new TextLine(""));
        lines.Add(new TextLine(Conventions.Purity));
        return lines;
    }

    private static string Fit(string text, int width) => text.Length <= width ? text : text[..(width - 1)] + "…";
}
