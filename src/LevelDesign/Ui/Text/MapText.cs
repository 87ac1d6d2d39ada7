using LevelDesign.Core.Presentation;

namespace LevelDesign.Ui.Text;

/// <summary>
/// The map page of a two-axis sweep: one quantity over the grid as shaded cells (first axis across, second up), a
/// glyph ramp that reads without colour, the cursor cell, a legend with the value of each shade and a readout of the
/// cursor's point. Cells read from states below the purity threshold show "!" and stay out of the shading range.
/// </summary>
public static class MapText
{
    /// <summary>Light to dark: the lowest values lightest. Plain characters, so NO_COLOR terminals show the same map.</summary>
    public const string Ramp = "·░▒▓█";
    public const char Hybridized = '!';
    public const char Cursor = '◆';

    /// <summary>Columns left of the map for the second axis's tick labels.</summary>
    private const int TickWidth = 12;

    /// <param name="values">values[i, j] at the first axis's i-th and the second axis's j-th value (NaN: not computed).</param>
    /// <param name="hybridized">Cells whose value is read from hybridized labels.</param>
    /// <param name="axisX">The first axis: name and its values as text (ends used).</param>
    public static IReadOnlyList<TextLine> Build(QuantitySeries quantity, double[,] values, bool[,] hybridized,
        (string Name, string First, string Last) axisX, (string Name, string First, string Last) axisY,
        (int I, int J) cursor, string cursorWhere, int width, int height)
    {
        int nx = values.GetLength(0), ny = values.GetLength(1);
        var lines = new List<TextLine>();
        lines.AddRange(TextFit.Wrap($"{quantity.Name} over {axisX.Name} → and {axisY.Name} ↑", width).Select(l => new TextLine(l, Heading: true)));
        var reliable = new List<double>();
        for (int i = 0; i < nx; i++)
            for (int j = 0; j < ny; j++)
                if (double.IsFinite(values[i, j]) && !hybridized[i, j]) reliable.Add(values[i, j]);
        if (reliable.Count == 0)
            for (int i = 0; i < nx; i++)
                for (int j = 0; j < ny; j++)
                    if (double.IsFinite(values[i, j])) reliable.Add(values[i, j]);
        double low = reliable.Count > 0 ? reliable.Min() : 0, high = reliable.Count > 0 ? reliable.Max() : 1;
        if (high <= low) high = low + 1e-30;

        // as many cells as fit: each grid point one character when it fits, else the nearest point per cell
        int columns = Math.Max(4, Math.Min(nx, width - TickWidth - 1));
        // the legend and the cursor's reading are laid out first, so the map takes only the rows left (the reading stays on screen)
        var legend = TextFit.Wrap(Legend(quantity, low, high), width).Select(l => new TextLine(l)).ToList();
        double at = values[cursor.I, cursor.J];
        string reading = double.IsFinite(at) ? quantity.Text(at) + (hybridized[cursor.I, cursor.J] ? " ! hybridized" : "") : "not computed";
        var readout = TextFit.Wrap($"{Cursor} {cursorWhere}: {quantity.Name} = {reading}", width)
            .Select(l => new TextLine(l, Warning: hybridized[cursor.I, cursor.J])).ToList();
        int rows = Math.Max(3, Math.Min(ny, height - lines.Count - 2 - legend.Count - readout.Count));
        int Sample(int cell, int cells, int points) => cells >= points ? cell : (int)Math.Round(cell * (points - 1.0) / Math.Max(1, cells - 1));
        int CellOf(int point, int cells, int points) => cells >= points ? point : (int)Math.Round(point * (cells - 1.0) / Math.Max(1, points - 1));
        int cursorColumn = CellOf(cursor.I, columns, nx), cursorRow = CellOf(cursor.J, rows, ny);
        for (int r = rows - 1; r >= 0; r--)
        {
            int j = Sample(r, rows, ny);
            string tick = r == rows - 1 ? axisY.Last : r == 0 ? axisY.First : "";
            var cells = new char[columns];
            for (int c = 0; c < columns; c++)
            {
                int i = Sample(c, columns, nx);
                cells[c] = c == cursorColumn && r == cursorRow ? Cursor : Glyph(values[i, j], hybridized[i, j], low, high);
            }
            lines.Add(new TextLine(TextFit.Cut(tick, TickWidth - 1).PadLeft(TickWidth - 1) + "│" + new string(cells)));
        }
        lines.Add(new TextLine(new string(' ', TickWidth - 1) + "└" + new string('─', columns)));
        string ends = axisX.First.PadRight(Math.Max(axisX.First.Length + 1, columns - axisX.Last.Length)) + axisX.Last;
        lines.Add(new TextLine(TextFit.Cut(new string(' ', TickWidth) + ends, width)));
        lines.AddRange(legend);
        lines.AddRange(readout);
        return lines;
    }

    /// <summary>The shade for a value between the shading range's ends; "!" when read from hybridized states, blank when missing.</summary>
    public static char Glyph(double value, bool hybridized, double low, double high)
    {
        if (!double.IsFinite(value)) return ' ';
        if (hybridized) return Hybridized;
        int level = (int)Math.Floor((value - low) / (high - low) * Ramp.Length);
        return Ramp[Math.Clamp(level, 0, Ramp.Length - 1)];
    }

    /// <summary>Each shade with the lower end of its band; "!" and the cursor explained.</summary>
    public static string Legend(QuantitySeries quantity, double low, double high) =>
        string.Join("  ", Ramp.Select((g, k) => $"{g} ≥{quantity.Tick(low + (high - low) * k / Ramp.Length)}"))
        + $"  {Hybridized} hybridized  {Cursor} cursor";
}
