using System.Globalization;
using LevelDesign.Core.Analysis;
using LevelDesign.Ui.Text;
using LevelDesign.Ui.Views;
using Terminal.Gui.Input;

namespace LevelDesign.Tests.Ui;

/// <summary>The matrix-elements page: ⟨i|op|j⟩ at the cursor for a chosen element operator.</summary>
[Collection("terminal ui")]
public class MatrixPageTests
{
    private const string LoneTransmon = """
        [device]
        name = "lone"

        [elements.t]
        kind = "transmon"
        ec = "200 MHz"
        ej = "20 GHz"
        levels = 6
        """;

    /// <summary>The row of the table that starts with dressed index <paramref name="k"/>, split into its cells.</summary>
    private static string[] Row(string screen, int k, string name)
    {
        string row = screen.Split('\n').Single(r => r.Contains($"║ {k,2} {name} ", StringComparison.Ordinal) || r.Contains($"│ {k,2} {name} ", StringComparison.Ordinal));
        string inner = row[(row.IndexOf($"{k,2} {name} ", StringComparison.Ordinal) + $"{k,2} {name}".Length)..].TrimEnd().TrimEnd('║', '│').Trim();
        return inner.Split(' ', StringSplitOptions.RemoveEmptyEntries);
    }

    [Fact]
    public void A_lone_transmon_shows_the_charge_matrix_elements_of_the_transmon_limit_and_the_parity_zeros()
    {
        string folder = Directory.CreateTempSubdirectory("ld-matrix-").FullName;
        try
        {
            string path = Path.Combine(folder, "lone.toml");
            File.WriteAllText(path, LoneTransmon);
            using var ui = new UiHarness(80, 24, open: s => s.OpenFile(path));
            ui.WaitIdle();
            while (ui.Window.CurrentPage != Page.Matrix) ui.Press(Key.F3);
            string screen = ui.Screen;
            Assert.Contains("|⟨i|t.n|j⟩| at the biases in the file", screen);
            var fromOne = Row(screen, 1, "t1");
            double n01 = double.Parse(fromOne[0], CultureInfo.InvariantCulture);
            // Transmon limit (Koch et al., Phys. Rev. A 76, 042319 (2007), Eq. 3.4): |⟨j+1|n|j⟩| ≈ √((j+1)/2)·(E_J/8E_C)^¼;
            // at E_J/E_C = 100 the asymptote holds to a few percent (the check allows 3 %).
            double limit = Math.Sqrt(0.5) * Math.Pow(20.0 / (8 * 0.2), 0.25);
            Assert.InRange(n01, 0.97 * limit, 1.03 * limit);
            double n12 = double.Parse(Row(screen, 2, "t2")[1], CultureInfo.InvariantCulture);
            Assert.InRange(n12 / n01, 0.97 * Math.Sqrt(2), 1.03 * Math.Sqrt(2));
            // At n_g = 0 the states have definite parity and n is odd: ⟨0|n|2⟩ vanishes exactly (shown as "·").
            Assert.Equal("·", fromOne[1]);   // the diagonal ⟨1|n|1⟩
            Assert.Equal("·", Row(screen, 2, "t2")[0]);
            // the table shows Core's own numbers
            var spectrum = ui.Window.LastSnapshot!.Spectrum;
            Assert.Equal(DressedMatrixElements.Between(spectrum, "t", "n", 1, 0).Magnitude.ToString("0.000", CultureInfo.InvariantCulture), fromOne[0]);
        }
        finally { Directory.Delete(folder, recursive: true); }
    }

    [Fact]
    public void Enter_chooses_the_operator_an_unknown_one_is_refused_and_the_cursor_moves_along_the_sweep()
    {
        using var ui = new UiHarness(100, 30, device: "pair.toml");
        ui.WaitIdle();
        while (ui.Window.CurrentPage != Page.Matrix) ui.Press(Key.F3);
        Assert.Contains("|⟨i|qa.n|j⟩|", ui.Screen);
        ui.Press(Key.Enter);
        Assert.True(ui.Window.Prompt.IsOpen);
        ui.Replace("ra.number");
        ui.Press(Key.Enter);
        Assert.False(ui.Window.Prompt.IsOpen);
        Assert.Contains("|⟨i|ra.number|j⟩|", ui.Screen);
        ui.Press(Key.Enter);
        ui.Replace("qa.nope");
        ui.Press(Key.Enter);
        Assert.True(ui.Window.Prompt.IsOpen);
        Assert.Contains("qa has no operator 'nope'", ui.Screen);
        ui.Press(Key.Esc);
        ui.Press(Key.Enter);
        ui.Replace("qz.n");
        ui.Press(Key.Enter);
        Assert.Contains("no element 'qz'", ui.Screen);
        ui.Press(Key.Esc);

        ui.Press(Key.F5, Key.Enter);
        ui.WaitFor(() => ui.Window.LastSweep is { Completed: true }, "the sweep");
        ui.Window.ShowPage(Page.Matrix);
        ui.Window.Spectrum.SetCursor(0);
        ui.Draw();
        Assert.Contains("|⟨i|ra.number|j⟩| at qc_flux = 0.15 mA", ui.Screen);
        ui.Press(Key.Tab);
        while (ui.Window.FocusedPanel != "page") ui.Press(Key.Tab);
        ui.Press(Key.CursorRight);
        Assert.Equal(1, ui.Window.Spectrum.CursorIndex);
        Assert.Contains("(point 2/", ui.Screen);
    }

    [Fact]
    public void Rows_of_hybridized_states_are_marked_as_on_the_states_page()
    {
        using var ui = new UiHarness(100, 30, device: "pair.toml");
        ui.WaitIdle();
        ui.Press(Key.End, Key.Enter);   // the operating point coupler_low, where qa and qc mix
        ui.WaitForScreen("At point coupler_low");
        ui.Window.ShowPage(Page.Matrix);
        string screen = ui.Screen;
        var atPoint = LevelDesign.Ui.Compute.PointComputer.Compute(ui.Session.Document!.AtPoint("coupler_low"), checkConvergence: false, CancellationToken.None).Spectrum;
        int mixed = Enumerable.Range(0, 5).First(k => atPoint.Labels[k].Purity < ui.Session.Document!.PurityThreshold);
        Assert.Contains($"!{mixed,2} {LevelDesign.Core.Presentation.StateNames.OfDressed(atPoint, mixed)} ", screen);
        Assert.Contains(" 0 ground ", screen);   // a pure state is not marked
        Assert.Contains("! a state below purity", screen.Replace("\n", ""));
    }

    [Fact]
    public void Cells_show_three_decimals_one_digit_below_a_thousandth_and_a_dot_for_rounding_noise()
    {
        Assert.Equal("1.271", MatrixElementsText.Cell(1.2714, 2));
        Assert.Equal("3e-4", MatrixElementsText.Cell(3.1e-4, 2));
        Assert.Equal("·", MatrixElementsText.Cell(1e-11, 2));
        Assert.Equal("12.5", MatrixElementsText.Cell(12.53, 20));
    }
}
