using LevelDesign.Ui.Views;
using Terminal.Gui.Input;

namespace LevelDesign.Tests.Ui;

/// <summary>Zoom on the spectrum page: the frequency axis about the cursor's level, the bias axis about the cursor.</summary>
[Collection("terminal ui")]
public class SpectrumZoomTests
{
    private static UiHarness SweptDemo()
    {
        var ui = new UiHarness(100, 30, device: "pair.toml");
        ui.WaitIdle();
        ui.Press(Key.F5, Key.Enter);
        ui.WaitFor(() => ui.Window.LastSweep is { Completed: true }, "the sweep");
        ui.Window.ShowPage(Page.Spectrum);
        while (ui.Window.FocusedPanel != "page") ui.Press(Key.Tab);
        return ui;
    }

    [Fact]
    public void Greater_than_zooms_the_bias_axis_about_the_cursor_the_window_follows_it_and_home_fits_again()
    {
        using var ui = SweptDemo();
        var spectrum = ui.Window.Spectrum;
        var axis = spectrum.Series!.Axis;
        spectrum.SetCursor(20);
        var (fullLow, fullHigh) = spectrum.BiasRange();
        ui.Press(new Key('>'));
        var (low, high) = spectrum.BiasRange();
        Assert.Equal((fullHigh - fullLow) / 2, high - low, 12);
        Assert.Equal(axis[20], (low + high) / 2, 12);   // centred on the cursor (not near an end here)
        Assert.Contains(ui.Window.Spectrum.Series!.AxisName, ui.Screen);
        // the axis line names the window's ends in the file's unit
        Assert.Contains(ShownBias(ui, low), ui.Screen);

        spectrum.SetCursor(axis.Length - 1);   // beyond the window: it moves to keep the cursor
        (low, high) = spectrum.BiasRange();
        Assert.InRange(axis[^1], low, high + 1e-15);
        Assert.Equal((fullHigh - fullLow) / 2, high - low, 12);

        ui.Press(new Key('<'));
        Assert.Equal((fullLow, fullHigh), spectrum.BiasRange());   // zoomed out to the whole sweep
        ui.Press(new Key('>'), new Key('>'), Key.Home);
        Assert.Equal((fullLow, fullHigh), spectrum.BiasRange());
    }

    [Fact]
    public void Plus_zooms_the_frequency_axis_about_the_level_at_the_cursor_nearest_the_middle()
    {
        using var ui = SweptDemo();
        var spectrum = ui.Window.Spectrum;
        spectrum.SetCursor(5);
        var (low, high) = spectrum.Range();
        double middle = (low + high) / 2;
        double level = spectrum.Series!.Branches.Select(b => b.Frequencies[5]).Where(double.IsFinite).MinBy(f => Math.Abs(f - middle));
        ui.Press(new Key('+'));
        var (zoomLow, zoomHigh) = spectrum.Range();
        Assert.Equal((high - low) / 2, zoomHigh - zoomLow, 9);
        Assert.Equal(level, (zoomLow + zoomHigh) / 2, 9);
    }

    private static string ShownBias(UiHarness ui, double value) =>
        Core.Presentation.ShownUnit.Of(ui.Session.Document, ui.Window.Spectrum.Series!.AxisName).Text(value);
}
