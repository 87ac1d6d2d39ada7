using LevelDesign.Core.Presentation;
using LevelDesign.Ui.Text;
using LevelDesign.Ui.Views;
using Terminal.Gui.Input;

namespace LevelDesign.Tests.Ui;

/// <summary>A two-axis sweep from the screen and its map: shading, cursor, readout, the chosen quantity.</summary>
[Collection("terminal ui")]
public class MapPageTests
{
    [Fact]
    public void A_two_axis_sweep_shows_a_map_whose_cursor_reads_the_point_and_moves_with_the_arrows()
    {
        using var ui = new UiHarness(100, 34);
        ui.WaitIdle();
        ui.Press(Key.F5);
        ui.Replace("q_flux 0 0.4 5; r.frequency 6.8 GHz 7.0 GHz 4");
        ui.Press(Key.Enter);
        ui.WaitFor(() => ui.Window.LastSweep is { Completed: true }, "the sweep", 120000);
        Assert.Equal(Page.Map, ui.Window.CurrentPage);
        var sweep = ui.Window.LastSweep!;
        Assert.Equal(20, sweep.Points.Count);
        string name = ui.Window.MapQuantity(sweep);
        Assert.Equal("q.f01", name);   // no ZZ on a one-qubit device: the first qubit's f01
        string screen = ui.Screen;
        Assert.Contains("q.f01 over q_flux → and r.frequency ↑", screen);
        Assert.Contains(MapText.Cursor.ToString(), screen);

        // the cursor starts at the first point; the readout is that point's value
        var first = sweep.Points.Single(p => p.AxisValues[0] == 0 && p.AxisValues[1] == 6.8);
        Assert.True(screen.Replace("║", "").Replace("\n", "").Contains($"q_flux = 0 Φ0, r.frequency = 6.8 GHz: q.f01 = {FrequencyText.Of(name, first.Quantities[name])}"), screen);

        while (ui.Window.FocusedPanel != "page") ui.Press(Key.Tab);
        ui.Press(Key.CursorRight, Key.CursorRight, Key.CursorUp);
        var moved = sweep.Points.Single(p => Math.Abs(p.AxisValues[0] - 0.2) < 1e-12 && Math.Abs(p.AxisValues[1] - (6.8 + 0.2 / 3)) < 1e-12);
        Assert.True(ui.Screen.Replace("║", "").Replace("\n", "").Contains($"q.f01 = {FrequencyText.Of(name, moved.Quantities[name]).Split(' ')[0]}"), ui.Screen);
        // the states page shows the cursor's point
        ui.Window.ShowPage(Page.States);
        Assert.Contains("q_flux = 0.2", ui.Screen);
        ui.Window.ShowPage(Page.Map);

        ui.Press(Key.Enter);
        ui.Replace("q.f12");
        ui.Press(Key.Enter);
        Assert.Contains("q.f12 over q_flux", ui.Screen);
        ui.Press(Key.Enter);
        ui.Replace("q.f99");
        ui.Press(Key.Enter);
        Assert.Contains("not computed along this sweep", ui.Screen);
        ui.Press(Key.Esc);

        // an axis that is a parameter path cannot be kept in an operating point
        ui.Press(new Key('p'));
        Assert.Contains("the sweep moves r.frequency directly", ui.Screen.Replace("\n", ""));
    }

    [Fact]
    public void The_glyph_ramp_runs_light_to_dark_marks_hybridized_cells_and_leaves_missing_ones_blank()
    {
        Assert.Equal(MapText.Ramp[0], MapText.Glyph(0, false, 0, 10));
        Assert.Equal(MapText.Ramp[^1], MapText.Glyph(10, false, 0, 10));
        Assert.Equal(MapText.Ramp[2], MapText.Glyph(5, false, 0, 10));
        Assert.Equal(MapText.Hybridized, MapText.Glyph(5, true, 0, 10));
        Assert.Equal(' ', MapText.Glyph(double.NaN, false, 0, 10));
        Assert.DoesNotContain(MapText.Ramp, c => c > 0x7F && c is not ('·' or '░' or '▒' or '▓' or '█'));
    }

    [Fact]
    public void A_grid_taller_than_the_page_is_sampled_so_the_legend_and_the_cursor_reading_stay_on_screen()
    {
        var values = new double[31, 40];
        var hybridized = new bool[31, 40];
        for (int i = 0; i < 31; i++)
            for (int j = 0; j < 40; j++) values[i, j] = 1e-3 * (i - j);
        var quantity = new QuantitySeries("zz:qa:qb", false, new double[1], new double[1]);
        var lines = MapText.Build(quantity, values, hybridized, ("qa_flux", "0", "0.5"), ("qc_flux", "0.15 mA", "1 mA"),
            (3, 7), "qa_flux = 0.05, qc_flux = 0.3 mA", width: 46, height: 20);
        Assert.True(lines.Count <= 20, string.Join("\n", lines.Select(l => l.Text)));
        string all = string.Join(" ", lines.Select(l => l.Text));
        Assert.Contains($"zz:qa:qb = {FrequencyText.Of("zz:qa:qb", values[3, 7])}", all);
        Assert.Contains(lines.TakeLast(5), l => l.Text.Contains('≥'));   // the legend just above the reading
        Assert.All(lines, l => Assert.True(l.Text.Length <= 46, l.Text));
    }

    [Fact]
    public void The_prompt_refuses_a_third_axis_the_same_bias_twice_and_grids_larger_than_the_screen_takes()
    {
        using var ui = new UiHarness(100, 30);
        ui.WaitIdle();
        foreach (var (text, expected) in new[]
        {
            ("q_flux 0 0.4 5; q_flux 0 0.2 5", "both axes sweep q_flux"),
            ("q_flux 0 0.4 5; r.frequency 6.8 7 4; q.ec 0.2 0.22 3", "at most two axes"),
            ("q_flux 0 0.4 101; r.frequency 6.8 7 101", "more than the screen's"),
        })
        {
            ui.Press(Key.F5);
            ui.Replace(text);
            ui.Press(Key.Enter);
            Assert.True(ui.Window.Prompt.IsOpen, text);
            Assert.Contains(expected, ui.Screen.Replace("\n", "").Replace("│", ""));
            ui.Press(Key.Esc);
        }
    }
}
