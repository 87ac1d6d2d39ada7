using System.Globalization;
using System.Numerics;
using LevelDesign.Core.Composite;
using LevelDesign.Core.Presentation;

namespace LevelDesign.Ui.Text;

/// <summary>
/// The matrix-elements page: |⟨i|op|j⟩| of one element operator between the lowest dressed states at the cursor, as
/// a square table with as many states as fit the page (rows named, columns numbered), then the convention. Values
/// are computed by Core (<see cref="Core.Analysis.DressedMatrixElements"/>); this only lays them out.
/// </summary>
public static class MatrixElementsText
{
    /// <summary>Columns of one value, with its leading space.</summary>
    private const int CellWidth = 7;

    /// <summary>States shown at most, however wide the page.</summary>
    public const int MaxStates = 12;

    /// <summary>How many states the table holds on a page <paramref name="width"/> columns wide.</summary>
    public static int StatesThatFit(DressedSpectrum spectrum, int width)
    {
        int fit = (width - RowNameWidth(spectrum, spectrum.Count, 0)) / CellWidth;
        return Math.Clamp(fit, 2, Math.Min(MaxStates, spectrum.Count));
    }

    /// <param name="matrix">⟨i|op|j⟩ for states 0…n−1 (rows, columns), n = matrix size.</param>
    public static IReadOnlyList<TextLine> Build(DressedSpectrum spectrum, string elementId, string operatorName, Complex[,] matrix,
        string where, int width, double purityThreshold = Core.Analysis.Conventions.DefaultPurityThreshold)
    {
        int n = matrix.GetLength(0);
        var lines = new List<TextLine>();
        lines.AddRange(TextFit.Wrap($"|⟨i|{elementId}.{operatorName}|j⟩| at {where}", width).Select(l => new TextLine(l, Heading: true)));
        int nameWidth = RowNameWidth(spectrum, n, purityThreshold);
        double scale = 0;
        foreach (var z in matrix) scale = Math.Max(scale, z.Magnitude);
        string header = new string(' ', nameWidth) + string.Concat(Enumerable.Range(0, n).Select(j => j.ToString(CultureInfo.InvariantCulture).PadLeft(CellWidth)));
        lines.Add(new TextLine(header, Heading: true));
        for (int i = 0; i < n; i++)
        {
            string name = RowName(spectrum, i, purityThreshold).PadRight(nameWidth);
            lines.Add(new TextLine(Warning: spectrum.Labels[i].Purity < purityThreshold, Text: name + string.Concat(Enumerable.Range(0, n).Select(j => Cell(matrix[i, j].Magnitude, scale).PadLeft(CellWidth)))));
        }
        lines.Add(new TextLine(""));
        string note = string.Create(CultureInfo.InvariantCulture, $"! a state below purity {purityThreshold:0.##} (its label is hybridized); · below 1e-10 of the largest. ")
                      + MatrixElementReport.Convention
                      + $". Enter chooses ELEMENT.OPERATOR; {n} of {spectrum.Count} computed states fit this width (F4 widens).";
        lines.AddRange(TextFit.WrapLines(note, width, indent: "  ").Select(l => new TextLine(l)));
        return lines;
    }

    /// <summary>A magnitude in at most six characters: three decimals, or one significant digit below 0.001.</summary>
    public static string Cell(double magnitude, double scale)
    {
        if (MatrixElementReport.IsNegligible(magnitude, scale)) return "·";
        if (magnitude >= 100) return magnitude.ToString("0", CultureInfo.InvariantCulture);
        if (magnitude >= 10) return magnitude.ToString("0.0", CultureInfo.InvariantCulture);
        if (magnitude >= 0.0005) return magnitude.ToString("0.000", CultureInfo.InvariantCulture);
        return magnitude.ToString("0e0", CultureInfo.InvariantCulture);
    }

    /// <summary>"! 3 qa1": the dressed index and label, marked when the state's purity is below the threshold.</summary>
    private static string RowName(DressedSpectrum spectrum, int k, double purityThreshold) =>
        $"{(spectrum.Labels[k].Purity < purityThreshold ? "!" : " ")}{k,2} {TextFit.Cut(StateNames.OfDressed(spectrum, k), 10)}";

    private static int RowNameWidth(DressedSpectrum spectrum, int n, double purityThreshold) =>
        Enumerable.Range(0, Math.Max(1, Math.Min(n, spectrum.Count))).Max(k => RowName(spectrum, k, purityThreshold).Length) + 1;
}
