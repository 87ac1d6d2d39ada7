using System.Globalization;
using System.Numerics;
using System.Text;
using System.Text.Json.Nodes;
using LevelDesign.Core.Composite;

namespace LevelDesign.Core.Presentation;

/// <summary>⟨i|op|j⟩ between dressed states as a table of magnitudes (with the complex values below) and as JSON.</summary>
public static class MatrixElementReport
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    public const string Convention =
        "⟨i|op|j⟩ with op acting on its element (identity on the others), i and j dressed states; each dressed state's overall " +
        "phase is arbitrary, so off-diagonal signs and phases are not meaningful, magnitudes are";

    public static string Table(DressedSpectrum s, string element, string op, IReadOnlyList<int> states, Complex[,] m)
    {
        var b = new StringBuilder();
        b.AppendLine($"|⟨i|{element}.{op}|j⟩| between dressed states of {s.Device.Name}");
        b.AppendLine(Convention);
        var labels = states.Select(k => $"{k}:{Core.Presentation.StateNames.OfBare(s, s.Labels[k].BareIndex)}").ToArray();
        int width = Math.Max(12, labels.Max(l => l.Length) + 2);
        double scale = 0;
        foreach (var z in m) scale = Math.Max(scale, z.Magnitude);
        b.Append(new string(' ', width));
        foreach (var l in labels) b.Append(l.PadLeft(width));
        b.AppendLine();
        for (int r = 0; r < states.Count; r++)
        {
            b.Append(labels[r].PadRight(width));
            for (int c = 0; c < states.Count; c++) b.Append(Cell(m[r, c].Magnitude, scale).PadLeft(width));
            b.AppendLine();
        }
        b.AppendLine();
        b.AppendLine("complex values (real, imaginary) on and above the diagonal, where not negligible (below 1e-10 of the largest is shown as 0):");
        for (int r = 0; r < states.Count; r++)
            for (int c = r; c < states.Count; c++)
                if (m[r, c].Magnitude > Negligible * scale)
                    b.AppendLine(string.Create(Inv, $"  ⟨{labels[r]}|{op}|{labels[c]}⟩ = ({m[r, c].Real:G6}, {m[r, c].Imaginary:G6})"));
        return b.ToString();
    }

    /// <summary>Rounding noise of the eigenvectors, relative to the largest element: shown as 0.</summary>
    /// <summary>Magnitudes at or below this fraction of the largest in the table are rounding noise, shown as zero.</summary>
    public const double Negligible = 1e-10;

    private static string Cell(double magnitude, double scale) => IsNegligible(magnitude, scale) ? "0" : magnitude.ToString("G5", Inv);

    public static bool IsNegligible(double magnitude, double scale) => magnitude <= Negligible * scale;

    public static JsonObject Json(DressedSpectrum s, string element, string op, IReadOnlyList<int> states, Complex[,] m)
    {
        var rows = new JsonArray();
        for (int r = 0; r < states.Count; r++)
            for (int c = 0; c < states.Count; c++)
                rows.AddNode(new JsonObject
                {
                    ["i"] = states[r],
                    ["j"] = states[c],
                    ["real"] = JsonValues.Number(m[r, c].Real),
                    ["imag"] = JsonValues.Number(m[r, c].Imaginary),
                    ["abs"] = JsonValues.Number(m[r, c].Magnitude),
                });
        return new JsonObject
        {
            ["device"] = s.Device.Name,
            ["element"] = element,
            ["operator"] = op,
            ["states"] = new JsonArray(states.Select(k => (JsonNode)new JsonObject
            {
                ["index"] = k,
                ["label"] = Core.Presentation.StateNames.Json(s, s.Labels[k].BareIndex),
                ["text"] = Core.Presentation.StateNames.OfBare(s, s.Labels[k].BareIndex),
                ["energy_ghz"] = JsonValues.Number(s.Energies[k]),
                ["purity"] = JsonValues.Number(s.Labels[k].Purity),
            }).ToArray()),
            ["elements"] = rows,
            ["convention"] = Convention,
            ["limits_of_model"] = Core.Analysis.Conventions.LimitsOfModel,
        };
    }
}
