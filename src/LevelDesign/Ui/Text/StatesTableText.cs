using LevelDesign.Core.Analysis;
using LevelDesign.Core.Composite;

namespace LevelDesign.Ui.Text;

/// <summary>
/// The dressed-states table: label, frequency above the dressed ground, purity and top components.
/// Low-purity rows start with "!" (and ambiguous labels with "?"), so the mark survives without colour.
/// On a narrow page the components are those that fit whole; the label's own component (its purity) goes first.
/// </summary>
public static class StatesTableText
{
    public static string Legend(double threshold) => string.Create(System.Globalization.CultureInfo.InvariantCulture, $"! purity < {threshold:0.00##}   ? label ambiguous");

    /// <summary>Components shown at most, and the smallest weight shown.</summary>
    private const int MaxComponents = 3;
    private const double MinWeight = 0.005;

    /// <param name="width">Columns of the page; notes wrap and components are left out rather than cut.</param>
    public static IReadOnlyList<TextLine> Build(DressedSpectrum spectrum, string where, int width = 100,
        double purityThreshold = Conventions.DefaultPurityThreshold)
    {
        string legend = Legend(purityThreshold);
        var lines = new List<TextLine>();
        lines.AddRange(TextFit.Wrap($"At {where}", width).Select(l => new TextLine(l, Heading: true)));
        const string Unit = "f = E/h above the dressed ground, GHz";
        string notes = $"{Unit}; {legend}".Length <= width ? $"{Unit}; {legend}" : $"{Unit}\n{legend}";
        lines.AddRange(TextFit.WrapLines(notes, width, indent: "  ").Select(l => new TextLine(l)));
        lines.Add(new TextLine($"  {"#",2} {"label",-10} {"f (GHz)",8} {"purity",6}  {(width >= 47 ? "top components" : "components")}", Heading: true));
        for (int k = 0; k < spectrum.Count; k++)
        {
            var label = spectrum.Labels[k];
            bool low = label.Purity < purityThreshold;
            string mark = (low ? "!" : " ") + (label.Ambiguous ? "?" : " ");
            string row = $"{mark}{k,2} {TextFit.Cut(Core.Presentation.StateNames.OfDressed(spectrum, k), 10),-10} {Numbers.GHz(spectrum.Energies[k]),8} {label.Purity,6:0.000}";
            var components = label.Components.Where(c => c.Weight >= MinWeight).Take(MaxComponents).ToList();
            // three decimals: a 1 % admixture reads 0.010, not a rounded 0.01 next to 0.99
            string Text(Core.Labels.Component c) => $"{Core.Presentation.StateNames.OfBare(spectrum, c.BareIndex)} {c.Weight:0.000}";
            var all = components.Select(Text).ToList();
            var partners = components.Where(c => c.BareIndex != label.BareIndex).Select(Text).ToList();
            lines.Add(new TextLine(row + Components(all, partners, width - row.Length), Warning: low || label.Ambiguous));
        }
        lines.Add(new TextLine(""));
        lines.AddRange(TextFit.Wrap(Conventions.Purity, width).Select(l => new TextLine(l)));
        return lines;
    }

    /// <summary>
    /// "  qb1 0.99  qc1 0.01" in <paramref name="room"/> columns: all when they fit; otherwise the label's own
    /// component (its weight is the purity) is left out, then the smallest partners, so the mixing stays visible;
    /// a final "…" marks partners left out.
    /// </summary>
    private static string Components(IReadOnlyList<string> all, IReadOnlyList<string> partners, int room)
    {
        static string Joined(IEnumerable<string> parts) => string.Concat(parts.Select(p => "  " + p));
        if (Joined(all).Length <= room) return Joined(all);
        var kept = partners.ToList();
        while (kept.Count > 0 && Joined(kept).Length > room) kept.RemoveAt(kept.Count - 1);
        // "…" says components were left out (a wider terminal shows them)
        string shown = Joined(kept);
        return kept.Count < partners.Count && shown.Length + 3 <= room ? shown + "  " + TextFit.Ellipsis : shown;
    }
}
