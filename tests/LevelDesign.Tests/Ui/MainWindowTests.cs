using System.Globalization;
using LevelDesign.Core.Analysis;
using LevelDesign.Core.Composite;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Sweeps;
using LevelDesign.Tests.Support;
using LevelDesign.Ui.Export;
using LevelDesign.Ui.Views;
using Terminal.Gui.Input;

namespace LevelDesign.Tests.Ui;

/// <summary>
/// Screen tests on copies of the example devices: keys go in through the headless ANSI driver, assertions read
/// the driver's text, as a user at an 80×24 terminal would see it. Numbers shown are checked against Core's
/// solver run independently.
/// </summary>
[Collection("terminal ui")]
public class MainWindowTests
{
    private static void Shows(string screen, string text) => Assert.True(screen.Contains(text), $"expected '{text}' on screen:\n{screen}");
    private static void Lacks(string screen, string text) => Assert.False(screen.Contains(text), $"did not expect '{text}' on screen:\n{screen}");

    /// <summary>Selects the board row of an element, coupler or bias id.</summary>
    private static void SelectOnBoard(UiHarness ui, string id)
    {
        ui.Press(Key.Home);
        for (int i = 0; i < 30 && !ui.Screen.Contains($"Parameters: {id}") && !ui.Screen.Contains($"Bias: {id}") && !ui.Screen.Contains($"Coupler: {id}"); i++)
            ui.Press(Key.CursorDown);
        Shows(ui.Screen, id);
    }

    /// <summary>From the board, opens the form and the edit box of the named field.</summary>
    private static void EditField(UiHarness ui, string element, string field)
    {
        SelectOnBoard(ui, element);
        ui.Press(Key.Enter);   // board → form
        for (int i = 0; i < 12; i++)
        {
            ui.Press(Key.Enter);
            if (ui.Window.Prompt.IsOpen && ui.Window.Prompt.Question.Contains($".{field} =")) return;
            if (ui.Window.Prompt.IsOpen) ui.Press(Key.Esc);
            ui.Press(Key.CursorDown);
        }
        throw new InvalidOperationException($"no field {field} on the form:\n{ui.Screen}");
    }

    [Fact]
    public void Opens_at_80x24_with_board_form_states_status_and_keys()
    {
        using var ui = new UiHarness();
        ui.WaitIdle();
        string screen = ui.Screen;
        Shows(screen, "q  tunable_transmon");
        Shows(screen, "q_r  q–r");
        Shows(screen, "Parameters: q");
        Shows(screen, "States at cursor");
        Shows(screen, "eigen ");
        Shows(screen, "trunc ");
        Shows(screen, "key values");
        Shows(screen, "F1");
        Shows(screen, "Sweep");
        // The states table shows the dressed q1 frequency computed by Core (independent solve here).
        var spectrum = new DeviceSolver().Solve(ui.Session.Document!.Device);
        Shows(screen, "q1");
        Shows(screen, spectrum.EnergyOf([1, 0]).ToString("F4", CultureInfo.InvariantCulture));
    }

    [Fact]
    public void Edit_a_value_in_place_with_units_then_undo_and_redo()
    {
        using var ui = new UiHarness();
        ui.WaitIdle();
        EditField(ui, "r", "frequency");
        ui.Replace("7 GHz");
        ui.Press(Key.Enter);
        ui.WaitForScreen("7 GHz");
        Assert.Equal(7.0, ui.Session.Document!.Device.GetParameter("r.frequency"), 12);
        Assert.Contains("frequency = \"7 GHz\"", File.ReadAllText(ui.FilePath + ".autosave"));
        Shows(ui.Screen, "● unsaved");

        ui.Press(Key.Z.WithCtrl);
        ui.WaitForScreen("6.9 GHz");
        Assert.Equal(6.9, ui.Session.Document!.Device.GetParameter("r.frequency"), 12);
        Lacks(ui.Screen, "● unsaved");

        ui.Press(Key.Y.WithCtrl);
        ui.WaitForScreen("7 GHz");
        Assert.Equal(7.0, ui.Session.Document!.Device.GetParameter("r.frequency"), 12);
    }

    [Fact]
    public void A_bad_value_is_refused_with_the_reason_and_the_old_value_stays()
    {
        using var ui = new UiHarness();
        ui.WaitIdle();
        EditField(ui, "r", "frequency");
        ui.Replace("210 fF");
        ui.Press(Key.Enter);
        string screen = ui.Screen;
        Shows(screen, "✗");
        Shows(screen, "frequency stays 6.9 GHz");
        Assert.Equal(6.9, ui.Session.Document!.Device.GetParameter("r.frequency"), 12);
        ui.Press(Key.Esc);
        Assert.False(ui.Window.Prompt.IsOpen);
        Assert.False(ui.Session.IsDirty);
    }

    [Fact]
    public void A_value_set_by_a_bias_says_so_and_its_edit_goes_to_the_bias()
    {
        using var ui = new UiHarness(120, 40);
        ui.WaitIdle();
        SelectOnBoard(ui, "q");
        Shows(ui.Screen, "flux        0.1 Φ0 ← bias q_flux");
        EditField(ui, "q", "value");
        Shows(ui.Screen, "biases.q_flux.value =");
        ui.Replace("0.2");
        ui.Press(Key.Enter);
        ui.WaitIdle();
        Assert.Equal(0.2, ui.Session.Document!.Bias("q_flux")!.Value, 12);
        Assert.Equal(0.2, ui.Session.Document!.Device.GetParameter("q.flux"), 12);
        Assert.Contains("value = 0.2\n", ui.Session.Document!.ToText());
        Assert.Contains("flux = 0.1 ", ui.Session.Document!.ToText());   // the element's own value is not the one edited
    }

    [Fact]
    public void Sweep_runs_in_background_cursor_moves_and_states_follow_the_cursor()
    {
        using var ui = new UiHarness();
        ui.WaitIdle();
        ui.Press(Key.F5);
        Shows(ui.Screen, "flux_scan");   // the file's own sweep is offered first
        ui.Press(Key.Enter);
        ui.WaitFor(() => ui.Window.LastSweep is { Completed: true }, "the sweep");
        string screen = ui.Screen;
        Assert.Contains(screen, c => c >= '\u2801' && c <= '\u28FF');   // braille dots drawn
        Shows(screen, "cursor q_flux = 0 Φ0");   // in the unit of the file's bias

        for (int i = 0; i < 10; i++) ui.Press(Key.CursorRight);
        Assert.Equal(10, ui.Window.Spectrum.CursorIndex);
        Shows(ui.Screen, "q_flux = 0.1 Φ0");

        while (ui.Window.CurrentPage != Page.States) ui.Press(Key.F3);
        screen = ui.Screen;
        Shows(screen, "q_flux = 0.1 Φ0 (point 11/51)");
        var point = ui.Window.LastSweep!.Points[10];
        Shows(screen, point.Spectrum.EnergyOf([1, 0]).ToString("F4", CultureInfo.InvariantCulture));
        // and agrees with an independent solve with the bias at 0.1 (target q.flux = 0.1 through the bias)
        var direct = new DeviceSolver().Solve(ui.Session.Document!.Device.WithParameter("q.flux", 0.1));
        Assert.Equal(direct.EnergyOf([1, 0]), point.Spectrum.EnergyOf([1, 0]), 9);
    }

    [Fact]
    public void Editing_after_a_sweep_reruns_it_after_a_pause_and_discards_the_stale_one()
    {
        using var ui = new UiHarness();
        ui.WaitIdle();
        ui.Press(Key.F5, Key.Enter);
        ui.WaitFor(() => ui.Window.LastSweep is { Completed: true }, "the first sweep");
        var first = ui.Window.LastSweep!;

        ui.Window.ShowPage(Page.States);
        ui.Session.SetValue("elements.r.frequency", "7.1 GHz");
        Assert.Contains("stale", ui.Window.Spectrum.Status);
        Assert.Same(first, ui.Window.LastSweep);     // nothing re-run before the pause
        ui.Scheduler.Advance(TimeSpan.FromSeconds(1));
        ui.WaitFor(() => !ReferenceEquals(first, ui.Window.LastSweep) && ui.Window.LastSweep!.Completed, "the re-run");
        Assert.Equal(7.1, ui.Window.LastSweep!.Points[0].Spectrum.Device.GetParameter("r.frequency"), 12);
    }

    [Fact]
    public void Esc_cancels_a_running_sweep()
    {
        using var ui = new UiHarness();
        ui.WaitIdle();
        ui.Press(Key.F5);
        ui.Replace("q_flux 0 0.5 2001");
        ui.Press(Key.Enter);
        Assert.True(ui.Window.IsComputing);
        ui.Press(Key.Esc);
        Shows(ui.Screen, "sweep cancelled");
        Thread.Sleep(300);
        ui.Scheduler.Pump();
        Assert.True(ui.Window.LastSweep is null || ui.Window.LastSweep.Points.Count < 2001);
    }

    [Fact]
    public void Save_writes_the_toml_file_with_a_backup_and_clears_the_unsaved_mark()
    {
        using var ui = new UiHarness();
        string original = File.ReadAllText(ui.FilePath!);
        ui.WaitIdle();
        EditField(ui, "r", "frequency");
        ui.Replace("7 GHz");
        ui.Press(Key.Enter);
        ui.WaitForScreen("● unsaved");
        Assert.True(File.Exists(ui.FilePath + ".autosave"));
        ui.Press(Key.S.WithCtrl);
        string screen = ui.Screen;
        Lacks(screen, "● unsaved");
        Shows(screen, "saved");
        Assert.Equal(original.Replace("frequency = \"6.9 GHz\"", "frequency = \"7 GHz\""), File.ReadAllText(ui.FilePath!));
        Assert.Equal(original, File.ReadAllText(ui.FilePath + ".bak"));
        Assert.False(File.Exists(ui.FilePath + ".autosave"));
        Assert.True(DeviceDocument.Load(ui.FilePath!).Ok);
    }

    [Fact]
    public void Quit_with_unsaved_changes_asks_first_and_discard_quits()
    {
        using var ui = new UiHarness();
        ui.WaitIdle();
        ui.Session.SetValue("elements.r.frequency", "7 GHz");
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
        string path = UiHarness.CopyDevice("single.toml", folder);
        using (var first = new UiHarness(open: s => s.OpenFile(path)))
        {
            first.WaitIdle();
            first.Session.SetValue("elements.r.frequency", "7.05 GHz");
            // no save, no quit: the process "dies" here
        }
        Assert.True(File.Exists(path + ".autosave"));
        using var second = new UiHarness(open: s => s.OpenFile(path));
        Shows(second.Screen, "found edits not saved");
        Assert.Equal(6.9, second.Session.Document!.Device.GetParameter("r.frequency"), 12);   // offered, not forced
        second.Press(new Key('r'));
        second.WaitIdle();
        Assert.Equal(7.05, second.Session.Document!.Device.GetParameter("r.frequency"), 12);
        Shows(second.Screen, "● unsaved");
    }

    [Fact]
    public void A_bad_file_opens_with_its_errors_and_the_offending_lines()
    {
        string path = Path.Combine(RepositoryPaths.Malformed, "wrong_unit_ec.toml");
        var expected = DeviceDocument.Load(path).Errors[0];
        using var ui = new UiHarness(open: s => s.OpenFile(path));
        string screen = ui.Screen;
        Assert.Equal(Page.Errors, ui.Window.CurrentPage);
        Shows(screen, $"wrong_unit_ec.toml:{expected.Line}:{expected.Column}");
        string offending = File.ReadAllLines(path)[expected.Line - 1];
        Shows(screen, $"{expected.Line} │ {offending[..Math.Min(offending.Length, 20)]}");
    }

    [Fact]
    public void A_bad_value_is_fixed_in_place_and_the_fix_saved()
    {
        string folder = Directory.CreateTempSubdirectory("ld-fix-").FullName;
        try
        {
            string path = Path.Combine(folder, "wrong_unit_ec.toml");
            File.Copy(Path.Combine(RepositoryPaths.Malformed, "wrong_unit_ec.toml"), path);
            string original = File.ReadAllText(path);
            using var ui = new UiHarness(open: s => s.OpenFile(path));
            Assert.Equal(Page.Errors, ui.Window.CurrentPage);
            Shows(ui.Screen, "F2 fixes");
            ui.Press(Key.F2);
            Shows(ui.Screen, "fix line 7 [elements.qa.ec]");
            ui.Replace("fF");            // still a capacitance: refused, the errors stay listed
            ui.Press(Key.Enter);
            Assert.Null(ui.Session.Document);
            Assert.Equal(original, File.ReadAllText(path));
            ui.Press(Key.Esc);
            ui.Press(Key.F2);
            ui.Replace("230 MHz");
            ui.Press(Key.Enter);
            ui.WaitIdle();
            Assert.NotNull(ui.Session.Document);
            Assert.Equal(0.23, ui.Session.Document!.Device.GetParameter("qa.ec"), 12);
            Shows(ui.Screen, "● unsaved");
            Assert.Equal(original, File.ReadAllText(path));   // nothing written before a save
            ui.Press(Key.S.WithCtrl);
            ui.WaitIdle();
            var before = original.Split('\n');
            var after = File.ReadAllText(path).Split('\n');
            Assert.Equal(before.Length, after.Length);
            var changed = Enumerable.Range(0, before.Length).Where(i => before[i] != after[i]).ToArray();
            Assert.Equal([6], changed);
            Assert.Equal("ec = \"230 MHz\"", after[6].Trim());
            Assert.Equal(original, File.ReadAllText(path + ".bak"));
        }
        finally { Directory.Delete(folder, recursive: true); }
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
        Shows(screen, "F9 fit");
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
    public void Shifts_page_shows_chi_and_the_truncation_check_of_the_key_values_in_kHz()
    {
        using var ui = new UiHarness(100, 60);
        ui.WaitIdle();
        ui.Press(Key.F3);
        string screen = ui.Screen;
        Shows(screen, "Shifts at cursor");
        Shows(screen, "2χ");
        Shows(screen, "Truncation");
        Shows(screen, "kHz");
        // the rows are the key values of an independent convergence check, with the same verdicts
        var device = ui.Session.Document!.Device;
        var entries = TruncationConvergence.Check(new DeviceSolver(), device);
        foreach (var name in new[] { "q.f01", "q.anharmonicity", "chi2:q:r" })
        {
            var entry = entries.Single(e => e.Quantity == name);
            Shows(screen, $"{(entry.Flagged ? "✗" : "✓")} {name}");
        }
        Lacks(screen, "✓ r.f12");   // resonator levels are not key values
    }

    [Fact]
    public void Crossings_come_from_core_ranked_by_distance_to_the_operating_point_and_Enter_goes_there()
    {
        using var ui = new UiHarness();
        ui.WaitIdle();
        ui.Press(Key.F5, Key.Enter);
        ui.WaitFor(() => ui.Window.LastSweep is { Completed: true }, "the sweep");
        // the crossings message does not hide the sweep's own summary (the search follows the sweep at once)
        ui.WaitForScreen("found, F3 lists them", 120000);
        Shows(ui.Screen, "sweep done:");
        while (ui.Window.CurrentPage != Page.Crossings) ui.Press(Key.F3);
        ui.WaitForScreen("↔", 120000);
        Shows(ui.Screen, "nearest to the file's operating points first");
        var sweep = ui.Window.LastSweep!;
        // an independent run of the finder on the same sweep: the first row is its nearest crossing to sweet_spot (q_flux = 0)
        var document = ui.Session.Document!;
        var options = LevelDesign.Ui.Controllers.SweepController.CrossingOptionsFor(document, sweep);
        Assert.Equal([0.0], options.OperatingPoints);   // sweet_spot sets q_flux = 0
        var found = CrossingFinder.Find(sweep, x => document.Resolve(sweep.Plan.Axes, [x]), options);
        Assert.NotEmpty(found);
        var distances = found.Select(c => c.DistanceToOperatingPoint!.Value).ToList();
        Assert.Equal(distances.Order(), distances);
        ui.Press(Key.Enter);
        Assert.Equal(Page.Spectrum, ui.Window.CurrentPage);
        int nearest = Enumerable.Range(0, sweep.Points.Count).MinBy(i => Math.Abs(sweep.Points[i].AxisValues[0] - found[0].Bias));
        Assert.Equal(nearest, ui.Window.Spectrum.CursorIndex);
    }

    [Fact]
    public void At_120_columns_the_crossings_page_shows_purity_and_the_nearest_named_point_and_at_80_leaves_them_out()
    {
        using var ui = new UiHarness(120, 40);
        ui.WaitIdle();
        ui.Press(Key.F5, Key.Enter);
        ui.WaitFor(() => ui.Window.LastSweep is { Completed: true }, "the sweep");
        while (ui.Window.CurrentPage != Page.Crossings) ui.Press(Key.F3);
        ui.WaitForScreen("↔", 120000);
        var header = ui.Screen.Split('\n').Single(r => r.Contains("crossing ", StringComparison.Ordinal) && r.Contains("gap MHz", StringComparison.Ordinal));
        Assert.Contains("purity", header);
        Assert.Contains("nearest point", header);
        var first = ui.Screen.Split('\n').First(r => r.Contains(" 1 ", StringComparison.Ordinal) && r.Contains('↔'));
        // single.toml names one point, sweet_spot (q_flux = 0); the row gives the lower purity with three decimals
        Assert.Matches(@"\b[01]\.\d{3}\s+sweet_spot .+ away", first);
        ui.App.Driver!.SetScreenSize(80, 24);
        ui.Draw();
        string narrow = ui.Screen;
        Assert.Contains("↔", narrow);
        Assert.DoesNotContain("nearest point", narrow);
    }

    [Fact]
    public void A_target_lists_its_roots_and_a_digit_applies_one_as_an_undoable_bias_edit()
    {
        using var ui = new UiHarness();
        ui.WaitIdle();
        ui.Press(Key.F9);
        ui.Replace("q.f01 = 5.5 GHz by q_flux 0 to 0.5");
        ui.Press(Key.Enter);
        ui.WaitForScreen("digit applies", 120000);
        var searched = ui.Session.Document!;
        ui.Press(new Key('1'));
        ui.WaitIdle();
        double flux = ui.Session.Document!.Bias("q_flux")!.Value;
        Assert.InRange(flux, 0.0, 0.5);
        // the device as searched (couplings converted at the file's reference point) meets the target at the applied bias;
        // the applied value is the file's new reference point, where g is converted anew
        var quantities = DerivedQuantities.From(new DeviceSolver().Solve(searched.At(new Dictionary<string, double> { ["q_flux"] = flux }))).Named();
        Assert.Equal(5.5, quantities["q.f01"], 6);
        ui.Press(Key.Z.WithCtrl);
        Assert.Equal(0.1, ui.Session.Document!.Bias("q_flux")!.Value, 12);
    }

    [Fact]
    public void A_sweep_exports_as_an_svg_plot()
    {
        using var ui = new UiHarness(plots: new SpectrumPlotExporter());
        ui.WaitIdle();
        ui.Press(Key.F5, Key.Enter);
        ui.WaitFor(() => ui.Window.LastSweep is { Completed: true }, "the sweep");
        string svg = Path.Combine(Path.GetDirectoryName(ui.FilePath)!, "spectrum.svg");
        ui.Press(Key.F8);
        ui.Replace(svg);
        ui.Press(Key.Enter);
        ui.WaitFor(() => File.Exists(svg), "the plot file");   // the status line may already show the crossings message
        Assert.False(ui.Window.Prompt.IsOpen);
        Assert.Contains("<svg", File.ReadAllText(svg));
    }

    [Fact]
    public void Structural_edits_through_the_kind_picker_rename_and_remove()
    {
        using var ui = new UiHarness();
        ui.WaitIdle();
        ui.Press(Key.InsertChar);
        Shows(ui.Screen, "add: t transmon");
        ui.Press(new Key('t'));
        Assert.Equal("t1", ui.Window.Prompt.InputText);   // an unused id is offered
        ui.Replace("q2");
        ui.Press(Key.Enter);
        ui.WaitForScreen("q2  transmon");
        Assert.Equal(3, ui.Session.Document!.Device.Elements.Count);
        Assert.Contains("# default values for a new transmon", ui.Session.Document!.ToText());

        // rename q → qx: its coupler and bias follow
        SelectOnBoard(ui, "q");
        ui.Press(Key.F6);
        ui.Replace("qx");
        ui.Press(Key.Enter);
        ui.WaitForScreen("qx  tunable_transmon");
        Assert.Contains(ui.Session.Document!.Device.Couplers, c => c.Id == "q_r" && c.ElementA == "qx");
        Assert.Equal("qx.flux", ui.Session.Document!.Bias("q_flux")!.Target);

        ui.Press(Key.Delete);
        Shows(ui.Screen, "with coupler q_r, bias q_flux");
        ui.Press(new Key('y'));
        ui.WaitFor(() => ui.Session.Document!.Device.IndexOf("qx") < 0, "qx removed");
        Assert.Empty(ui.Session.Document!.Device.Couplers);
        Assert.Empty(ui.Session.Document!.Biases);
        ui.Press(Key.Z.WithCtrl);
        Assert.True(ui.Session.Document!.Device.IndexOf("qx") >= 0);
    }

    [Fact]
    public void Insert_offers_every_kind_selects_what_it_added_and_makes_a_defect_with_a_custom_coupler()
    {
        using var ui = new UiHarness();
        ui.WaitIdle();
        foreach (var kind in LevelDesign.Core.Kinds.ElementKindCatalog.All)
        {
            ui.Press(Key.InsertChar);
            Shows(ui.Screen, $"{kind.InsertLetter} {kind.InsertName}");
            ui.Press(new Key(kind.InsertLetter));
            Assert.Equal(ui.Session.Document!.NewElementId(kind.InsertLetter.ToString()), ui.Window.Prompt.InputText);
            ui.Replace($"e{kind.InsertLetter}");
            ui.Press(Key.Enter);
            ui.WaitForScreen($"e{kind.InsertLetter}  {kind.Name}");
            Shows(ui.Screen, $"Parameters: e{kind.InsertLetter}");   // the new element is the one selected
        }
        // a custom coupler between the qubit and the new two-level defect, through its transition operator
        ui.Press(Key.InsertChar);
        Shows(ui.Screen, "o custom");
        ui.Press(new Key('o'));
        ui.Replace("q_tls q ed n sx 4 MHz");
        ui.Press(Key.Enter);
        ui.WaitFor(() => ui.Session.Document!.Device.Couplers.Any(c => c.Id == "q_tls"), "the custom coupler");
        var coupler = ui.Session.Document!.Device.Couplers.Single(c => c.Id == "q_tls");
        Assert.Equal(("q", "n", "ed", "sx"), (coupler.ElementA, coupler.OperatorA, coupler.ElementB, coupler.OperatorB));
        Shows(ui.Screen, "Coupler: q_tls");
    }

    [Fact]
    public void Levels_and_basis_size_are_edited_in_the_form()
    {
        using var ui = new UiHarness();
        ui.WaitIdle();
        EditField(ui, "q", "levels");
        ui.Replace("5");
        ui.Press(Key.Enter);
        ui.WaitFor(() => ui.Session.Document!.Device.Truncation.LevelsOf("q") == 5, "q keeps 5 levels");
        EditField(ui, "q", "basis_size");
        ui.Replace("41");
        ui.Press(Key.Enter);
        ui.WaitFor(() => ui.Session.Document!.ValueTextOf("elements.q.basis_size") == "41", "basis_size written");
        // out of range: refused with the reason, the device unchanged
        EditField(ui, "q", "levels");
        ui.Replace("1");
        ui.Press(Key.Enter);
        Assert.True(ui.Window.Prompt.IsOpen);
        Assert.Equal(5, ui.Session.Document!.Device.Truncation.LevelsOf("q"));
        ui.Press(Key.Esc);

        ui.Press(Key.Esc);
    }

    [Fact]
    public void Saving_does_not_rerun_the_sweep()
    {
        using var ui = new UiHarness();
        ui.WaitIdle();
        ui.Press(Key.F5, Key.Enter);
        ui.WaitFor(() => ui.Window.LastSweep is { Completed: true }, "the sweep");
        ui.Session.SetValue("elements.r.frequency", "7 GHz");
        ui.Scheduler.Advance(TimeSpan.FromSeconds(1));
        ui.WaitFor(() => ui.Window.LastSweep!.Points[0].Spectrum.Device.GetParameter("r.frequency") == 7.0 && !ui.Window.IsComputing, "the re-run");
        var sweep = ui.Window.LastSweep;
        ui.Press(Key.S.WithCtrl);
        ui.Scheduler.Advance(TimeSpan.FromSeconds(1));
        Assert.False(ui.Window.IsComputing);
        Assert.Same(sweep, ui.Window.LastSweep);
    }

    [Fact]
    public void A_device_with_a_level_list_is_checked_for_convergence_and_shows_its_states()
    {
        using var ui = new UiHarness(100, 70, device: "defect.toml");
        ui.WaitIdle();
        // the check raises every cutoff except past a level list's given states
        var device = ui.Session.Document!.Device;
        TruncationConvergence.Check(new DeviceSolver(), device);
        string screen = ui.Screen;
        Assert.DoesNotContain("not checked", screen);
        Shows(screen, "trunc");
        Shows(screen, new DeviceSolver().Solve(device).EnergyOf([1, 0, 0]).ToString("F4", CultureInfo.InvariantCulture));
    }
}
