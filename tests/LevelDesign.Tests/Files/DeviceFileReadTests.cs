using LevelDesign.Core.DeviceFiles;
using LevelDesign.Tests.Support;

namespace LevelDesign.Tests.Files;

/// <summary>Reading a device file is bounded: regular files only, at most <see cref="DeviceFileText.MaxBytes"/>, refused before reading.</summary>
public sealed class DeviceFileReadTests : IDisposable
{
    private readonly TempFolder _dir = new();

    public void Dispose() => _dir.Dispose();

    [Fact]
    public void A_fifo_is_refused_at_once_instead_of_waiting_for_a_writer()
    {
        string fifo = _dir.Fifo("device.toml");
        var load = Task.Run(() => DeviceDocument.Load(fifo));
        Assert.True(load.Wait(TimeSpan.FromSeconds(30)), "loading a FIFO blocked");
        var error = Assert.Single(load.Result.Errors);
        Assert.Contains("FIFO", error.Message);
        Assert.Contains("not a regular file", error.Message);
    }

    [Fact]
    public void A_directory_is_refused_as_a_directory_not_as_permission_denied()
    {
        Directory.CreateDirectory(_dir.File("folder.toml"));
        var error = Assert.Single(DeviceDocument.Load(_dir.File("folder.toml")).Errors);
        Assert.Contains("a directory", error.Message);
        Assert.DoesNotContain("permission", error.Message);
    }

    [Fact]
    public void A_file_above_the_size_limit_is_refused_before_it_is_read()
    {
        string big = _dir.File("big.toml");
        using (var s = File.Create(big)) s.SetLength(DeviceFileText.MaxBytes + 1);   // sparse: no data written
        var error = Assert.Single(DeviceDocument.Load(big).Errors);
        Assert.Contains("limited to 4 MB", error.Message);
        Assert.Equal($"{big}:0:0: file: {error.Message}", error.ToString());
    }

    [Fact]
    public void A_file_at_the_limit_is_read()
    {
        string text = File.ReadAllText(Path.Combine(RepositoryPaths.Devices, "single.toml"));
        string padded = text + "\n#" + new string('x', (int)DeviceFileText.MaxBytes - System.Text.Encoding.UTF8.GetByteCount(text) - 2);
        string file = _dir.File("padded.toml");
        File.WriteAllText(file, padded);
        Assert.Equal(DeviceFileText.MaxBytes, new FileInfo(file).Length);
        Assert.True(DeviceDocument.Load(file).Ok);
    }

    [Fact]
    public void Missing_files_directories_and_dangling_links_are_told_apart()
    {
        Assert.Contains("no such file", DeviceDocument.Load(_dir.File("none.toml")).Errors[0].Message);
        Assert.Contains("no such directory", DeviceDocument.Load(_dir.File("none/x.toml")).Errors[0].Message);
        File.CreateSymbolicLink(_dir.File("link.toml"), _dir.File("gone.toml"));
        Assert.Contains("symbolic link", DeviceDocument.Load(_dir.File("link.toml")).Errors[0].Message);
    }
}
