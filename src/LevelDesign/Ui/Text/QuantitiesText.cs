using LevelDesign.Core.Presentation;
using LevelDesign.Ui.Drawing;

namespace LevelDesign.Ui.Text;

/// <summary>
/// The page of quantities along the sweep: for each chosen quantity a small braille chart against the swept bias
/// (axis in the unit the file uses for it, the cursor's column marked ┊ as on the spectrum), with its value at the
/// cursor (! when read from hybridized states) and its range over the points whose states are above the purity threshold
/// (values from hybridized states are clipped to that range); purities dipping below the threshold are flagged.
/// </summary>
public static class QuantitiesText
{
    private const int AxisWidth = 12;

    public static IReadOnlyList<TextLine> Build(IReadOnlyList<QuantitySeries> series, double[] axis, int cursor, ShownUnit unit, string axisName,
        int width, int height, double purityThreshold)
    {
        var lines = new List<TextLine>();
        if (series.Count == 0 || axis.Length == 0)
        {
            lines.Add(new TextLine("Run a sweep (F5) first; then this page plots quantities along it."));
            lines.Add(new TextLine("Enter chooses them: zz:qa:qb, qa.f01, chi2:qa:ra, purity:qa1 … separated by commas."));
            return lines;
        }
        lines.Add(new TextLine(TextFit.Cut($"Along {unit.Caption(axisName)}; cursor {unit.Text(axis[cursor])} (point {cursor + 1}/{axis.Length}) · Enter chooses quantities", width), Heading: true));
        int plotColumns = Math.Max(4, width - AxisWidth - 1);
        // each chart: a title line, its rows, and a blank line; at least 3 rows each
        int rows = Math.Clamp((height - 2) / series.Count - 2, 3, 10);
        double xMin = axis[0], xMax = axis[^1];
        if (xMax == xMin) xMax = xMin + 1;
        foreach (var s in series)
        {
            var finite = s.Reliable(purityThreshold);
            double at = s.Values[cursor];
            bool low = s.IsPurity && finite.Length > 0 && finite.Min() < purityThreshold;
            bool hybridizedHere = !s.IsPurity && s.Purities[cursor] < purityThreshold;
            int hybridized = s.IsPurity ? 0 : s.Purities.Count(p => p < purityThreshold);
            string range = finite.Length == 0 ? "not computed along this sweep"
                : $"{s.Text(at)}{(hybridizedHere ? " !" : "")} · {s.Tick(finite.Min())} to {s.Tick(finite.Max())}"
                  + (low ? $" · below {purityThreshold:0.##} !" : "") + (hybridized > 0 ? $" · {hybridized} hybridized point(s) left out of the range" : "");
            lines.Add(new TextLine(TextFit.Cut($"{s.Name}: {range}", width), Warning: low, Heading: !low));
            if (finite.Length == 0) continue;
            double lowY = finite.Min(), highY = finite.Max();
            if (s.IsPurity) { lowY = Math.Min(lowY, purityThreshold); highY = 1; }
            if (highY == lowY) { highY += Math.Max(1e-12, Math.Abs(highY) * 1e-6); lowY -= Math.Max(1e-12, Math.Abs(lowY) * 1e-6); }
            var canvas = new BrailleCanvas(plotColumns, rows);
            int DotX(double x) => (int)Math.Round((x - xMin) / (xMax - xMin) * (canvas.DotWidth - 1));
            int DotY(double y) => (int)Math.Round((highY - y) / (highY - lowY) * (canvas.DotHeight - 1));
            int? px = null, py = null;
            for (int i = 0; i < axis.Length; i++)
            {
                if (!double.IsFinite(s.Values[i])) { px = py = null; continue; }
                // values from hybridized states may lie far outside the range: clipped to its edge
                int x = DotX(axis[i]), y = Math.Clamp(DotY(s.Values[i]), 0, canvas.DotHeight - 1);
                if (px is int a && py is int b) canvas.Line(a, b, x, y); else canvas.Set(x, y);
                (px, py) = (x, y);
            }
            int cursorColumn = Math.Clamp(DotX(axis[cursor]) / 2, 0, plotColumns - 1);
            for (int r = 0; r < rows; r++)
            {
                string tick = r == 0 ? s.Tick(highY) : r == rows - 1 ? s.Tick(lowY) : "";
                var row = canvas.RowText(r).ToCharArray();
                if (row[cursorColumn] == ' ' || row[cursorColumn] == '\u2800') row[cursorColumn] = '┊';
                lines.Add(new TextLine(TextFit.Cut(tick, AxisWidth - 1).PadLeft(AxisWidth - 1) + (r == 0 || r == rows - 1 ? "┤" : "│") + new string(row).Replace('\u2800', ' ')));
            }
        }
        lines.Add(new TextLine(new string(' ', AxisWidth) + TextFit.Cut($"{unit.Text(axis[0])} … {unit.Caption(axisName)} … {unit.Text(axis[^1])}", plotColumns)));
        return lines;
    }
}
