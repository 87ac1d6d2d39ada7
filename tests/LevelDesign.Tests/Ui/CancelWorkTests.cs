using LevelDesign.Ui.Views;
using Terminal.Gui.Input;

namespace LevelDesign.Tests.Ui;

/// <summary>
/// Esc stops a fit or a target search the way it stops a sweep: at once, with "… cancelled" in the status line,
/// the device file and document untouched, and the screen answering keys while the work runs.
/// </summary>
[Collection("terminal ui")]
public class CancelWorkTests
{
    /// <summary>Six parameters against six targets at three settings of the five-element demo device (tens of seconds uncancelled).</summary>
    public const string LongFit =
        "fit qa.ej_sum qa.ec qb.ej_sum qb.ec qc.ej_sum qc.ec to qa.f01 = 5.5 GHz at idle, qa.anharmonicity = -220 MHz at coupler_low, " +
        "qb.f01 = 4.9 GHz at idle, qb.anharmonicity = -230 MHz at coupler_low, qc.f01 = 6.2 GHz, qc.anharmonicity = -110 MHz";

    private static bool Finished(Task task, TimeSpan within) => Task.WhenAny(task, Task.Delay(within)).GetAwaiter().GetResult() == task;

    [Fact]
    public void Esc_cancels_a_fit_promptly_and_leaves_the_device_unchanged()
    {
        using var ui = new UiHarness(80, 24, device: "pair.toml");
        ui.WaitIdle();
        string before = ui.Session.Document!.ToText();
        string file = File.ReadAllText(ui.FilePath!);

        ui.Press(Key.F9);
        ui.Replace(LongFit);
        ui.Press(Key.Enter);
        Assert.False(ui.Window.Prompt.IsOpen);
        Assert.True(ui.Window.IsFitting);
        var fit = ui.Window.RunningFit!;
        Assert.False(fit.IsCompleted, "the fit ended before it could be cancelled; the test needs a longer fit");
        Assert.Contains("Esc Stop", ui.Screen);

        // the screen answers keys while the fit runs
        var page = ui.Window.CurrentPage;
        ui.Press(Key.F3);
        Assert.NotEqual(page, ui.Window.CurrentPage);
        Assert.True(ui.Window.IsFitting);

        ui.Press(Key.Esc);
        Assert.False(ui.Window.IsFitting);
        Assert.Contains("fit cancelled", ui.Screen);
        Assert.True(Finished(fit, TimeSpan.FromSeconds(20)), "the fit did not stop after Esc");
        Assert.True(fit.IsCanceled, $"the fit ended as {fit.Status}, not cancelled");

        Thread.Sleep(200);
        string screen = ui.Screen;   // pumps anything posted late
        Assert.False(ui.Window.Prompt.IsOpen, screen);
        Assert.Contains("fit cancelled", screen);
        Assert.Equal(before, ui.Session.Document!.ToText());
        Assert.False(ui.Session.IsDirty);
        Assert.Equal(file, File.ReadAllText(ui.FilePath!));
    }

    [Fact]
    public void Esc_cancels_a_target_search_and_no_roots_are_offered()
    {
        using var ui = new UiHarness(80, 24, device: "pair.toml");
        ui.WaitIdle();
        string before = ui.Session.Document!.ToText();
        ui.Press(Key.F9);
        ui.Replace("qa.f01 = 5 GHz by qa_flux 0 to 0.5");
        ui.Press(Key.Enter);
        Assert.True(ui.Window.IsSolving);
        ui.Press(Key.Esc);
        Assert.False(ui.Window.IsSolving);
        Assert.Contains("target search cancelled", ui.Screen);
        Thread.Sleep(500);
        Assert.False(ui.Window.Prompt.IsOpen, ui.Screen);
        Assert.Equal(before, ui.Session.Document!.ToText());
        Assert.False(ui.Session.IsDirty);
    }

    [Fact]
    public void A_fit_that_runs_to_the_end_is_still_offered()
    {
        using var ui = new UiHarness(80, 24, device: "pair.toml");
        ui.WaitIdle();
        ui.Press(Key.F9);
        ui.Replace("fit qa.ec to qa.f01 = 5.5 GHz");
        ui.Press(Key.Enter);
        ui.WaitFor(() => ui.Window.Prompt.IsOpen && ui.Window.Prompt.Question.Contains("a applies"), "the fit result", 120000);
        Assert.False(ui.Window.IsFitting);
        Assert.True(ui.Window.RunningFit!.IsCompletedSuccessfully);
        // the offer wraps onto lines of the prompt instead of running off the screen
        Assert.True(ui.Screen.Contains("qa.f01 off"), ui.Screen);
        ui.Press(Key.Esc);
    }
}
