using LevelDesign.Core.Presentation;
using LevelDesign.Ui.Views;
using Terminal.Gui.Input;

namespace LevelDesign.Tests.Ui;

public class QuantitiesPageTests
{
    /// <summary>
    /// The designer's hybridization check and zero-ZZ search in one page: after a coupler sweep of the demo, the page
    /// plots every ZZ and the purity of the single excitations against the coil current (in mA, as the file writes it);
    /// the value at the cursor is the sweep point's own; Enter chooses other quantities, an unknown one is refused.
    /// </summary>
    [Fact]
    public void Quantities_are_plotted_against_the_bias_with_the_cursor_value_and_can_be_chosen()
    {
        using var ui = new UiHarness(100, 50, device: "pair.toml");
        ui.WaitIdle();
        ui.Press(Key.F5);
        ui.Press(Key.Enter);
        ui.WaitFor(() => ui.Window.LastSweep is { Completed: true }, "the sweep");
        ui.Window.ShowPage(Page.Quantities);
        ui.Draw();
        string screen = ui.Screen;
        Assert.Contains("Along qc_flux (mA)", screen);
        Assert.Contains("zz:qa:qb:", screen);
        Assert.Contains("purity:qa1:", screen);
        Assert.Contains(screen, c => c >= '\u2801' && c <= '\u28FF');   // braille chart drawn
        var first = ui.Window.LastSweep!.Points[0];
        Assert.Contains(FrequencyText.Of("zz:qa:qb", first.Quantities["zz:qa:qb"]), screen);

        ui.Press(Key.Enter);
        Assert.True(ui.Window.Prompt.IsOpen);
        ui.Replace("qa.f01, purity:qa1 qb1");
        ui.Press(Key.Enter);
        ui.Draw();
        screen = ui.Screen;
        Assert.Contains("qa.f01:", screen);
        Assert.Contains("purity:qa1 qb1:", screen);
        Assert.DoesNotContain("zz:qa:qb:", screen);

        ui.Press(Key.Enter);
        ui.Replace("zz:qa:qx");
        ui.Press(Key.Enter);
        Assert.True(ui.Window.Prompt.IsOpen);   // refused, the prompt stays with the reason
        Assert.Contains("not computed along this sweep", ui.Screen);
    }
}
