using LevelDesign.Ui.Compute;
using LevelDesign.Ui.Controllers;
using LevelDesign.Ui.Session;

namespace LevelDesign.Tests.Ui;

/// <summary>The files controller without a screen: what Ctrl+S does, failed saves, changes on disk, reload, export.</summary>
public sealed class FilesControllerTests : IDisposable
{
    private readonly string _folder = Directory.CreateTempSubdirectory("ld-files-").FullName;
    private readonly ManualScheduler _scheduler = new();
    private readonly EditSession _session = new();
    private readonly SweepController _sweeps;
    private readonly FilesController _files;
    private readonly string _path;

    public FilesControllerTests()
    {
        _path = UiHarness.CopyDevice("single.toml", _folder);
        _session.OpenFile(_path);
        _sweeps = new SweepController(_session, _scheduler, new SweepService());
        _files = new FilesController(_session, _sweeps, plots: null);
    }

    public void Dispose()
    {
        _sweeps.Stop();
        Directory.Delete(_folder, recursive: true);
    }

    [Fact]
    public void A_failed_save_keeps_the_document_unsaved_and_names_the_file()
    {
        Assert.True(_session.SetValue("elements.r.frequency", "7 GHz").Accepted);
        string target = Path.Combine(_folder, "no such folder", "copy.toml");
        var outcome = _files.Save(target);
        Assert.False(outcome.Accepted);
        Assert.Contains("copy.toml", outcome.Message);
        Assert.True(_session.IsDirty);
        Assert.Equal(_path, _session.Path);
        Assert.Equal("type a file path", _files.Save("  ").Message);   // save as with an empty path writes nothing
    }

    [Fact]
    public void A_successful_save_clears_the_unsaved_mark_and_ctrl_s_writes_without_asking()
    {
        Assert.Equal(SaveStep.Save, _files.StepFor(null));
        Assert.True(_session.SetValue("elements.r.frequency", "7 GHz").Accepted);
        Assert.True(_files.Save(null).Accepted);
        Assert.False(_session.IsDirty);
        Assert.Contains("frequency = \"7 GHz\"", File.ReadAllText(_path));
    }

    [Fact]
    public void A_change_on_disk_is_said_once_and_ctrl_s_then_asks_before_overwriting()
    {
        Assert.Null(_files.CheckDisk());
        File.AppendAllText(_path, "\n# edited elsewhere\n");
        string? warning = _files.CheckDisk();
        Assert.Contains("single.toml changed on disk", warning);
        Assert.True(_files.DiskChanged);
        Assert.Null(_files.CheckDisk());                // said once, still marked
        Assert.True(_files.DiskChanged);
        Assert.Equal(SaveStep.ConfirmOverwrite, _files.StepFor(null));
        Assert.Equal("reloaded " + _path, _files.Reload());
        Assert.False(_files.DiskChanged);
        Assert.Equal(SaveStep.Save, _files.StepFor(null));
    }

    [Fact]
    public void The_demo_has_no_file_so_ctrl_s_asks_for_one_and_reload_is_refused()
    {
        _session.OpenDemo();
        Assert.Equal(SaveStep.AskPath, _files.StepFor(null));
        Assert.Equal(SaveStep.Save, _files.StepFor(Path.Combine(_folder, "demo.toml")));
        Assert.NotNull(_files.ReloadRefusal);
    }

    [Fact]
    public void Export_writes_the_shown_point_without_a_sweep_and_refuses_what_it_cannot_write()
    {
        Assert.Null(_files.ExportSuggestion(null));   // nothing computed: nothing offered
        var shown = PointComputer.Compute(_session.Document!.Device, checkConvergence: false, CancellationToken.None);
        Assert.Equal(Path.Combine(_folder, "states.csv"), _files.ExportSuggestion(shown));
        Assert.Contains(".csv, .json, .svg or .png", _files.Export(Path.Combine(_folder, "states.txt"), shown, out _));
        Assert.Contains("one-axis sweep", _files.Export(Path.Combine(_folder, "plot.svg"), shown, out _));
        string csv = Path.Combine(_folder, "states.csv");
        Assert.Null(_files.Export(csv, shown, out string done));
        Assert.Equal("exported " + csv, done);
        Assert.True(new FileInfo(csv).Length > 0);
        Assert.StartsWith("could not write", _files.Export(Path.Combine(_folder, "missing", "states.csv"), shown, out _));
    }
}
