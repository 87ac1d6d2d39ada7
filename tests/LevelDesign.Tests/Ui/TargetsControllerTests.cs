using LevelDesign.Ui.Compute;
using LevelDesign.Ui.Controllers;
using LevelDesign.Ui.Session;

namespace LevelDesign.Tests.Ui;

/// <summary>The targets-and-fits controller without a screen: reading F9 entries, offers, applying one.</summary>
public sealed class TargetsControllerTests : IDisposable
{
    private readonly string _folder = Directory.CreateTempSubdirectory("ld-targets-").FullName;
    private readonly ManualScheduler _scheduler = new();
    private readonly EditSession _session = new();
    private readonly TargetsController _targets;
    private readonly List<Offer> _offers = [];
    private readonly List<string> _said = [];

    public TargetsControllerTests()
    {
        _session.OpenFile(UiHarness.CopyDevice("single.toml", _folder));
        _targets = new TargetsController(_session, _scheduler, new TargetSearch());
        _targets.Offered += _offers.Add;
        _targets.Said += (text, _) => _said.Add(text);
    }

    public void Dispose()
    {
        _targets.Stop();
        Directory.Delete(_folder, recursive: true);
    }

    private IReadOnlyCollection<string> Quantities() =>
        PointComputer.Compute(_session.Document!.Device, checkConvergence: false, CancellationToken.None).Quantities.Named().Keys.ToList();

    [Fact]
    public void Applying_a_found_root_is_one_undoable_edit_of_the_bias()
    {
        var quantities = Quantities();
        Assert.Null(_targets.Submit("q.f01 = 5 GHz by q_flux 0 to 0.5", quantities));
        Assert.True(_targets.IsSolving);
        _scheduler.PumpUntil(() => !_targets.IsSolving, "the target search");
        var offer = Assert.Single(_offers);
        var before = _session.Document;
        Assert.True(offer.Choices['1']().Accepted);
        Assert.Equal(1, _session.UndoDepth);
        Assert.NotEqual(before!.ToText(), _session.Document!.ToText());
        _session.Undo();
        Assert.Same(before, _session.Document);
    }

    [Fact]
    public void An_entry_that_does_not_read_is_refused_and_kept_for_the_next_question()
    {
        string? error = _targets.Submit("q.f01 = five by q_flux 0 to 0.5", Quantities());
        Assert.NotNull(error);
        Assert.False(_targets.IsSolving);
        Assert.Equal("q.f01 = five by q_flux 0 to 0.5", _targets.Suggestion(_session.Document!, null));
    }

    [Fact]
    public void A_fit_waits_for_the_first_computation_because_the_quantity_names_come_from_it()
    {
        string? error = _targets.Submit("fit q.ec to q.f01 = 5.5 GHz", null);
        Assert.Contains("wait until the device has been computed once", error);
        Assert.False(_targets.IsFitting);
        Assert.Null(_targets.RunningFit);
    }

    [Fact]
    public void A_value_not_written_in_the_file_is_refused_and_the_history_stays_empty()
    {
        var outcome = _targets.ApplyRoot("q_nothing", 0.25);
        Assert.False(outcome.Accepted);
        Assert.Contains("q_nothing", outcome.Message);
        Assert.Equal(0, _session.UndoDepth);
    }

    /// <summary>The single device with E_C written as a value a fit can write back (its file gives a capacitance).</summary>
    private void OpenFittable()
    {
        string path = Path.Combine(_folder, "single.toml");
        File.WriteAllText(path, File.ReadAllText(path).Replace("capacitance = \"88 fF\"", "ec = \"220 MHz\""));
        _session.OpenFile(path);
    }

    [Fact]
    public void Applying_a_fit_writes_its_values_as_one_undoable_edit()
    {
        OpenFittable();
        Assert.Null(_targets.Submit("fit q.ec to q.f01 = 5.5 GHz", Quantities()));
        Assert.True(_targets.IsFitting);
        _scheduler.PumpUntil(() => !_targets.IsFitting, "the fit");
        var offer = Assert.Single(_offers);
        Assert.Contains("q.ec = ", offer.Question);
        var outcome = offer.Choices['a']();
        Assert.True(outcome.Accepted, outcome.Message);
        Assert.Equal(1, _session.UndoDepth);
        Assert.NotEqual(0.220, _session.Document!.Device.GetParameter("q.ec"), 6);
    }

    [Fact]
    public void Esc_cancels_a_running_fit_and_nothing_is_offered()
    {
        OpenFittable();
        Assert.False(_targets.Cancel());                // nothing runs: Esc goes elsewhere
        Assert.Null(_targets.Submit("fit q.ec to q.f01 = 5.5 GHz", Quantities()));
        Assert.True(_targets.IsFitting);
        var fit = _targets.RunningFit!;
        Assert.True(_targets.Cancel());
        Assert.False(_targets.IsFitting);
        Assert.Contains("fit cancelled; the device is unchanged", _said);
        try { fit.Wait(TimeSpan.FromMinutes(1)); } catch (AggregateException) { }
        _scheduler.Pump();
        Assert.Empty(_offers);
        Assert.Equal(0, _session.UndoDepth);
    }
}
