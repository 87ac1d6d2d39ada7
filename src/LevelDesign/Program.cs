using System.CommandLine;
using LevelDesign.Commands;
using LevelDesign.Core.DeviceFiles;

namespace LevelDesign;

/// <summary>
/// The leveldesign executable: with no command it opens the terminal UI (on FILE or the built-in demo);
/// commands check, describe, spectrum and sweep work without a terminal. Exit codes: see <see cref="ExitCodes"/>.
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

    private static int OpenInteractive(string? path)
    {
        DeviceDocument document;
        if (path is null) document = DeviceDocument.Demo();
        else
        {
            var result = DeviceDocument.Load(path);
            if (!result.Ok)
            {
                foreach (var e in result.Errors) Console.Error.WriteLine(e.ToString());
                return ExitCodes.InvalidInput;
            }
            document = result.Document!;
        }
        return RunTerminalUi(document, path);
    }

    // TERMINAL UI CALL SITE: the one place the interactive UI starts. When LevelDesign.Ui.TerminalApp is merged,
    // replace the body with: return LevelDesign.Ui.TerminalApp.Run(document, path);
    private static int RunTerminalUi(DeviceDocument document, string? path)
    {
        Console.Error.WriteLine("the terminal UI is not available in this build");
        Console.Error.WriteLine($"loaded {path ?? "the built-in demo device"}: try 'leveldesign spectrum {path ?? "devices/pair.toml"}'");
        return ExitCodes.Ok;
    }
}
