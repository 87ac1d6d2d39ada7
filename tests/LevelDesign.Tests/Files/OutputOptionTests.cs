using LevelDesign.Tests.Support;

namespace LevelDesign.Tests.Files;

/// <summary>--out of the commands, run as a user would (the built executable), in a temporary folder.</summary>
public sealed class OutputOptionTests : IDisposable
{
    private readonly TempFolder _dir = new();

    public void Dispose() => _dir.Dispose();

    private string Device()
    {
        string file = _dir.File("single.toml");
        File.Copy(Path.Combine(RepositoryPaths.Devices, "single.toml"), file, overwrite: true);
        return file;
    }

    private static readonly string[] Small = ["--vary", "q_flux=0:0.1:3", "--levels", "3", "--csv"];

    [Fact]
    public void Out_naming_the_device_file_is_refused_before_computing_and_the_device_is_untouched()
    {
        string device = Device();
        string before = File.ReadAllText(device);
        File.CreateSymbolicLink(_dir.File("alias.toml"), device);
        foreach (string output in new[] { device, _dir.File("alias.toml") })
        {
            var run = Executable.Run(["sweep", device, .. Small, "--out", output]);
            Assert.True(run.ExitCode == 2, run.ToString());
            Assert.Contains("that is the device file", run.Stderr);
            Assert.DoesNotContain("progress", run.Stderr);
        }
        Assert.Equal(before, File.ReadAllText(device));
        Assert.False(File.Exists(device + ".bak"));
    }

    [Fact]
    public void A_missing_or_unusable_destination_is_refused_first_naming_the_users_path()
    {
        string device = Device();
        Directory.CreateDirectory(_dir.File("folder"));
        foreach (var (output, says) in new[] { (_dir.File("nowhere/out.csv"), "no such directory"), (_dir.File("folder"), "is a directory") })
        {
            var run = Executable.Run(["sweep", device, .. Small, "--out", output]);
            Assert.True(run.ExitCode == 2, run.ToString());
            Assert.Contains(output, run.Stderr);
            Assert.Contains(says, run.Stderr);
            Assert.DoesNotContain(".tmp", run.Stderr);
            Assert.DoesNotContain("progress", run.Stderr);   // nothing was computed
        }
        var plot = Executable.Run(["plot", device, "--vary", "q_flux=0:0.1:3", "--out", _dir.File("nowhere/p.svg")]);
        Assert.True(plot.ExitCode == 2, plot.ToString());
        Assert.Contains("no such directory", plot.Stderr);
    }

    [Fact]
    public void Out_to_a_fifo_writes_into_it_and_leaves_it_a_fifo()
    {
        string device = Device();
        string fifo = _dir.Fifo("stream.csv");
        var reader = Task.Run(() => File.ReadAllText(fifo));
        var run = Executable.Run(["sweep", device, .. Small, "--out", fifo]);
        Assert.True(run.ExitCode == 0, run.ToString());
        Assert.True(reader.Wait(TimeSpan.FromSeconds(60)));
        Assert.StartsWith("# LevelDesign sweep of device single", reader.Result);
        Assert.Equal(4, reader.Result.Split('\n').Count(l => l.Length > 0 && !l.StartsWith('#')));   // header and 3 points
        Assert.Equal(Core.Files.FileKind.Fifo, Core.Files.PosixFile.Lstat(fifo).Kind);
        Assert.False(File.Exists(fifo + ".bak"));
    }

    [Fact]
    public void Out_replaces_a_regular_file_keeping_its_mode_and_a_backup()
    {
        string device = Device();
        string output = _dir.File("out.csv");
        File.WriteAllText(output, "previous");
        File.SetUnixFileMode(output, UnixFileMode.UserRead | UnixFileMode.UserWrite);
        var run = Executable.Run(["sweep", device, .. Small, "--out", output]);
        Assert.True(run.ExitCode == 0, run.ToString());
        Assert.Equal("previous", File.ReadAllText(output + ".bak"));
        Assert.Equal(UnixFileMode.UserRead | UnixFileMode.UserWrite, File.GetUnixFileMode(output));
        Assert.Empty(_dir.Temporaries());
    }

    [Fact]
    public void Fit_write_on_a_read_only_device_is_refused_before_fitting()
    {
        string device = Device();
        string before = File.ReadAllText(device);
        if (!_dir.MakeUnwritable(device)) return;   // root without chattr: no file it may not write
        var run = Executable.Run(["fit", device, "--param", "r.frequency=6GHz:8GHz", "--target", "r.f01=7GHz", "--write"]);
        Assert.True(run.ExitCode == 2, run.ToString());
        Assert.Contains("read-only", run.Stderr);
        Assert.Equal("", run.Stdout);   // no fit report: nothing was computed
        Assert.Equal(before, File.ReadAllText(device));
    }
}
