using System.Globalization;
using LevelDesign.Core.Analysis;
using LevelDesign.Core.Composite;
using LevelDesign.Core.Presentation;

namespace LevelDesign.Ui.Text;

/// <summary>
/// The comparison page: two marked points (A and B) side by side with the difference B − A, first every named
/// quantity (f01, α, 2χ, ZZ, J_eff, …), then the dressed states matched by their labels (not by index, so a state that
/// moves past another is still compared with itself). Values read from states below the purity threshold carry "!".
/// When the columns do not fit the page, each row is written on two lines.
/// </summary>
public static class CompareText
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    /// <summary>One marked point: where it is and what was computed there.</summary>
    public sealed record Mark(string Where, DressedSpectrum Spectrum, DerivedQuantities Quantities);

    public static IReadOnlyList<TextLine> Build(Mark? a, Mark? b, int width, double purityThreshold = Conventions.DefaultPurityThreshold)
    {
        var lines = new List<TextLine>();
        lines.AddRange(Wrapped($"A: {a?.Where ?? "not marked"}", width, heading: true));
        lines.AddRange(Wrapped($"B: {b?.Where ?? "not marked"}", width, heading: true));
        if (a is null || b is null)
        {
            lines.AddRange(Wrapped("a marks what the states page shows as A, b as B: the cursor on the spectrum, a named point " +
                                   "(Enter on one on the board) or the file's biases.", width));
            return lines;
        }
        if (!SameElements(a.Spectrum, b.Spectrum))
        {
            lines.AddRange(Wrapped("A and B were computed for different devices (an element was added, removed or renamed); mark them again.", width));
            return lines;
        }
        lines.AddRange(Wrapped(string.Create(Inv, $"! = read from a state below purity {purityThreshold:0.##}; Δ = B − A"), width));

        lines.Add(new TextLine(""));
        var namedA = a.Quantities.Named();
        var namedB = b.Quantities.Named();
        var purityA = a.Quantities.NamedPurities();
        var purityB = b.Quantities.NamedPurities();
        // A and B to their full resolution when three columns fit, else to four digits (Δ keeps its full resolution)
        List<string[]> QuantityRows(bool full) => namedA.Keys.Where(namedB.ContainsKey).Select(name =>
        {
            string Value(IReadOnlyDictionary<string, double> v, IReadOnlyDictionary<string, double> p) =>
                (full ? FrequencyText.Of(name, v[name]) : FrequencyText.Short(v[name]))
                + (p.TryGetValue(name, out double purity) && purity < purityThreshold ? "!" : " ");
            return new[] { name, Value(namedA, purityA), Value(namedB, purityB), FrequencyText.Of(name, namedB[name] - namedA[name]) + " " };
        }).ToList();
        var quantityRows = QuantityRows(full: true);
        if (ValuesWidth(quantityRows) > width) quantityRows = QuantityRows(full: false);
        lines.AddRange(Table(["quantity", "A ", "B ", "Δ "], quantityRows, width));

        lines.Add(new TextLine(""));
        var stateRows = new List<string[]>();
        for (int k = 0; k < a.Spectrum.Count; k++)
        {
            var levels = a.Spectrum.LabelLevels(k);
            int other = Enumerable.Range(0, b.Spectrum.Count).FirstOrDefault(j => b.Spectrum.LabelLevels(j).SequenceEqual(levels), -1);
            if (other < 0) continue;
            string Level(DressedSpectrum s, int i) =>
                s.Energies[i].ToString("F6", Inv) + (s.Labels[i].Purity < purityThreshold ? "!" : " ");
            stateRows.Add([StateNames.OfDressed(a.Spectrum, k), Level(a.Spectrum, k), Level(b.Spectrum, other),
                ((b.Spectrum.Energies[other] - a.Spectrum.Energies[k]) * 1e3).ToString("F3", Inv) + " "]);
        }
        lines.AddRange(Table(["state", "A (GHz) ", "B (GHz) ", "Δ (MHz) "], stateRows, width));
        return lines;
    }

    /// <summary>Columns the three value columns take (each as wide as the widest value, two spaces before each).</summary>
    private static int ValuesWidth(IReadOnlyList<string[]> rows) =>
        rows.Count == 0 ? 0 : Enumerable.Range(1, 3).Sum(c => rows.Max(r => r[c].Length) + 2);

    private static bool SameElements(DressedSpectrum a, DressedSpectrum b) =>
        a.Device.Elements.Select(e => e.Id).SequenceEqual(b.Device.Elements.Select(e => e.Id));

    /// <summary>
    /// Columns as wide as their contents (names left, numbers right). When the page is too narrow for the longest name,
    /// the name column narrows and a longer name takes a line of its own above its values.
    /// </summary>
    private static IEnumerable<TextLine> Table(string[] header, IReadOnlyList<string[]> rows, int width)
    {
        var all = rows.Prepend(header).ToList();
        var columns = Enumerable.Range(1, header.Length - 1).Select(c => all.Max(r => r[c].Length)).ToArray();
        int values = columns.Sum(w => w + 2);
        // too narrow for a name column of 8: every name on its own line, the values under it, closer together
        bool stacked = width - values < 8;
        string gap = stacked ? " " : "  ";
        int name = stacked ? 1 : Math.Min(all.Max(r => r[0].Length), width - values);
        string Values(string[] r) => string.Concat(Enumerable.Range(1, r.Length - 1).Select(c => gap + r[c].PadLeft(columns[c - 1])));
        IEnumerable<TextLine> Row(string[] r, bool heading)
        {
            bool warning = r.Any(c => c.TrimEnd().EndsWith('!'));
            if (!stacked && r[0].Length <= name) { yield return new TextLine(TextFit.Cut(r[0].PadRight(name) + Values(r), width), warning, heading); yield break; }
            yield return new TextLine(TextFit.Cut(r[0], width), warning, heading);
            yield return new TextLine(TextFit.Cut(new string(' ', name) + Values(r), width), warning, heading);
        }
        foreach (var line in Row(header, heading: true)) yield return line;
        foreach (var r in rows)
            foreach (var line in Row(r, heading: false)) yield return line;
    }

    private static IEnumerable<TextLine> Wrapped(string text, int width, bool heading = false) =>
        TextFit.Wrap(text, width).Select(l => new TextLine(l, Heading: heading));
}
