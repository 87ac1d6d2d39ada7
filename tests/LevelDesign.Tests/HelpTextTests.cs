using System.Text.RegularExpressions;
using LevelDesign.Tests.Support;

namespace LevelDesign.Tests;

/// <summary>The help of the built executable: each command's usage and options as a user reads them.</summary>
public sealed class HelpTextTests
{
    private static readonly string[] FileCommands = ["check", "describe", "spectrum", "sweep", "crossings", "solve", "fit", "plot"];

    public static TheoryData<string, string> CommandsAndArgument()
    {
        var data = new TheoryData<string, string>();
        foreach (var c in FileCommands) data.Add(c, "<FILE>");
        data.Add("examples", "<DIR>");
        return data;
    }

    private static readonly string[] CommandsWithLevels = ["spectrum", "sweep", "crossings", "solve", "fit", "plot"];

    private static string Help(params string[] args)
    {
        var run = Executable.Run([.. args, "--help"]);
        Assert.True(run.ExitCode == 0, run.ToString());
        return run.Stdout;
    }

    /// <summary>The lines of the "Options:" section, option name first.</summary>
    private static string OptionLine(string help, string option) =>
        help.Split('\n').Single(l => Regex.IsMatch(l, $@"^\s+{Regex.Escape(option)}\b"));

    [Theory]
    [MemberData(nameof(CommandsAndArgument))]
    public void UsageShowsOnlyTheCommandsOwnArgument(string command, string argument)
    {
        string help = Help(command);
        var usage = help.Split('\n').SkipWhile(l => !l.StartsWith("Usage:")).Skip(1).First().Trim();
        Assert.Equal($"leveldesign {command} {argument} [options]", usage);
        // the terminal UI's file argument belongs to the bare command only
        Assert.DoesNotContain("terminal UI", help);
    }

    [Fact]
    public void RootHelpSaysHowToOpenTheUiAndListsEveryCommand()
    {
        string help = Help();
        Assert.Contains("leveldesign [FILE]", help);
        Assert.Contains("leveldesign examples DIR", help);
        foreach (var command in FileCommands.Append("examples"))
            Assert.Matches($@"(?m)^\s+{command} <", help);
    }

    [Fact]
    public void LevelsIsDescribedDifferentlyByEachCommand()
    {
        var descriptions = CommandsWithLevels.Select(c => OptionLine(Help(c), "--levels").Trim()).ToArray();
        Assert.Equal(descriptions.Length, descriptions.Distinct().Count());
        // only spectrum and sweep report states; the others solve, search or draw them
        Assert.Contains("list", descriptions[0]);
        Assert.Contains("reported at each point", descriptions[1]);
        Assert.Contains("searched for crossings", descriptions[2]);
        Assert.Contains("drawn", descriptions[5]);
    }

    [Fact]
    public void SolveTargetSaysAValueCarriesItsUnit()
    {
        string line = OptionLine(Help("solve"), "--target");
        Assert.Contains("a frequency with its unit, e.g. 5.2GHz; a bare number is GHz", line);
        Assert.DoesNotContain("Hz units", line);
    }

    [Fact]
    public void DescribeWithoutJsonIsATableThatNamesEveryElementAndCoupler()
    {
        string path = Path.Combine(RepositoryPaths.Devices, "pair.toml");
        var run = Executable.Run("describe", path);
        Assert.True(run.ExitCode == 0, run.ToString());
        Assert.False(run.Stdout.TrimStart().StartsWith('{'), "describe without --json printed JSON");
        var document = Core.DeviceFiles.DeviceDocument.Load(path).Document!;
        var lines = run.Stdout.Split('\n');
        // each element and coupler has its own row, starting with its id
        foreach (var id in document.Device.Elements.Select(e => e.Id).Concat(document.Device.Couplers.Select(c => c.Id)))
            Assert.Single(lines, l => Regex.IsMatch(l, $@"^\s+{Regex.Escape(id)}\s{{2,}}"));
        Assert.Contains("composite dimension 447", run.Stdout);
    }
}
