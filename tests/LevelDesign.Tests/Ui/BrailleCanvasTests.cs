using LevelDesign.Ui.Drawing;

namespace LevelDesign.Tests.Ui;

/// <summary>
/// Braille cells: the Unicode Standard, "Braille Patterns" block U+2800–U+28FF, assigns dot n of the 2×4
/// cell to bit n−1 of the offset from U+2800; dots 1-2-3 run down the left column, 4-5-6 down the right,
/// 7 and 8 are the bottom row (left, right).
/// </summary>
public class BrailleCanvasTests
{
    [Theory]
    [InlineData(0, 0, '\u2801')] // dot 1
    [InlineData(0, 1, '\u2802')] // dot 2
    [InlineData(0, 2, '\u2804')] // dot 3
    [InlineData(1, 0, '\u2808')] // dot 4
    [InlineData(1, 1, '\u2810')] // dot 5
    [InlineData(1, 2, '\u2820')] // dot 6
    [InlineData(0, 3, '\u2840')] // dot 7
    [InlineData(1, 3, '\u2880')] // dot 8
    public void Each_dot_sets_its_standard_bit(int x, int y, char expected)
    {
        var canvas = new BrailleCanvas(1, 1);
        canvas.Set(x, y);
        Assert.Equal(expected, canvas.CharAt(0, 0));
    }

    [Fact]
    public void A_full_cell_is_U28FF_and_dots_outside_are_ignored()
    {
        var canvas = new BrailleCanvas(2, 1);
        for (int x = 0; x < 2; x++) for (int y = 0; y < 4; y++) canvas.Set(x, y);
        canvas.Set(-1, 0);
        canvas.Set(0, 9);
        Assert.Equal('\u28FF', canvas.CharAt(0, 0));
        Assert.True(canvas.IsEmpty(1, 0));
        Assert.Equal("\u28FF ", canvas.RowText(0));
    }

    [Fact]
    public void A_horizontal_line_fills_the_top_row_of_dots_in_every_cell()
    {
        var canvas = new BrailleCanvas(3, 1);
        canvas.Line(0, 0, 5, 0);
        Assert.Equal("\u2809\u2809\u2809", canvas.RowText(0)); // dots 1 and 4
    }

    [Fact]
    public void A_diagonal_sets_one_dot_per_step()
    {
        var canvas = new BrailleCanvas(1, 1);
        canvas.Line(0, 0, 1, 1);
        Assert.Equal('\u2811', canvas.CharAt(0, 0)); // dots 1 and 5
    }
}
