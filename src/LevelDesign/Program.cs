using System.CommandLine;
using LevelDesign.Commands;
using LevelDesign.Core.DeviceFiles;

namespace LevelDesign;

/// <summary>
/// The leveldesign executable: with no command it opens the terminal UI (on FILE or the built-in demo);
/// commands check, describe, spectrum, sweep, crossings, solve, fit, plot, coherence, effective, matrix, spread and merge work without a terminal. Exit codes: see <see cref="ExitCodes"/>.
/// </summary>
public static class Program
{
    public static int Main(string[] args)
    {
        // Hidden: a visible root argument would show in every subcommand's usage ("leveldesign [<FILE>] check <FILE>");
        // the root description says how to open the UI instead.
        var file = new Argument<string?>("FILE") { Description = "device file to open in the terminal UI", Arity = ArgumentArity.ZeroOrOne, Hidden = true };
        var root = new RootCommand(RootDescription)
        {
            file,
            CheckCommand.Create(),
            DescribeCommand.Create(),
            SpectrumCommand.Create(),
            SweepCommand.Create(),
            CrossingsCommand.Create(),
            SolveCommand.Create(),
            FitCommand.Create(),
            PlotCommand.Create(),
            ExamplesCommand.Create(),
            CoherenceCommand.Create(),
            EffectiveCommand.Create(),
            MatrixCommand.Create(),
            SpreadCommand.Create(),
            MergeCommand.Create(),
        };
        root.SetAction(parse => OpenInteractive(parse.GetValue(file)));
        var parse = root.Parse(args);
        if (parse.CommandResult.Command != root) Output.SafeConsole.Install();
        if (parse.Errors.Count > 0)
        {
            foreach (var e in parse.Errors) Console.Error.WriteLine(e.Message);
            Console.Error.WriteLine("run 'leveldesign --help' for usage");
            return ExitCodes.InvalidInput;
        }
        return parse.Invoke();
    }

    private const string RootDescription =
        "LevelDesign: dressed spectra of superconducting-qubit devices described as elements and couplers\n\n"
        + "  leveldesign [FILE]       open the terminal UI on a device file (no FILE: the built-in demo device)\n"
        + "  leveldesign COMMAND ...  work without a terminal; 'leveldesign COMMAND --help' lists its arguments\n\n"
        + "Manuals: docs/commands.md and docs/device-format.md; 'leveldesign examples DIR' copies them and the example devices into DIR.";

    /// <summary>
    /// Opens the terminal UI: on the demo without a path; otherwise the UI loads the file itself so that a bad
    /// file opens with its errors listed instead of ending the program.
    /// </summary>
    private static int OpenInteractive(string? path)
    {
        if (Console.IsInputRedirected || Console.IsOutputRedirected)
        {
            // a full-screen UI on a pipe would only garble the output; say what works instead
            Console.Error.WriteLine("the terminal UI needs an interactive terminal (standard input or output is redirected)");
            Console.Error.WriteLine($"for scripts use: leveldesign spectrum {path ?? "devices/pair.toml"}   (see leveldesign --help)");
            return ExitCodes.InvalidInput;
        }
        return path is null
            ? LevelDesign.Ui.TerminalApp.Run(DeviceDocument.Demo(), null)
            : LevelDesign.Ui.TerminalApp.Run(null, path);
    }
}
