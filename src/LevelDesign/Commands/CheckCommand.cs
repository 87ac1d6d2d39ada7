using System.CommandLine;
using LevelDesign.Core.Composite;
using LevelDesign.Core.DeviceFiles;

namespace LevelDesign.Commands;

/// <summary>leveldesign check FILE: validate only.</summary>
public static class CheckCommand
{
    public static Command Create()
    {
        var file = CommonOptions.File();
        var allowLarge = CommonOptions.AllowLarge();
        var command = new Command("check", "validate a device file: every problem with file, line, column and field, or a one-line summary") { file, allowLarge };
        command.SetAction(parse => Run(parse.GetValue(file)!, parse.GetValue(allowLarge)));
        return command;
    }

    public static int Run(string path, bool allowLarge) => CommandGuard.Run(path, () =>
    {
        var result = DeviceDocument.Load(path, new DeviceLoadOptions(AllowLarge: allowLarge));
        if (!result.Ok)
        {
            // Errors are the result of a check, so they go to stdout; the count goes to stderr.
            foreach (var e in result.Errors) Console.WriteLine(e.ToString());
            Console.Error.WriteLine($"{path}: {ErrorList.CountText(result.Errors)}");
            return ExitCodes.InvalidInput;
        }
        var document = result.Document!;
        try
        {
            // Building the problem also checks what only the bare spectra can tell (g conversions, basis convergence).
            var problem = new DeviceSolver().Prepare(document.Device);
            Console.WriteLine($"ok: {document.Device.Elements.Count} elements, {document.Device.Couplers.Count} couplers, composite dimension {problem.Basis.Dimension}");
            foreach (string w in Core.Analysis.TruncationWarnings.For(document.Device)) Console.WriteLine($"{path}: warning: {w}");
            return ExitCodes.Ok;
        }
        catch (Exception e) when (ComputationErrors.IsExpected(e))
        {
            // a device the bare solves reject is a finding of the check (stdout, exit 2), not a failed computation
            Console.WriteLine($"{path}:0:0: device: {e.Message}");
            return ExitCodes.InvalidInput;
        }
    });
}
