namespace LevelDesign.Ui.Drawing;

/// <summary>
/// A dot grid at 2×4 dots per character cell, rendered as braille characters U+2800–U+28FF, so curves are
/// drawn at sub-character resolution. Dot (0,0) is the top-left of the canvas.
/// </summary>
public sealed class BrailleCanvas
{
    // Bit of each dot inside a cell, indexed [column, row] (the braille dot numbering 1-8).
    private static readonly int[,] DotBits = { { 0x01, 0x02, 0x04, 0x40 }, { 0x08, 0x10, 0x20, 0x80 } };
    private readonly int[,] _cells;

    public BrailleCanvas(int columns, int rows)
    {
        Columns = Math.Max(0, columns);
        Rows = Math.Max(0, rows);
        _cells = new int[Columns, Rows];
    }

    public int Columns { get; }
    public int Rows { get; }
    public int DotWidth => Columns * 2;
    public int DotHeight => Rows * 4;

    public void Set(int x, int y)
    {
        if (x < 0 || y < 0 || x >= DotWidth || y >= DotHeight) return;
        _cells[x / 2, y / 4] |= DotBits[x % 2, y % 4];
    }

    /// <summary>A straight segment between two dots (Bresenham), clipped to the canvas.</summary>
    public void Line(int x0, int y0, int x1, int y1)
    {
        int dx = Math.Abs(x1 - x0), dy = -Math.Abs(y1 - y0);
        int sx = x0 < x1 ? 1 : -1, sy = y0 < y1 ? 1 : -1, err = dx + dy;
        // Long segments far outside the canvas are cut short to keep drawing cheap.
        for (int guard = 0; guard < 4 * (DotWidth + DotHeight) + 8; guard++)
        {
            Set(x0, y0);
            if (x0 == x1 && y0 == y1) break;
            int e2 = 2 * err;
            if (e2 >= dy) { err += dy; x0 += sx; }
            if (e2 <= dx) { err += dx; y0 += sy; }
        }
    }

    public bool IsEmpty(int column, int row) => _cells[column, row] == 0;

    public char CharAt(int column, int row) => (char)(0x2800 + _cells[column, row]);

    public string RowText(int row)
    {
        var chars = new char[Columns];
        for (int c = 0; c < Columns; c++) chars[c] = _cells[c, row] == 0 ? ' ' : CharAt(c, row);
        return new string(chars);
    }
}
