using LevelDesign.Tests.Support;
using LevelDesign.Ui.Views;
using Terminal.Gui.Input;

namespace LevelDesign.Tests.Ui;

/// <summary>The terminal UI shows couplings as hardware (fixed coefficient, g here) and flags hybridized quantities.</summary>
[Collection("terminal ui")]
public class HardwareViewTests
{
    [Fact]
    public void Coupler_form_shows_the_fixed_coefficient_and_g_here()
    {
        using var ui = new UiHarness(100, 30, device: "pair.toml");
        ui.WaitIdle();
        ui.Press(Key.Home);
        for (int i = 0; i < 30 && !ui.Screen.Contains("Coupler: qa_qc"); i++) ui.Press(Key.CursorDown);
        string screen = ui.Screen;
        Assert.True(screen.Contains("coefficient") && screen.Contains("42.6092 MHz"), screen);
        Assert.True(screen.Contains("g here") && screen.Contains("100 MHz"), screen);
    }

    /// <summary>At the file's biases ZZ qa–qc is read from states of purity 0.937: flagged at a threshold of 0.95 set in the file.</summary>
    [Fact]
    public void Shifts_page_flags_quantities_below_the_file_threshold()
    {
        string folder = Directory.CreateTempSubdirectory("ld-ui-threshold").FullName;
        try
        {
            string path = Path.Combine(folder, "pair.toml");
            File.WriteAllText(path, File.ReadAllText(Path.Combine(RepositoryPaths.Devices, "pair.toml"))
                .Replace("name = \"pair\"", "name = \"pair\"\npurity_threshold = 0.95"));
            using var ui = new UiHarness(100, 40, open: s => s.OpenFile(path));
            ui.WaitIdle();
            ui.Window.ShowPage(Page.Shifts);
            ui.Draw();
            string screen = ui.Screen;
            Assert.True(screen.Contains("! = read from a state below purity 0.95"), screen);
            Assert.True(screen.Contains("-9.3358!"), screen);
            Assert.False(screen.Contains("-2.0114!"), screen);   // 2χ qa–ra: purity 0.972
        }
        finally { Directory.Delete(folder, true); }
    }

    /// <summary>Asks F9 for a target on the demo device and returns the screen with the roots offered.</summary>
    private static string TargetOffer(string request, int width, int height)
    {
        using var ui = new UiHarness(width, height, device: "pair.toml");
        ui.WaitIdle();
        ui.Press(Key.F9);
        ui.Replace(request);
        ui.Press(Key.Enter);
        ui.WaitForScreen("digit applies", 120000);
        return ui.Screen;
    }

    /// <summary>
    /// The untouched demo's zero-ZZ search over the whole coil range: the default 41-point scan puts a label jump in
    /// the same step as the root, so the scan alone offered only "jump, not a root" entries. Hybridized steps are now
    /// sampled finer, and the root the reference script finds (0.2512200622 Φ0 = 0.752928 mA,
    /// tests/reference/zz_zero_pair.py) is offered.
    /// </summary>
    [Fact]
    public void F9_finds_the_root_beside_a_label_jump_on_the_default_scan() =>
        Assert.Contains("0.752928 mA", TargetOffer("zz:qa:qb = 0 MHz by qc_flux 0.15 mA to 1.05 mA", 140, 40));

    [Fact]
    public void F9_remembers_the_last_entry_and_takes_a_scan_count()
    {
        using var ui = new UiHarness(120, 40, device: "pair.toml");
        ui.WaitIdle();
        ui.Press(Key.F9);
        ui.Replace("qa.f01 = 5.5 GHz by qa_flux 0 to 0.3 in 9");
        ui.Press(Key.Enter);
        ui.WaitForScreen("9-point scan", 60000);
        ui.WaitForScreen("digit applies", 120000);
        ui.Press(Key.Esc);
        ui.Press(Key.F9);
        Assert.Contains("qa.f01 = 5.5 GHz by qa_flux 0 to 0.3 in 9", ui.Screen);
        ui.Replace("qa.f01 = 5.5 GHz by qa_flux 0 to 0.3 in 2");
        ui.Press(Key.Enter);
        Assert.Contains("scan count must be a whole number from 3 to 2001", ui.Screen);
    }

    [Fact]
    public void F9_takes_a_relative_target() =>
        Assert.Contains("qa.f01 - qb.f01", TargetOffer("qa.f01 - qb.f01 = 700 MHz by qb_flux 0 to 0.3", 100, 30));

    [Fact]
    public void Tab_and_shift_tab_cycle_board_form_and_page()
    {
        using var ui = new UiHarness(80, 24);
        ui.WaitIdle();
        Assert.Equal("board", ui.Window.FocusedPanel);
        ui.Press(Key.Tab);
        Assert.Equal("form", ui.Window.FocusedPanel);
        ui.Press(Key.Tab);
        Assert.Equal("page", ui.Window.FocusedPanel);
        ui.Press(Key.Tab);
        Assert.Equal("board", ui.Window.FocusedPanel);
        ui.Press(Key.Tab.WithShift);
        Assert.Equal("page", ui.Window.FocusedPanel);
        ui.Press(Key.Tab.WithShift);
        Assert.Equal("form", ui.Window.FocusedPanel);
    }

    [Fact]
    public void The_focused_panel_has_a_double_line_that_moves_with_tab()
    {
        using var ui = new UiHarness(80, 24);
        ui.WaitIdle();
        var rows = ui.Screen.Split('\n');
        Assert.Contains(rows, r => r.Contains("╔╡Board╞"));          // the board has the focus at start
        Assert.Contains(rows, r => r.Contains("╭┤Parameters"));
        ui.Press(Key.Tab);
        rows = ui.Screen.Split('\n');
        Assert.Contains(rows, r => r.Contains("╭┤Board├"));
        Assert.Contains(rows, r => r.Contains("╔╡Parameters"));
    }

    [Fact]
    public void No_color_leaves_the_terminals_colours_and_marks_focus_by_reverse_video()
    {
        var scheme = LevelDesign.Ui.Views.Palette.MonochromeScheme();
        Assert.Equal(Terminal.Gui.Drawing.Color.None, scheme.Normal.Foreground);
        Assert.Equal(Terminal.Gui.Drawing.Color.None, scheme.Normal.Background);
        Assert.Equal(Terminal.Gui.Drawing.Color.None, scheme.Focus.Background);
        Assert.True(scheme.Focus.Style.HasFlag(Terminal.Gui.Drawing.TextStyle.Reverse));
        Assert.True(scheme.HotNormal.Style.HasFlag(Terminal.Gui.Drawing.TextStyle.Bold));
    }

    [Fact]
    public void Capital_L_shows_the_limits_as_the_help_says()
    {
        using var ui = new UiHarness(120, 40);
        ui.WaitIdle();
        ui.Press(Key.F1);
        Assert.DoesNotContain("Limits of the model", ui.Screen);
        ui.Press(Key.L.WithShift);
        Assert.Contains("Limits of the model", ui.Screen);
    }

    [Fact]
    public void Shifts_page_gives_the_purcell_t1_limit()
    {
        using var ui = new UiHarness(100, 60, device: "pair.toml");
        ui.WaitIdle();
        ui.Window.ShowPage(Page.Shifts);
        ui.Draw();
        Assert.Contains("qa via ra: γ = 4.015 kHz, T1 limit 39.6 µs", ui.Screen);
    }

    /// <summary>The README's zero-ZZ search in the UI: the one root lies where |qa1 qb1⟩ is hybridized, and F9 says so.</summary>
    [Fact]
    public void F9_marks_a_root_inside_a_hybridized_region() =>
        Assert.Contains("! hybridized, purity 0.6", TargetOffer("zz:qa:qb = 0 by qc_flux 0.7 mA to 0.8 mA", 120, 40));
}
