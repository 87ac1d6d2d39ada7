using LevelDesign.Ui.Views;
using Terminal.Gui.Input;

namespace LevelDesign.Tests.Ui;

/// <summary>
/// Nothing a designer needs is cut off at 80×24 (the smallest size supported over SSH): the key bar fits and ends
/// with the F1 hint, the bias marker of the form is shortened rather than cut, the F9 question reads whole, long
/// messages wrap, and no page shows a cut line ("…") anywhere while it is scrolled through.
/// </summary>
[Collection("terminal ui")]
public class NarrowScreenTests
{
    /// <summary>Every entry the key bar may show, written out by hand: a drawn entry must be one of these, whole.</summary>
    private static readonly HashSet<string> KeyEntries =
    [
        "Esc Stop", "F2 Edit", "F2 Fix", "F3 Page", "F5 Sweep", "F9 Target", "F4 Wide", "F7 Manifold", "F8 Export",
        "^S Save", "^Z Undo", "^Q Quit", "Ctrl+S Save", "Ctrl+Z Undo", "Ctrl+Q Quit", "F1 Help", "F1 all keys", "F1 Back",
    ];

    private static string[] Rows(UiHarness ui) => ui.Screen.Split('\n').Select(r => r.TrimEnd('\r')).ToArray();

    /// <summary>The key bar's entries, read from the screen (the row above the window's bottom border).</summary>
    private static string[] KeyBar(UiHarness ui)
    {
        string row = Rows(ui).Last(r => r.Contains("F1 ", StringComparison.Ordinal));
        string inner = row.Trim().Trim('│').Trim();
        return inner.Split("  ", StringSplitOptions.RemoveEmptyEntries).Select(e => e.Trim()).ToArray();
    }

    private static void AllWhole(string[] entries) =>
        Assert.All(entries, e => Assert.True(KeyEntries.Contains(e), $"key bar entry '{e}' is not a whole entry: {string.Join(" | ", entries)}"));

    [Fact]
    public void At_80_columns_the_key_bar_fits_with_whole_entries_and_ends_with_F1_all_keys()
    {
        using var ui = new UiHarness(80, 24, device: "pair.toml");
        ui.WaitIdle();
        var entries = KeyBar(ui);
        AllWhole(entries);
        Assert.Equal("F1 all keys", entries[^1]);
        Assert.Contains("F2 Edit", entries);
        Assert.Contains("F5 Sweep", entries);
        Assert.Contains("^S Save", entries);
        Assert.Contains("^Q Quit", entries);
    }

    [Fact]
    public void At_120_columns_every_key_is_on_the_bar_written_in_full()
    {
        using var ui = new UiHarness(120, 40, device: "pair.toml");
        ui.WaitIdle();
        var entries = KeyBar(ui);
        AllWhole(entries);
        foreach (var key in new[] { "F2", "F3", "F4", "F5", "F7", "F8", "F9", "Ctrl+S", "Ctrl+Z", "Ctrl+Q" })
            Assert.Contains(entries, e => e.StartsWith(key + " ", StringComparison.Ordinal));
        Assert.Equal("F1 Help", entries[^1]);
    }

    [Fact]
    public void Keys_left_off_the_narrow_bar_still_work()
    {
        using var ui = new UiHarness(80, 24);
        ui.WaitIdle();
        Assert.DoesNotContain("F7 Manifold", KeyBar(ui));
        ui.Press(Key.F7);
        Assert.Contains("spectrum shows", ui.Screen);
        ui.Press(Key.F8);
        Assert.True(ui.Window.Prompt.IsOpen);
        Assert.StartsWith("export to", ui.Window.Prompt.Question);
        ui.Press(Key.Esc);
        ui.Press(Key.F1);
        Assert.Equal(Page.Help, ui.Window.CurrentPage);
        Assert.Equal("F1 Back", KeyBar(ui)[^1]);
    }

    [Fact]
    public void The_bias_marker_is_shortened_at_80_columns_and_whole_at_100()
    {
        using (var narrow = new UiHarness(80, 24, device: "pair.toml"))
        {
            narrow.WaitIdle();
            string screen = narrow.Screen;
            Assert.Contains("Parameters: qa", screen);
            Assert.Matches(@"flux +0 Φ0 ← qa_flux", screen);
            Assert.DoesNotContain("← bias qa_", screen);
        }
        using var wide = new UiHarness(100, 30, device: "pair.toml");
        wide.WaitIdle();
        Assert.Matches(@"flux +0 Φ0 ← bias qa_flux", wide.Screen);
    }

    [Fact]
    public void The_F9_question_reads_whole_at_80_columns()
    {
        using var ui = new UiHarness(80, 24, device: "pair.toml");
        ui.WaitIdle();
        ui.Press(Key.F9);
        var rows = Rows(ui);
        var lines = LevelDesign.Ui.Controllers.TargetsController.Question.Split('\n');
        Assert.Contains(rows, r => r.Contains("» " + lines[0], StringComparison.Ordinal));
        Assert.Contains(rows, r => r.Contains("  " + lines[1], StringComparison.Ordinal));
        Assert.Contains(rows, r => r.Contains("Enter accept · Esc cancel", StringComparison.Ordinal));
    }

    [Fact]
    public void A_long_offer_is_shortened_but_keeps_its_keys_line()
    {
        using var ui = new UiHarness(80, 24);
        ui.WaitIdle();
        string values = string.Join(" · ", Enumerable.Range(1, 30).Select(i => $"q{i}.ec = {200 + i} MHz"));
        ui.Window.Prompt.Choose($"fit (3 steps): {values}.\na applies · Esc leave", new Dictionary<char, Action> { ['a'] = () => { } });
        var rows = Rows(ui);
        Assert.Contains(rows, r => r.Contains("» fit (3 steps): q1.ec = 201 MHz", StringComparison.Ordinal));
        Assert.Contains(rows, r => r.TrimEnd().TrimEnd('│', '║').TrimEnd().EndsWith('…'));
        Assert.Contains(rows, r => r.Contains("  a applies · Esc leave", StringComparison.Ordinal));
        ui.Press(Key.Esc);
    }

    [Fact]
    public void A_long_status_message_wraps_instead_of_being_cut()
    {
        using var ui = new UiHarness(80, 24, device: "pair.toml");
        ui.WaitIdle();
        ui.Press(Key.Enter);   // board → form
        ui.Press(Key.End);     // the last row: the operators, read-only
        ui.Press(Key.Enter);
        var rows = Rows(ui);
        int first = Array.FindIndex(rows, r => r.Contains("operators = ", StringComparison.Ordinal) && r.Contains("│operators", StringComparison.Ordinal));
        Assert.True(first >= 0, string.Join('\n', rows));
        string message = string.Join(" ", rows.Skip(first).Take(StatusLine.MaxMessageLines).Select(r => r.Trim().Trim('│').Trim()));
        Assert.Contains("shown for reference, not edited here (· marks read-only rows)", message);
        Assert.Contains("n cos_phi sin_phi", message);   // the value cut on the form is whole in the message
    }

    [Fact]
    public void Below_80x24_the_screen_says_it_is_too_small_and_the_key_bar_keeps_quit_while_work_runs()
    {
        using var ui = new UiHarness(60, 20, device: "pair.toml");
        ui.WaitIdle();
        string screen = ui.Screen;
        Assert.Contains("smaller than 80×24", screen);
        Assert.Contains("^Q Quit", KeyBar(ui));
        ui.Press(Key.F9);
        ui.Replace(CancelWorkTests.LongFit);
        ui.Press(Key.Enter);
        Assert.True(ui.Window.IsFitting);
        var entries = KeyBar(ui);
        AllWhole(entries);
        Assert.Equal("Esc Stop", entries[0]);
        Assert.Contains("^Q Quit", entries);
        Assert.Contains("^S Save", entries);
        ui.Press(Key.Esc);
        Assert.False(ui.Window.IsFitting);
    }

    [Fact]
    public void At_80_columns_an_unsaved_file_keeps_the_eigensolver_in_the_status_line()
    {
        using var ui = new UiHarness(80, 24, device: "pair.toml");
        ui.WaitIdle();
        ui.Press(Key.Enter);   // board → form, on qa's ec
        ui.Press(Key.Enter);
        Assert.True(ui.Window.Prompt.IsOpen, ui.Screen);
        ui.Replace("220 MHz");
        ui.Press(Key.Enter);
        ui.WaitIdle();
        string screen = ui.Screen;
        Assert.Contains("● unsaved", screen);
        Assert.Contains("eigen ", screen);
        Assert.DoesNotContain("smaller than", screen);
    }

    [Fact]
    public void The_status_line_keeps_the_file_and_the_running_sweep_at_80_columns()
    {
        using var ui = new UiHarness(80, 24);
        ui.WaitIdle();
        ui.Press(Key.F5);
        ui.Replace("q_flux 0 0.5 2001");
        ui.Press(Key.Enter);
        string screen = ui.Screen;
        Assert.Contains("single.toml", screen);
        Assert.Contains("Esc cancels", screen);
        Assert.Equal("Esc Stop", KeyBar(ui)[0]);
        ui.Press(Key.Esc);
        Assert.DoesNotContain("Esc Stop", KeyBar(ui));
    }

    /// <summary>The page's part of every row: right of the board column (x ≥ 31 at 80 columns) or all of it.</summary>
    private static IEnumerable<string> PageRows(UiHarness ui, bool fullWidth)
    {
        var rows = Rows(ui);
        int statusRow = Array.FindLastIndex(rows, r => r.Contains(" │ trunc ", StringComparison.Ordinal) || r.Contains(" │ eigen ", StringComparison.Ordinal));
        return rows.Take(statusRow).Select(r => fullWidth ? r : r.Length > 31 ? r[31..] : "");
    }

    /// <summary>
    /// Scrolls the page from top to bottom and fails on any row cut with "…". The states table's own mark for
    /// components left out ("  …" closing the row, see StatesTableText) and the help's legend of the mark are allowed.
    /// </summary>
    private static void NoCutLines(UiHarness ui, string page, bool fullWidth = false)
    {
        for (int screenful = 0; screenful < 12; screenful++)
        {
            foreach (var row in PageRows(ui, fullWidth))
            {
                string text = row.TrimEnd().TrimEnd('│', '║').TrimEnd();
                if (page == "states" && text.EndsWith("  …", StringComparison.Ordinal)) text = text[..^1];
                text = text.Replace("… text cut to fit", "");   // the help's legend of the mark
                Assert.False(text.Contains('…'), $"{page}: a cut line at 80×24:\n{ui.Screen}");
            }
            ui.Press(Key.PageDown);
        }
    }

    [Fact]
    public void States_and_shifts_pages_have_no_cut_lines_at_80x24()
    {
        using var ui = new UiHarness(80, 24, device: "pair.toml");
        ui.WaitIdle();
        ui.Press(Key.Tab);   // focus on the page, so PgDn scrolls it
        while (ui.Window.CurrentPage != Page.States) ui.Press(Key.F3);
        ui.Window.ShowPage(Page.States);
        NoCutLines(ui, "states");
        ui.Window.ShowPage(Page.Shifts);
        NoCutLines(ui, "shifts");
    }

    [Fact]
    public void The_compare_and_matrix_pages_have_no_cut_lines_at_80x24()
    {
        using var ui = new UiHarness(80, 24, device: "pair.toml");
        ui.WaitIdle();
        ui.Press(Key.End, Key.Enter);   // the last operating point on the board
        ui.WaitForScreen("At point coupler_low");
        ui.Press(new Key('b'));
        ui.Press(Key.Tab);
        while (ui.Window.FocusedPanel != "page") ui.Press(Key.Tab);
        ui.Window.ShowPage(Page.Compare);
        Assert.Contains("B: point coupler_low", ui.Screen);
        NoCutLines(ui, "compare");
        ui.Window.ShowPage(Page.Matrix);
        NoCutLines(ui, "matrix elements");
    }

    [Fact]
    public void Spectrum_and_crossings_pages_have_no_cut_lines_at_80x24()
    {
        using var ui = new UiHarness(80, 24);
        ui.WaitIdle();
        ui.Window.ShowPage(Page.Spectrum);
        NoCutLines(ui, "spectrum before a sweep");
        ui.Press(Key.F5, Key.Enter);
        ui.WaitFor(() => ui.Window.LastSweep is { Completed: true }, "the sweep");
        ui.Window.ShowPage(Page.Crossings);
        ui.WaitForScreen("↔", 120000);
        NoCutLines(ui, "crossings");
        ui.Window.ShowPage(Page.Spectrum);
        string screen = ui.Screen;
        Assert.Contains("q_flux →", screen);   // the axis name, not cut
        NoCutLines(ui, "spectrum");
    }

    [Fact]
    public void Help_and_limits_have_no_cut_lines_at_80x24()
    {
        using var ui = new UiHarness(80, 24);
        ui.WaitIdle();
        ui.Press(Key.F1);
        NoCutLines(ui, "help", fullWidth: true);
        ui.Press(new Key('l'));
        Assert.Contains("Limits of the model", ui.Screen);   // the limits start at their top
        NoCutLines(ui, "limits of the model", fullWidth: true);
    }

    [Fact]
    public void The_errors_page_has_no_cut_lines_at_80x24_except_the_marked_long_source_line()
    {
        string folder = Directory.CreateTempSubdirectory("ld-narrow-").FullName;
        try
        {
            string path = UiHarness.CopyDevice("single.toml", folder);
            string text = File.ReadAllText(path);
            string[] lines = text.Split('\n');
            int at = Array.FindIndex(lines, l => l.TrimStart().StartsWith("frequency = ", StringComparison.Ordinal));
            Assert.True(at >= 0);
            lines[at] = "frequency = \"6.9 fF\"   # a comment long enough to run past the right edge of an eighty-column terminal";
            File.WriteAllLines(path, lines);
            using var ui = new UiHarness(80, 24, open: s => s.OpenFile(path));
            Assert.Equal(Page.Errors, ui.Window.CurrentPage);
            string screen = ui.Screen;
            Assert.Contains("F2 fixes the first value listed here", screen);
            Assert.Contains("F2 Fix", KeyBar(ui));
            foreach (var row in PageRows(ui, fullWidth: true).Where(r => !r.Contains($"{at + 1,4} │ ", StringComparison.Ordinal)))
                Assert.False(row.Contains('…'), $"errors page: a cut line at 80×24:\n{screen}");
            // the long source line is cut visibly, and the caret still sits under the error
            var rows = Rows(ui);
            int source = Array.FindIndex(rows, r => r.Contains($"{at + 1,4} │ frequency", StringComparison.Ordinal));
            Assert.True(source >= 0, screen);
            Assert.Contains('…', rows[source]);
            int caret = rows[source + 1].IndexOf('^');
            Assert.Equal('"', rows[source][caret]);
        }
        finally { Directory.Delete(folder, recursive: true); }
    }
}
