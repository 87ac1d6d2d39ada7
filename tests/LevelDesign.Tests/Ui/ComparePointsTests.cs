using System.Globalization;
using LevelDesign.Core.Composite;
using LevelDesign.Core.Presentation;
using LevelDesign.Ui.Compute;
using LevelDesign.Ui.Views;
using Terminal.Gui.Input;

namespace LevelDesign.Tests.Ui;

/// <summary>
/// The everyday idle-versus-gate comparison: the file's operating points on the board, Enter shows a point's states,
/// a and b mark two points, the comparison page lists both with B − A, and p saves the sweep cursor as a new point.
/// </summary>
[Collection("terminal ui")]
public class ComparePointsTests
{
    private static void SelectOnBoard(UiHarness ui, string startsWith)
    {
        ui.Press(Key.Home);
        for (int i = 0; i < 40 && !ui.Screen.Split('\n').Any(r => r.Contains($"›    {startsWith}", StringComparison.Ordinal)); i++) ui.Press(Key.CursorDown);
        Assert.Contains($"›    {startsWith}", ui.Screen);
    }

    [Fact]
    public void Enter_on_a_named_point_shows_its_states_a_and_b_mark_and_the_page_gives_the_difference()
    {
        using var ui = new UiHarness(100, 30, device: "pair.toml");
        ui.WaitIdle();
        var document = ui.Session.Document!;
        SelectOnBoard(ui, "coupler_low");
        Assert.Contains("points (2)", ui.Screen);
        Assert.Contains("coupler_low  qc_flux 0.75", ui.Screen);
        ui.Press(Key.Enter);
        ui.WaitForScreen("At point coupler_low (qc_flux 0.75 mA)");
        // the states are those of the device at the point, computed independently here
        var atPoint = PointComputer.Compute(document.AtPoint("coupler_low"), checkConvergence: false, CancellationToken.None);
        int qa1 = atPoint.Spectrum.DressedIndexOf([1, 0, 0, 0, 0]);
        Assert.Contains(LevelDesign.Ui.Text.Numbers.GHz(atPoint.Spectrum.Energies[qa1]), ui.Screen);

        ui.Press(new Key('b'));
        while (ui.Window.CurrentPage != Page.Compare) ui.Press(Key.F3);
        string screen = ui.Screen;
        Assert.Contains("A: the biases in the file", screen);
        Assert.Contains("B: point coupler_low (qc_flux 0.75 mA)", screen);
        var file = ui.Window.LastSnapshot!;
        double delta = atPoint.Quantities.Named()["qb.f01"] - file.Quantities.Named()["qb.f01"];
        var row = screen.Split('\n').Single(r => r.Contains("qb.f01 ", StringComparison.Ordinal));
        Assert.Contains(FrequencyText.Of("qb.f01", delta), row);
        Assert.Contains(FrequencyText.Of("qb.f01", file.Quantities.Named()["qb.f01"]), row);

        // Esc goes back to the file's biases; a marks them as A explicitly
        ui.Press(Key.Esc);
        ui.Press(new Key('a'));
        Assert.Contains("A = the biases in the file", ui.Screen);
    }

    [Fact]
    public void Editing_the_shown_point_s_bias_value_computes_it_again_at_the_new_value()
    {
        using var ui = new UiHarness(100, 30, device: "pair.toml");
        ui.WaitIdle();
        SelectOnBoard(ui, "coupler_low");
        ui.Press(Key.Enter);
        ui.WaitForScreen("At point coupler_low (qc_flux 0.75 mA)");
        ui.Press(Key.Tab);
        Assert.Equal("form", ui.Window.FocusedPanel);
        ui.Press(Key.Enter);
        Assert.True(ui.Window.Prompt.IsOpen, ui.Screen);
        ui.Replace("0.7 mA");
        ui.Press(Key.Enter);
        Assert.Equal(0.7e-3, ui.Session.Document!.Points.Single(p => p.Name == "coupler_low").BiasValues["qc_flux"], 15);
        ui.WaitForScreen("At point coupler_low (qc_flux 0.7 mA)");
        var atPoint = PointComputer.Compute(ui.Session.Document!.AtPoint("coupler_low"), checkConvergence: false, CancellationToken.None);
        Assert.Contains(LevelDesign.Ui.Text.Numbers.GHz(atPoint.Spectrum.Energies[atPoint.Spectrum.DressedIndexOf([0, 0, 1, 0, 0])]), ui.Screen);
    }

    [Fact]
    public void P_saves_the_sweep_cursor_as_an_operating_point_in_the_file_s_unit_and_undo_removes_it()
    {
        using var ui = new UiHarness(100, 30, device: "pair.toml");
        ui.WaitIdle();
        ui.Press(new Key('p'));
        Assert.Contains("run a sweep (F5)", ui.Screen);
        ui.Press(Key.F5, Key.Enter);
        ui.WaitFor(() => ui.Window.LastSweep is { Completed: true }, "the sweep");
        ui.Window.ShowPage(Page.Spectrum);
        ui.Window.Spectrum.SetCursor(10);
        double bias = ui.Window.LastSweep!.Points[10].AxisValues[0];
        var (sweepBefore, snapshotBefore) = (ui.Window.LastSweep, ui.Window.LastSnapshot);
        ui.Press(new Key('p'));
        Assert.True(ui.Window.Prompt.IsOpen, ui.Screen);
        ui.Replace("gate");
        ui.Press(Key.Enter);
        Assert.False(ui.Window.Prompt.IsOpen, ui.Screen);
        // a new point leaves the device as it was: neither the sweep nor the file's point is computed again
        Thread.Sleep(1000);
        _ = ui.Screen;
        Assert.False(ui.Window.IsComputing);
        Assert.Same(sweepBefore, ui.Window.LastSweep);
        Assert.Same(snapshotBefore, ui.Window.LastSnapshot);
        var point = ui.Session.Document!.Points.Single(p => p.Name == "gate");
        Assert.Equal(bias, point.BiasValues["qc_flux"], 12);
        Assert.Contains("[points.gate]", ui.Session.Document!.Text);
        Assert.Contains(" mA\"", ui.Session.Document!.Text[ui.Session.Document!.Text.IndexOf("[points.gate]", StringComparison.Ordinal)..]);
        Assert.True(ui.Screen.Contains("›    gate  qc_flux ", StringComparison.Ordinal), ui.Screen);   // the new point is selected on the board
        ui.Press(Key.Z.WithCtrl);
        Assert.DoesNotContain(ui.Session.Document!.Points, p => p.Name == "gate");

        // a taken name is refused in the prompt
        ui.Window.Spectrum.SetCursor(10);
        ui.Press(new Key('p'));
        ui.Replace("idle");
        ui.Press(Key.Enter);
        Assert.True(ui.Window.Prompt.IsOpen);
        Assert.Contains("already used", ui.Screen);
        ui.Press(Key.Esc);
    }
}
