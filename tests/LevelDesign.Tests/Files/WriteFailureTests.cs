using LevelDesign.Tests.Support;

namespace LevelDesign.Tests.Files;

/// <summary>
/// Writes that fail in the kernel part-way (issue 11, "a full disk"). A full file system cannot be made here without
/// mounting one (root), so the real failure used is the file-size limit (EFBIG, see <see cref="FileSizeLimit"/>),
/// which fails write(2) mid-file exactly where ENOSPC would; the UI's autosave is also tested with a simulated
/// failure in FileSafetyUiTests. Before, .NET's report of EFBIG (an ArgumentOutOfRangeException) escaped the writer:
/// `sweep --out` said "computation failed" without the file's name.
/// </summary>
public sealed class WriteFailureTests : IDisposable
{
    private readonly TempFolder _dir = new();

    public void Dispose() => _dir.Dispose();

    private string Device()
    {
        string device = _dir.File("pair.toml");
        File.Copy(Path.Combine(RepositoryPaths.Devices, "pair.toml"), device);
        Assert.True(new FileInfo(device).Length > FileSizeLimit.Bytes);   // a save of it must cross the limit
        return device;
    }

    [Fact]
    public void Sweep_out_that_cannot_be_written_names_the_file_and_keeps_the_previous_one()
    {
        Device();
        File.WriteAllText(_dir.File("out.csv"), "previous");
        var run = FileSizeLimit.Run(_dir.Path, "sweep", "pair.toml", "--vary", "qa_flux=0:0.3:31", "--out", "out.csv");
        Assert.True(run.ExitCode == 2, run.ToString());
        Assert.Contains("cannot write out.csv", run.Stderr);
        Assert.Contains("file-size limit", run.Stderr);
        Assert.DoesNotContain("computation failed", run.Stderr);
        Assert.Equal("previous", File.ReadAllText(_dir.File("out.csv")));
        Assert.False(File.Exists(_dir.File("out.csv.bak")));
        Assert.Empty(_dir.Temporaries());
    }

    [Fact]
    public void Fit_write_that_cannot_be_written_leaves_the_device_and_its_backup_as_they_were()
    {
        string device = Device(), before = File.ReadAllText(device);
        File.WriteAllText(device + ".bak", "previous backup");
        var run = FileSizeLimit.Run(_dir.Path, "fit", "pair.toml", "--param", "ra.frequency=6GHz:8GHz", "--target", "ra.f01=7.1GHz", "--write");
        Assert.True(run.ExitCode == 2, run.ToString());
        Assert.Contains("cannot write", run.Stderr);
        Assert.Equal(before, File.ReadAllText(device));
        Assert.Equal("previous backup", File.ReadAllText(device + ".bak"));
        Assert.Empty(_dir.Temporaries());
    }

    [TmuxFact]
    public void The_ui_shows_a_failing_autosave_and_save_and_keeps_the_file()
    {
        string device = Device(), before = File.ReadAllText(device);
        using var ui = new TmuxSession(_dir.Path, "pair.toml", limits: FileSizeLimit.ShellPrefix);
        Assert.True(ui.WaitFor("States at cursor"), "the UI did not start:\n" + ui.Screen());
        ui.Keys("Enter");
        ui.Keys("Enter");
        ui.Keys("End");
        ui.Keys([.. Enumerable.Repeat("BSpace", 30)]);
        ui.Keys("210 MHz", "Enter");
        Assert.True(ui.WaitFor("autosave failed", 10), "a failing autosave was not shown:\n" + ui.Screen());
        ui.Keys("C-s");
        Assert.True(ui.WaitFor("cannot write pair.toml", 10), "a failing save was not shown:\n" + ui.Screen());
        Assert.Contains("● unsaved", ui.Screen());   // the edits are still there to save elsewhere
        Assert.Equal(before, File.ReadAllText(device));
        Assert.False(File.Exists(device + ".bak"));
        Assert.Empty(_dir.Temporaries());
    }
}
