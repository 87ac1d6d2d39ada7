using System.Text;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Linear;
using LevelDesign.Tests.Support;

namespace LevelDesign.Tests.Files;

/// <summary>
/// Inputs without bounds (issue 11) are refused up front with a located message and exit 2: never a stack trace,
/// never a run until killed. Times are not asserted here (see the fuzz test for the per-input bound).
/// </summary>
public sealed class BoundedInputTests : IDisposable
{
    private readonly TempFolder _dir = new();

    public void Dispose() => _dir.Dispose();

    private static void Refused(CommandResult run, string fragment)
    {
        Assert.True(run.ExitCode == 2, run.ToString());
        Assert.Contains(fragment, run.Stdout + run.Stderr);   // check lists problems on stdout, the others on stderr
        Assert.DoesNotContain("Unhandled", run.Stderr);
        Assert.DoesNotContain("   at ", run.Stderr);
        Assert.DoesNotContain("progress", run.Stderr);
    }

    private string Copy(string name)
    {
        string file = _dir.File(name);
        File.Copy(Path.Combine(RepositoryPaths.Devices, name), file, overwrite: true);
        return file;
    }

    [Theory]
    [InlineData("qa_flux=-1e308:1e308:3", null, "too large to compute with")]
    [InlineData("qa_flux=0:0.1:3", "qb_flux=1e308*qa_flux", "linked values must be finite")]
    [InlineData("qa_flux=0:0.1:1000000000", null, "a sweep or scan has at most")]
    public void Sweep_axes_out_of_bounds_are_refused_before_computing(string vary, string? link, string says)
    {
        string device = Copy("pair.toml");
        string[] args = link is null ? ["sweep", device, "--vary", vary] : ["sweep", device, "--vary", vary, "--link", link];
        Refused(Executable.Run(args), says);
    }

    [Theory]
    [InlineData("46341")]   // 46,341² overflowed int in SweepGrid.Points
    [InlineData("65536")]   // 65,536² wrapped to 0
    public void Grids_whose_size_overflowed_are_refused(string count)
    {
        string device = Copy("pair.toml");
        Refused(Executable.Run(["sweep", device, "--vary", $"qa_flux=0:0.1:{count}", "--vary", $"qb_flux=0:0.1:{count}"]), "a sweep or scan has at most");
    }

    [Fact]
    public void A_grid_that_would_not_fit_in_memory_is_refused_with_the_estimate()
    {
        string device = Copy("pair.toml");
        var run = Executable.Run(["sweep", device, "--vary", "qa_flux=0:0.1:400", "--vary", "qb_flux=0:0.1:400"]);
        Refused(run, "this sweep would need about");
        Assert.Matches(@"it would also take about [\d.]+ (s|min|h|days) \(160,000 points × ", run.Stderr);
    }

    [Fact]
    public void Solve_with_a_million_scan_points_is_refused()
    {
        string device = Copy("pair.toml");
        Refused(Executable.Run(["solve", device, "--vary", "qa_flux=0:0.5:1000000", "--target", "qa.f01=5GHz"]), "1,000,000 points");
    }

    [Fact]
    public void A_huge_parameter_on_the_command_line_is_refused()
    {
        string device = Copy("fluxonium.toml");
        Refused(Executable.Run(["spectrum", device, "--at", "f.ej=1.797e308"]), "too large to compute with");
    }

    [Fact]
    public void A_level_list_of_sixty_thousand_energies_is_refused_at_its_line()
    {
        var text = new StringBuilder("[device]\nname = \"long list\"\n\n[elements.d]\nkind = \"level_list\"\nlevels = 3\nenergies = [");
        for (int i = 0; i < 60_000; i++) text.Append(i == 0 ? "" : ", ").Append(i * 0.001);
        text.Append("]\n");
        string file = _dir.File("long.toml");
        File.WriteAllText(file, text.ToString());
        var run = Executable.Run(["check", file]);
        Refused(run, "at most 500 states");
        Assert.Contains($"{file}:7:", run.Stdout);
    }

    [Fact]
    public void Random_bytes_give_a_capped_list_of_problems()
    {
        var random = new Random(11);
        var bytes = new byte[300_000];
        random.NextBytes(bytes);
        // printable noise with newlines gives the reader many lines to complain about
        for (int i = 0; i < bytes.Length; i++) bytes[i] = bytes[i] % 37 == 0 ? (byte)'\n' : (byte)(32 + bytes[i] % 95);
        // without quotes: an unclosed string is reported once with a count of what follows it (tested apart), and
        // this test is about the cap on a long list of independent problems
        for (int i = 0; i < bytes.Length; i++) if (bytes[i] is (byte)'"' or (byte)'\'') bytes[i] = (byte)'x';
        string file = _dir.File("noise.toml");
        File.WriteAllBytes(file, bytes);
        var run = Executable.Run(["check", file]);
        Assert.True(run.ExitCode == 2, run.ToString());
        int lines = (run.Stdout + run.Stderr).Split('\n').Length;
        Assert.True(lines <= ErrorList.MaxListed + 5, $"{lines} lines of errors");
        Assert.Contains("more problem(s) not listed", run.Stdout);
        Assert.Contains($"more than {ErrorList.MaxListed} problems", run.Stderr);
        Assert.DoesNotContain("Unhandled", run.Stderr);
    }

    [Fact]
    public void The_error_list_keeps_the_first_problems_and_counts_the_rest()
    {
        var list = new ErrorList("f.toml");
        for (int i = 1; i <= 500; i++) list.Add(i, 1, "x", "bad");
        Assert.Equal(500, list.Count);
        Assert.Equal(ErrorList.MaxListed + 1, list.Items.Count);
        Assert.Contains($"and {500 - ErrorList.MaxListed} more", list.Items[^1].Message);
    }

    [Fact]
    public void Control_characters_from_a_file_never_reach_the_terminal_raw()
    {
        string file = _dir.File("escape.toml");
        File.WriteAllText(file, "[device]\nname = \"x\"\n\n[elements.q]\nkind = \"\\u001b[2Jtransmon\"\nec = \"220 MHz\"\nej = \"15 GHz\"\n");
        var run = Executable.Run(["check", file]);
        Assert.True(run.ExitCode == 2, run.ToString());
        Assert.DoesNotContain('\u001b', run.Stderr + run.Stdout);
        Assert.Contains("\\x1B[2Jtransmon", run.Stdout);
        Assert.Equal("a\\x1Bb\\u202Ec\nd", TerminalText.Clean("a\u001bb\u202ec\nd"));
    }

    [Fact]
    public void The_dense_eigen_path_refuses_non_finite_matrices_instead_of_indexing_out_of_range()
    {
        var m = new double[4, 4];
        for (int i = 0; i < 4; i++) for (int j = 0; j < 4; j++) m[i, j] = 1.0 / (1 + i + j);   // dense, symmetric
        m[1, 2] = m[2, 1] = double.NaN;
        var e = Assert.Throws<ArgumentException>(() => SmallEigen.LowestSymmetric(m, 2));
        Assert.Contains("not finite", e.Message);
    }
}
