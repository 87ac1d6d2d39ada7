using System.Text.RegularExpressions;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Tests.Support;

namespace LevelDesign.Tests;

/// <summary>
/// Every file in Malformed/ declares, in its first line, the line and a fragment of the message it must produce
/// (# expect: line N: "fragment"). Loading must report exactly that; the executable must exit 2 with no stack trace.
/// The files are written by Malformed/make_corpus.py.
/// </summary>
public sealed class MalformedCorpusTests
{
    public static TheoryData<string> Files()
    {
        var data = new TheoryData<string>();
        foreach (var f in Directory.GetFiles(RepositoryPaths.Malformed, "*.toml").OrderBy(f => f, StringComparer.Ordinal))
            data.Add(Path.GetFileName(f));
        return data;
    }

    [Fact]
    public void CorpusHasAtLeastThirtyFiles() => Assert.True(Files().Count >= 30, $"only {Files().Count} malformed files");

    private static (int Line, string Fragment) Expectation(string path)
    {
        string header = File.ReadLines(path).First();
        var m = Regex.Match(header, "^# expect: line (\\d+): \"(.*)\"\\s*$");
        Assert.True(m.Success, $"{path}: first line must be # expect: line N: \"fragment\"");
        return (int.Parse(m.Groups[1].Value), m.Groups[2].Value);
    }

    [Theory]
    [MemberData(nameof(Files))]
    public void LoadingReportsTheExpectedLineAndMessage(string name)
    {
        string path = Path.Combine(RepositoryPaths.Malformed, name);
        var (line, fragment) = Expectation(path);
        var result = DeviceDocument.Load(path);
        Assert.False(result.Ok);
        Assert.Null(result.Document);
        Assert.Contains(result.Errors, e => e.Line == line && e.Message.Contains(fragment, StringComparison.Ordinal));
        Assert.All(result.Errors, e =>
        {
            Assert.Equal(path, e.File);
            Assert.False(string.IsNullOrWhiteSpace(e.Field));
        });
    }

    [Theory]
    [MemberData(nameof(Files))]
    public void CheckCommandExitsWithInvalidInputAndNoStackTrace(string name)
    {
        string path = Path.Combine(RepositoryPaths.Malformed, name);
        var (line, fragment) = Expectation(path);
        var run = Executable.Run("check", path);
        Assert.True(run.ExitCode == 2, run.ToString());
        Assert.Contains($"{path}:{line}:", run.Stdout);
        Assert.Contains(fragment, run.Stdout);
        Assert.DoesNotContain("   at ", run.Stdout + run.Stderr);
        Assert.DoesNotContain("Exception", run.Stdout + run.Stderr);
    }
}
