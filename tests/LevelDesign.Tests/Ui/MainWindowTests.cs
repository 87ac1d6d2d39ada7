using System.Globalization;
using LevelDesign.Core.Composite;
using LevelDesign.Core.Sweeps;
using LevelDesign.Ui.Compute;
using LevelDesign.Ui.Views;
using Terminal.Gui.Input;

namespace LevelDesign.Tests.Ui;

/// <summary>
/// Screen tests: keys go in through the headless ANSI driver, assertions read the driver's text, as a user
/// at an 80×24 terminal would see it. Numbers shown are checked against Core's solver run independently.
/// </summary>
[Collection("terminal ui")]
public class MainWindowTests
{
    private static void Shows(string screen, string text) => Assert.True(screen.Contains(text), $"expected '{text}' on screen:\n{screen}");
    private static void Lacks(string screen, string text) => Assert.False(screen.Contains(text), $"did not expect '{text}' on screen:\n{screen}");

    [Fact]
    public void Opens_at_80x24_with_board_form_states_status_and_keys()
    {
        using var ui = new UiHarness();
        ui.WaitIdle();
        string screen = ui.Screen;
        Shows(screen, "qa  tunable_transmon");
        Shows(screen, "g_qa_ra  qa–ra");
        Shows(screen, "Parameters: qa");
        Shows(screen, "220 MHz");
        Shows(screen, "States at cursor");
        Shows(screen, "eigen ");
        Shows(screen, "trunc ");
        Shows(screen, "F1");
        Shows(screen, "Help");
        Shows(screen, "Sweep");
        // The states table shows the dressed qa1 frequency computed by Core (independent solve here).
        var spectrum = new DeviceSolver().Solve(ui.Session.Document!.Device);
        int k = spectrum.DressedIndexOf([1, 0, 0]);
        Shows(screen, "qa1");
        Shows(screen, spectrum.Energies[k].ToString("F4", CultureInfo.InvariantCulture));
    }

    [Fact]
    public void Edit_a_value_in_place_with_units_then_undo_and_redo()
    {
        using var ui = new UiHarness();
        ui.WaitIdle();
        ui.Press(Key.Enter);            // board → parameter form
        ui.Press(Key.Enter);            // edit "ec"
        Shows(ui.Screen, "elements.qa.ec =");
        ui.Replace("210 MHz");
        ui.Press(Key.Enter);
        ui.WaitForScreen("210 MHz");
        Assert.Equal(0.21, ui.Session.Document!.Device.GetParameter("qa.ec"), 12);
        Shows(ui.Screen, "● unsaved");

        ui.Press(Key.Z.WithCtrl);
        ui.WaitForScreen("220 MHz");
        Assert.Equal(0.22, ui.Session.Document!.Device.GetParameter("qa.ec"), 12);
        Lacks(ui.Screen, "● unsaved");

        ui.Press(Key.Y.WithCtrl);
        ui.WaitForScreen("210 MHz");
        Assert.Equal(0.21, ui.Session.Document!.Device.GetParameter("qa.ec"), 12);
    }

    [Fact]
    public void A_bad_value_is_refused_with_the_reason_and_the_old_value_stays()
    {
        using var ui = new UiHarness();
        ui.WaitIdle();
        ui.Press(Key.Enter, Key.Enter);
        ui.Replace("210 fF");
        ui.Press(Key.Enter);
        string screen = ui.Screen;
        Shows(screen, "✗");
        Shows(screen, "ec stays 220 MHz");
        Assert.Equal(0.22, ui.Session.Document!.Device.GetParameter("qa.ec"), 12);
        ui.Press(Key.Esc);
        Assert.False(ui.Window.Prompt.IsOpen);
        Shows(ui.Screen, "220 MHz");
        Assert.False(ui.Session.IsDirty);
    }

    [Fact]
    public void Sweep_runs_in_background_cursor_moves_and_states_follow_the_cursor()
    {
        using var ui = new UiHarness();
        ui.WaitIdle();
        ui.Press(Key.F5);
        Shows(ui.Screen, "qa_flux 0 0.5 61");
        ui.Press(Key.Enter);
        ui.WaitFor(() => ui.Window.LastSweep is { Completed: true }, "the sweep");
        string screen = ui.Screen;
        Shows(screen, "│ ≤2 excitations │");
        Assert.Contains(screen, c => c >= '\u2801' && c <= '\u28FF');   // braille dots drawn
        Shows(screen, "cursor qa_flux = 0.0000");

        for (int i = 0; i < 12; i++) ui.Press(Key.CursorRight);
        Assert.Equal(12, ui.Window.Spectrum.CursorIndex);
        Shows(ui.Screen, "qa_flux = 0.1000");

        ui.Press(Key.F3, Key.F3, Key.F3);   // spectrum → crossings → states → shifts? (cycle) back to states
        while (ui.Window.CurrentPage != Page.States) ui.Press(Key.F3);
        screen = ui.Screen;
        Shows(screen, "qa_flux = 0.1000 (point 13/61)");
        // The table row for qa1 equals the sweep point's own dressed energy.
        var point = ui.Window.LastSweep!.Points[12];
        int k = point.Spectrum.DressedIndexOf([1, 0, 0]);
        Shows(screen, point.Spectrum.Energies[k].ToString("F4", CultureInfo.InvariantCulture));
        // and agrees with an independent solve at qa.flux = 0.1.
        var direct = new DeviceSolver().Solve(ui.Session.Document!.Device.WithParameter("qa.flux", 0.1));
        Assert.Equal(direct.EnergyOf([1, 0, 0]), point.Spectrum.Energies[k], 9);
    }

    [Fact]
    public void Editing_after_a_sweep_reruns_it_after_a_pause_and_discards_the_stale_one()
    {
        using var ui = new UiHarness();
        ui.WaitIdle();
        ui.Press(Key.F5, Key.Enter);
        ui.WaitFor(() => ui.Window.LastSweep is { Completed: true }, "the first sweep");
        var first = ui.Window.LastSweep!;

        ui.Press(Key.Tab);
        ui.Window.ShowPage(Page.States);
        // edit qa.ej_sum through the form
        ui.Session.SetValue("elements.qa.ej_sum", "22 GHz");
        Assert.Contains("stale", ui.Window.Spectrum.Status);
        Assert.Same(first, ui.Window.LastSweep);     // nothing re-run before the pause
        ui.Scheduler.Advance(TimeSpan.FromSeconds(1));
        ui.WaitFor(() => !ReferenceEquals(first, ui.Window.LastSweep) && ui.Window.LastSweep!.Completed, "the re-run");
        double ejInSweep = ui.Window.LastSweep!.Points[0].Spectrum.Device.GetParameter("qa.ej_sum");
        Assert.Equal(22.0, ejInSweep, 12);
    }

    [Fact]
    public void Esc_cancels_a_running_sweep()
    {
        using var ui = new UiHarness();
        ui.WaitIdle();
        ui.Press(Key.F5);
        ui.Replace("qa_flux 0 0.5 2001");
        ui.Press(Key.Enter);
        Assert.True(ui.Window.IsComputing);
        ui.Press(Key.Esc);
        Shows(ui.Screen, "sweep cancelled");
        Thread.Sleep(300);
        ui.Scheduler.Pump();
        Assert.True(ui.Window.LastSweep is null || ui.Window.LastSweep.Points.Count < 2001);
    }

    [Fact]
    public void Save_writes_the_file_with_a_backup_and_clears_the_unsaved_mark()
    {
        string folder = Directory.CreateTempSubdirectory("ld-ui-").FullName;
        string path = Path.Combine(folder, "pair.log");
        File.WriteAllText(path, "# first version\n");
        using var ui = new UiHarness(open: s => s.OpenFile(path));
        ui.WaitIdle();
        ui.Press(Key.Enter, Key.Enter);
        ui.Replace("230 MHz");
        ui.Press(Key.Enter);
        ui.WaitForScreen("● unsaved");
        Assert.True(File.Exists(path + ".autosave"));
        ui.Press(Key.S.WithCtrl);
        string screen = ui.Screen;
        Lacks(screen, "● unsaved");
        Shows(screen, "saved");
        Assert.Contains("set elements.qa.ec = 230 MHz", File.ReadAllText(path));
        Assert.Equal("# first version\n", File.ReadAllText(path + ".bak"));
        Assert.False(File.Exists(path + ".autosave"));
    }

    [Fact]
    public void Quit_with_unsaved_changes_asks_first_and_discard_quits()
    {
        using var ui = new UiHarness();
        ui.WaitIdle();
        ui.Session.SetValue("elements.qa.ec", "200 MHz");
        ui.Press(Key.Q.WithCtrl);
        Shows(ui.Screen, "unsaved changes");
        Assert.False(ui.Window.QuitAllowed);
        ui.Press(Key.Esc);
        Assert.False(ui.Window.Prompt.IsOpen);
        Assert.False(ui.Window.QuitAllowed);
        ui.Press(Key.Q.WithCtrl);
        ui.Press(new Key('d'));
        Assert.True(ui.Window.QuitAllowed);
    }

    [Fact]
    public void Quit_without_changes_does_not_ask()
    {
        using var ui = new UiHarness();
        ui.WaitIdle();
        ui.Press(Key.Q.WithCtrl);
        Assert.True(ui.Window.QuitAllowed);
        Assert.False(ui.Window.Prompt.IsOpen);
    }

    [Fact]
    public void A_session_that_ended_without_saving_is_offered_for_recovery_on_the_next_start()
    {
        string folder = Directory.CreateTempSubdirectory("ld-ui-").FullName;
        string path = Path.Combine(folder, "pair.log");
        File.WriteAllText(path, "# saved\n");
        using (var first = new UiHarness(open: s => s.OpenFile(path)))
        {
            first.WaitIdle();
            first.Session.SetValue("elements.qb.ec", "205 MHz");
            // no save, no quit: the process "dies" here
        }
        Assert.True(File.Exists(path + ".autosave"));
        using var second = new UiHarness(open: s => s.OpenFile(path));
        Shows(second.Screen, "found edits not saved");
        Assert.Equal(0.21, second.Session.Document!.Device.GetParameter("qb.ec"), 12);   // offered, not forced
        second.Press(new Key('r'));
        second.WaitIdle();
        Assert.Equal(0.205, second.Session.Document!.Device.GetParameter("qb.ec"), 12);
        Shows(second.Screen, "● unsaved");
    }

    [Fact]
    public void A_bad_file_opens_with_its_errors_and_the_offending_lines()
    {
        string folder = Directory.CreateTempSubdirectory("ld-ui-").FullName;
        string path = Path.Combine(folder, "bad.log");
        File.WriteAllText(path, "# device\nset elements.qa.ec = 12 nH\n");
        using var ui = new UiHarness(open: s => s.OpenFile(path));
        string screen = ui.Screen;
        Assert.Equal(Page.Errors, ui.Window.CurrentPage);
        Shows(screen, "bad.log:2:1");
        Shows(screen, "2 │ set elements.qa.ec = 12 nH");
    }

    [Fact]
    public void Help_lists_keys_and_reaches_the_limits_of_the_model()
    {
        using var ui = new UiHarness(120, 40);
        ui.WaitIdle();
        ui.Press(Key.F1);
        string screen = ui.Screen;
        Shows(screen, "Keys");
        Shows(screen, "Ctrl+S");
        Shows(screen, "Ctrl+Z / Ctrl+Y");
        ui.Press(new Key('l'));
        Shows(ui.Screen, "Limits of the model");
        ui.Press(Key.F1);
        Assert.NotEqual(Page.Help, ui.Window.CurrentPage);
    }

    [Fact]
    public void Resize_to_120x40_shows_spectrum_and_states_together_and_back()
    {
        using var ui = new UiHarness();
        ui.WaitIdle();
        Lacks(ui.Screen, "Spectrum");
        ui.App.Driver!.SetScreenSize(120, 40);
        ui.Draw();
        string wide = ui.Screen;
        Shows(wide, "Spectrum");
        Shows(wide, "States at cursor");
        ui.App.Driver!.SetScreenSize(80, 24);
        ui.Draw();
        Lacks(ui.Screen, "Spectrum");
        Shows(ui.Screen, "States at cursor");
    }

    [Fact]
    public void Shifts_page_shows_chi_and_zz_with_units_and_conventions()
    {
        using var ui = new UiHarness(120, 40);
        ui.WaitIdle();
        ui.Press(Key.F3);
        string screen = ui.Screen;
        Shows(screen, "Shifts at cursor");
        Shows(screen, "MHz");
        Shows(screen, "2χ");
        Shows(screen, "ZZ");
        Shows(screen, "ζ = E11 − E10 − E01 + E00");
    }

    [Fact]
    public void Enter_on_a_crossing_moves_the_cursor_there()
    {
        using var ui = new UiHarness();
        ui.WaitIdle();
        ui.Press(Key.F5, Key.Enter);
        ui.WaitFor(() => ui.Window.LastSweep is { Completed: true }, "the sweep");
        while (ui.Window.CurrentPage != Page.Crossings) ui.Press(Key.F3);
        string screen = ui.Screen;
        Shows(screen, "gap");
        Shows(screen, "↔");
        var series = SpectrumSeries.From(ui.Window.LastSweep!, Manifold.UpToTwo);
        var first = NearApproachFinder.Find(series)[0];
        ui.Press(Key.Enter);
        Assert.Equal(Page.Spectrum, ui.Window.CurrentPage);
        Assert.Equal(first.PointIndex, ui.Window.Spectrum.CursorIndex);
    }

    [Fact]
    public void Structural_edits_through_the_kind_picker_rename_and_remove()
    {
        using var ui = new UiHarness();
        ui.WaitIdle();
        ui.Press(Key.InsertChar);
        Shows(ui.Screen, "add: t transmon");
        ui.Press(new Key('t'));
        ui.Type("qc");
        ui.Press(Key.Enter);
        ui.WaitForScreen("qc  transmon");
        Assert.Equal(4, ui.Session.Document!.Device.Elements.Count);

        // rename qa → qx: its couplers follow
        ui.Press(Key.Home);
        while (!ui.Screen.Contains("›    qa ") && !ui.Screen.Contains("›    qa  ")) ui.Press(Key.CursorDown);
        ui.Press(Key.F6);
        ui.Replace("qx");
        ui.Press(Key.Enter);
        ui.WaitForScreen("qx  tunable_transmon");
        Assert.Contains(ui.Session.Document!.Device.Couplers, c => c.Id == "g_qa_ra" && c.ElementA == "qx");

        ui.Press(Key.Delete);
        ui.Press(new Key('y'));
        ui.WaitFor(() => ui.Session.Document!.Device.IndexOf("qx") < 0, "qx removed");
        Assert.DoesNotContain(ui.Session.Document!.Device.Couplers, c => c.ElementA == "qx" || c.ElementB == "qx");
    }
}
