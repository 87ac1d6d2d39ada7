using System.CommandLine;
using LevelDesign.Commands;
using LevelDesign.Core.DeviceFiles;

namespace LevelDesign;

/// <summary>
/// The leveldesign executable: with no command it opens the terminal UI (on FILE or the built-in demo);
/// commands check, describe, spectrum, sweep, crossings, solve, fit, plot, coherence, effective and matrix work without a terminal. Exit codes: see <see cref="ExitCodes"/>.
/// </summary>
public static class Program
{
    public static int Main(string[] args)
    {
        var file = new Argument<string?>("FILE") { Description = "device file to open in the terminal UI (default: the built-in demo)", Arity = ArgumentArity.ZeroOrOne };
        var root = new RootCommand("LevelDesign: dressed spectra of superconducting-qubit devices described as elements and couplers")
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
            CoherenceCommand.Create(),
            EffectiveCommand.Create(),
            MatrixCommand.Create(),
        };
        root.SetAction(parse => OpenInteractive(parse.GetValue(file)));
        var parse = root.Parse(args);
        if (parse.Errors.Count > 0)
        {
            foreach (var e in parse.Errors) Console.Error.WriteLine(e.Message);
            Console.Error.WriteLine("run 'leveldesign --help' for usage");
            return ExitCodes.InvalidInput;
        }
        return parse.Invoke();
    }

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
