using LevelDesign.Tests.Support;

namespace LevelDesign.Tests;

/// <summary>leveldesign examples DIR: the example devices and manuals come out of the executable unchanged, and nothing is overwritten.</summary>
public sealed class ExamplesCommandTests : IDisposable
{
    private readonly string _dir = Directory.CreateTempSubdirectory("ld-examples-").FullName;

    public void Dispose() => Directory.Delete(_dir, recursive: true);

    [Fact]
    public void CopiesEveryExampleDeviceAndTheManualsByteForByte()
    {
        string target = Path.Combine(_dir, "new", "folder");
        var run = Executable.Run("examples", target);
        Assert.True(run.ExitCode == 0, run.ToString());
        foreach (var source in RepositoryPaths.DeviceFiles())
            Assert.Equal(File.ReadAllBytes(source), File.ReadAllBytes(Path.Combine(target, Path.GetFileName(source))));
        foreach (var manual in new[] { "device-format.md", "commands.md" })
            Assert.Equal(File.ReadAllBytes(Path.Combine(RepositoryPaths.Root, "docs", manual)), File.ReadAllBytes(Path.Combine(target, "docs", manual)));
        Assert.Equal(RepositoryPaths.DeviceFiles().Count() + 2, Directory.GetFiles(target, "*", SearchOption.AllDirectories).Length);
        // a copied device is usable as it is
        var check = Executable.Run("check", Path.Combine(target, "single.toml"));
        Assert.True(check.ExitCode == 0, check.ToString());
    }

    [Fact]
    public void RefusesAFolderThatHasOneOfTheFilesAndWritesNothing()
    {
        File.WriteAllText(Path.Combine(_dir, "pair.toml"), "# my own pair\n");
        var run = Executable.Run("examples", _dir);
        Assert.Equal(2, run.ExitCode);
        Assert.Contains("pair.toml", run.Stderr);
        Assert.Contains("nothing copied", run.Stderr);
        Assert.DoesNotContain("   at ", run.Stderr);
        Assert.Equal("# my own pair\n", File.ReadAllText(Path.Combine(_dir, "pair.toml")));
        Assert.Single(Directory.GetFileSystemEntries(_dir));
    }

    [Fact]
    public void RefusesAFileInPlaceOfTheFolder()
    {
        string file = Path.Combine(_dir, "plain.txt");
        File.WriteAllText(file, "x");
        var run = Executable.Run("examples", file);
        Assert.Equal(2, run.ExitCode);
        Assert.Contains("is a file", run.Stderr);
        Assert.Equal("x", File.ReadAllText(file));
    }
}
