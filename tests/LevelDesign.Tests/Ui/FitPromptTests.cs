using System.Globalization;
using LevelDesign.Core.Analysis;
using LevelDesign.Core.Composite;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Units;
using Terminal.Gui.Input;

namespace LevelDesign.Tests.Ui;

/// <summary>
/// The fit form of the target prompt (F9 "fit … to …") and sweep bounds typed with units (F5), driven through the
/// real window. Fit targets are made by Core's solver on the device with known E_J/E_C, so the fit must find
/// those values again (an exact answer known beforehand, not a stored output).
/// </summary>
[Collection("terminal ui")]
public class FitPromptTests
{
    /// <summary>
    /// A copy of devices/single.toml whose qubit gives E_C and E_JΣ directly (the original writes a capacitance and
    /// the two junctions, which a fit may not write back): same device otherwise.
    /// </summary>
    private static UiHarness SingleWithDirectEnergies(string folder)
    {
        string file = UiHarness.CopyDevice("single.toml", folder);
        string text = File.ReadAllText(file)
            .Replace("capacitance = \"88 fF\"", "ec = \"220 MHz\"")
            .Replace("ej1 = \"9.5 GHz\"", "ej_sum = \"22 GHz\"")
            .Replace("ej2 = \"12.5 GHz\"", "asymmetry = 0.14");
        Assert.Contains("ej_sum = \"22 GHz\"", text);
        File.WriteAllText(file, text);
        return new UiHarness(160, 30, open: s => s.OpenFile(file));
    }

    [Fact]
    public void A_fit_recovers_known_EJ_and_EC_and_a_applies_them_as_one_undoable_edit()
    {
        string folder = Directory.CreateTempSubdirectory("ld-fit-").FullName;
        try { FitAndApply(folder); }
        finally { Directory.Delete(folder, recursive: true); }
    }

    private static void FitAndApply(string folder)
    {
        using var ui = SingleWithDirectEnergies(folder);
        ui.WaitIdle();
        var document = ui.Session.Document!;
        string before = document.ToText();
        // the targets: Core's f01 and α of the same device with E_JΣ = 24 GHz and E_C = 200 MHz
        const double ejSum = 24.0, ec = 0.2;
        var truth = document.Device.WithParameter("q.ej_sum", ejSum).WithParameter("q.ec", ec);
        var quantities = DerivedQuantities.From(new DeviceSolver().Solve(truth)).Named();
        string f01 = quantities["q.f01"].ToString("R", CultureInfo.InvariantCulture);
        string alpha = (quantities["q.anharmonicity"] * 1000).ToString("R", CultureInfo.InvariantCulture);

        ui.Press(Key.F9);
        ui.Replace($"fit q.ej_sum 15 GHz..30 GHz q.ec to q.f01 = {f01}, q.anharmonicity = {alpha} MHz");
        ui.Press(Key.Enter);
        ui.WaitFor(() => ui.Window.Prompt.IsOpen && ui.Window.Prompt.Question.Contains("a applies"), "the fit result", 180000);
        string offer = ui.Window.Prompt.Question;
        Assert.Contains("q.ej_sum = ", offer);
        // how the fit ended, in the command line's words
        Assert.Matches(@"fit \(\d+ steps, (residuals at numerical precision|step below tolerance|no further decrease)", offer);
        Assert.Contains(" GHz", offer);          // shown in the file's unit of each field
        Assert.Contains(" MHz", offer);
        Assert.Contains("q.f01 off by", offer);   // every target's residual
        Assert.Contains("q.anharmonicity off by", offer);
        Assert.DoesNotContain("NOT converged", offer);
        Assert.Equal(before, ui.Session.Document!.ToText());   // nothing written before the key

        int depth = ui.Session.UndoDepth;
        ui.Press(new Key('a'));
        var applied = ui.Session.Document!;
        Assert.Equal(depth + 1, ui.Session.UndoDepth);          // one edit for both values
        Assert.Equal(ejSum, applied.Device.GetParameter("q.ej_sum"), ejSum * 1e-5);
        Assert.Equal(ec, applied.Device.GetParameter("q.ec"), ec * 1e-5);
        // written in the file's own units
        string ejText = applied.ValueTextOf("elements.q.ej_sum")!, ecText = applied.ValueTextOf("elements.q.ec")!;
        Assert.EndsWith("GHz", ejText);
        Assert.EndsWith("MHz", ecText);
        Assert.Equal(ejSum, QuantityParser.Parse(ejText, UnitKind.Frequency), ejSum * 1e-5);
        Assert.Equal(ec, QuantityParser.Parse(ecText, UnitKind.Frequency), ec * 1e-5);
        Assert.Contains($"ej_sum = \"{ejText}\"", applied.ToText());
        Assert.Contains($"ec = \"{ecText}\"", applied.ToText());

        ui.Press(Key.Z.WithCtrl);
        Assert.Equal(before, ui.Session.Document!.ToText());
    }

    [Theory]
    [InlineData("fit q.ec to q.f01 = 5 GHz", "capacitance")]          // the file gives a capacitance, not E_C
    [InlineData("fit q.ej_sum to q.f01 = 5 GHz", "ej1, ej2")]         // the file gives the two junctions
    [InlineData("fit q.flux to q.f01 = 5 GHz", "set by bias 'q_flux'")]
    public void A_fit_of_a_value_the_file_writes_another_way_is_refused_with_the_reason(string typed, string reason)
    {
        using var ui = new UiHarness(160, 30);
        ui.WaitIdle();
        string before = ui.Session.Document!.ToText();
        ui.Press(Key.F9);
        ui.Replace(typed);
        ui.Press(Key.Enter);
        Assert.True(ui.Window.Prompt.IsOpen);
        Assert.Contains("refused", ui.Window.Prompt.Message);
        Assert.Contains(reason, ui.Window.Prompt.Message);
        Assert.Equal(before, ui.Session.Document!.ToText());
    }

    [Fact]
    public void A_sweep_typed_in_mA_equals_the_one_typed_in_amperes()
    {
        using var ui = new UiHarness(device: "pair.toml");
        ui.WaitIdle();
        var withUnits = Sweep(ui, "qc_flux 0.3 mA 0.6mA 4");
        var plain = Sweep(ui, "qc_flux 0.0003 0.0006 4");
        Assert.Equal(4, withUnits.Points.Count);
        Assert.Equal(0.0003, withUnits.Points[0].AxisValues[0], 15);
        Assert.Equal(0.0006, withUnits.Points[^1].AxisValues[0], 15);
        for (int i = 0; i < plain.Points.Count; i++)
        {
            Assert.Equal(plain.Points[i].AxisValues[0], withUnits.Points[i].AxisValues[0]);
            // same device at the same bias; repeated eigensolves agree to rounding (~1e-14 GHz), not bit for bit
            var a = plain.Points[i].Spectrum.Energies;
            var b = withUnits.Points[i].Spectrum.Energies;
            Assert.Equal(a.Length, b.Length);
            for (int k = 0; k < a.Length; k++) Assert.Equal(a[k], b[k], 1e-9);
        }
    }

    [Fact]
    public void A_sweep_bound_in_the_wrong_unit_is_refused_by_name()
    {
        using var ui = new UiHarness(device: "pair.toml");
        ui.WaitIdle();
        ui.Press(Key.F5);
        ui.Replace("qc_flux 0.3 GHz 0.6 mA 4");
        ui.Press(Key.Enter);
        Assert.True(ui.Window.Prompt.IsOpen);
        Assert.StartsWith("✗ START:", ui.Window.Prompt.Message);
    }

    private static Core.Sweeps.SweepResult Sweep(UiHarness ui, string typed)
    {
        var previous = ui.Window.LastSweep;
        ui.Press(Key.F5);
        ui.Replace(typed);
        ui.Press(Key.Enter);
        ui.WaitFor(() => ui.Window.LastSweep is { Completed: true } s && !ReferenceEquals(s, previous), "the sweep", 120000);
        return ui.Window.LastSweep!;
    }
}
