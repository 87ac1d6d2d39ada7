using LevelDesign.Ui.Compute;
using LevelDesign.Ui.Controllers;
using LevelDesign.Ui.Session;

namespace LevelDesign.Tests.Ui;

/// <summary>The sweep controller's policy without a screen: staleness and re-runs, cursors, the point shown, marks.</summary>
public sealed class SweepControllerTests : IDisposable
{
    private readonly string _folder = Directory.CreateTempSubdirectory("ld-sweeps-").FullName;
    private readonly ManualScheduler _scheduler = new();
    private readonly EditSession _session = new();
    private readonly SweepController _sweeps;

    public SweepControllerTests()
    {
        _session.OpenFile(UiHarness.CopyDevice("single.toml", _folder));
        _sweeps = new SweepController(_session, _scheduler, new SweepService());
    }

    public void Dispose()
    {
        _sweeps.Stop();
        Directory.Delete(_folder, recursive: true);
    }

    private void Sweep(string text)
    {
        Assert.Null(_sweeps.Ask(text));
        _scheduler.PumpUntil(() => !_sweeps.IsRunning && _sweeps.Result is not null, "the sweep");
    }

    [Fact]
    public void An_edit_marks_the_sweep_stale_and_a_run_of_edits_re_runs_it_once_after_the_pause()
    {
        Sweep("q_flux 0 0.5 5");
        var first = _sweeps.Result!;
        Assert.False(_sweeps.IsStale);

        Assert.True(_session.SetValue("elements.r.frequency", "7 GHz").Accepted);
        _sweeps.DeviceChanged();
        Assert.True(_sweeps.IsStale);
        Assert.Same(first, _sweeps.Result);            // the old sweep stays on screen, marked stale
        Assert.Contains("stale", _sweeps.SpectrumStatus);
        Assert.True(_session.SetValue("elements.r.frequency", "7.1 GHz").Accepted);
        _sweeps.DeviceChanged();
        Assert.Equal(1, _scheduler.PendingTimers);    // one re-run for both edits

        _scheduler.Advance(SweepController.ResweepPause);
        _scheduler.PumpUntil(() => !_sweeps.IsRunning && !ReferenceEquals(first, _sweeps.Result), "the re-run");
        Assert.False(_sweeps.IsStale);
        Assert.Equal(7.1, _sweeps.Result!.Points[0].Spectrum.Device.GetParameter("r.frequency"), 12);
    }

    [Fact]
    public void Stopping_drops_a_pending_re_sweep()
    {
        Sweep("q_flux 0 0.5 3");
        Assert.True(_session.SetValue("elements.r.frequency", "7 GHz").Accepted);
        _sweeps.DeviceChanged();
        Assert.Equal(1, _scheduler.PendingTimers);
        _sweeps.Stop();                                 // the window closed
        Assert.Equal(0, _scheduler.PendingTimers);
        Assert.False(_sweeps.IsRunning);
    }

    [Fact]
    public void Before_the_first_sweep_an_edit_schedules_nothing()
    {
        Assert.True(_session.SetValue("elements.r.frequency", "7 GHz").Accepted);
        _sweeps.DeviceChanged();
        Assert.Equal(0, _scheduler.PendingTimers);
        Assert.False(_sweeps.IsStale);
        Assert.False(_sweeps.IsRunning);
    }

    [Fact]
    public void A_request_that_does_not_read_is_refused_and_nothing_runs()
    {
        string? error = _sweeps.Ask("q_nothing 0 1 5");
        Assert.NotNull(error);
        Assert.Null(_sweeps.Request);
        Assert.False(_sweeps.IsRunning);
    }

    [Fact]
    public void A_cursor_beyond_either_end_is_kept_inside_the_sweep_and_the_state_pages_show_its_point()
    {
        Sweep("q_flux 0 0.5 5");
        _sweeps.MoveCursor(99);
        Assert.Equal(4, _sweeps.CursorIndex);
        Assert.Equal(0.5, _sweeps.CursorSnapshot!.Spectrum.Device.GetParameter("q.flux"), 12);
        Assert.Contains("point 5/5", _sweeps.Where());
        _sweeps.MoveCursor(-3);
        Assert.Equal(0, _sweeps.CursorIndex);
        Assert.Contains("point 1/5", _sweeps.Where());
        var file = PointComputer.Compute(_session.Document!.Device, checkConvergence: false, CancellationToken.None);
        Assert.Same(_sweeps.CursorSnapshot, _sweeps.Shown(file));   // the cursor's point before the file's
    }

    [Fact]
    public void Without_a_sweep_the_state_pages_show_the_file_and_p_is_refused()
    {
        var file = PointComputer.Compute(_session.Document!.Device, checkConvergence: false, CancellationToken.None);
        Assert.Same(file, _sweeps.Shown(file));
        Assert.Equal("the biases in the file", _sweeps.Where());
        Assert.Null(_sweeps.CursorAsPoint(out string refusal, out _));
        Assert.Contains("run a sweep (F5)", refusal);
    }

    [Fact]
    public void Marks_hold_the_point_shown_when_marked_and_A_defaults_to_the_file()
    {
        var file = PointComputer.Compute(_session.Document!.Device, checkConvergence: false, CancellationToken.None);
        Assert.Equal("the biases in the file", _sweeps.MarkAOr(file)!.Where);
        Assert.Null(_sweeps.Mark('b', null));           // nothing shown, nothing marked
        Sweep("q_flux 0 0.5 5");
        _sweeps.MoveCursor(2);
        var b = _sweeps.Mark('b', file)!;
        Assert.Contains("point 3/5", b.Where);
        _sweeps.MoveCursor(0);
        Assert.Same(b, _sweeps.MarkB);                  // a mark stays where it was made
        Assert.Equal("the biases in the file", _sweeps.MarkAOr(file)!.Where);
    }

    [Fact]
    public void The_map_cursor_stays_on_the_grid_and_a_swept_parameter_cannot_become_an_operating_point()
    {
        Sweep("q_flux 0 0.4 5; r.frequency 6.8 GHz 7.0 GHz 4");
        Assert.True(_sweeps.IsMapSweep);
        Assert.True(_sweeps.MoveMapCursor(10, -10));
        Assert.Equal((4, 0), _sweeps.MapCursor);
        Assert.Equal(0.4, _sweeps.Result!.Points[_sweeps.MapPoint].AxisValues[0], 12);
        Assert.Same(_sweeps.CursorSnapshot, _sweeps.Shown(null));
        Assert.Null(_sweeps.CursorAsPoint(out string refusal, out bool warning));
        Assert.Contains("moves r.frequency directly", refusal);
        Assert.True(warning);
        Assert.NotNull(_sweeps.ChooseMapQuantity("q.f99"));
        Assert.Null(_sweeps.ChooseMapQuantity("q.f12"));
        Assert.Equal("q.f12", _sweeps.MapQuantity(_sweeps.Result!));
    }
}
