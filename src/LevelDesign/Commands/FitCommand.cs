using System.CommandLine;
using LevelDesign.Core.Analysis;
using LevelDesign.Core.Composite;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Files;
using LevelDesign.Core.Sweeps;
using LevelDesign.Core.Units;
using LevelDesign.Core.Presentation;

namespace LevelDesign.Commands;

/// <summary>
/// leveldesign fit FILE --param PATH[=LOW:HIGH] ... --target QUANTITY=VALUE[@POINT|@BIAS=V] ... [--write]:
/// bounded least-squares fit of parameters to targets; --write puts the fitted values back in the file.
/// </summary>
public static class FitCommand
{
    public static Command Create()
    {
        var file = CommonOptions.File();
        var param = new Option<string[]>("--param") { Description = "a parameter to fit, PATH[=LOW:HIGH] (e.g. qa.ej_sum=15GHz:25GHz; default bounds: half to twice the value); repeatable", AllowMultipleArgumentsPerToken = false };
        var target = new Option<string[]>("--target") { Description = "QUANTITY=VALUE[@POINT or @BIAS=V[,BIAS=V]], e.g. qa.f01=5.25GHz@idle; VALUE is a frequency with its unit, a bare number is GHz; repeatable", AllowMultipleArgumentsPerToken = false };
        var write = new Option<bool>("--write") { Description = "write the fitted values into the file (same units, comments kept, previous file as FILE.bak)" };
        var at = CommonOptions.At();
        var point = CommonOptions.Point();
        var levels = CommonOptions.Levels(
            "number of dressed states solved at each fit evaluation (default: enough for every derived quantity)");
        var json = CommonOptions.Json();
        var allowLarge = CommonOptions.AllowLarge();
        var command = new Command("fit", "fit element or coupler parameters to target quantities; report fitted values in the file's units; --write saves them")
            { file, param, target, write, at, point, levels, json, allowLarge };
        command.SetAction(parse => Run(new FitArguments
        {
            Path = parse.GetValue(file)!, Parameters = parse.GetValue(param), Targets = parse.GetValue(target), Write = parse.GetValue(write),
            At = parse.GetValue(at), Point = parse.GetValue(point), Levels = parse.GetValue(levels), Json = parse.GetValue(json),
            AllowLarge = parse.GetValue(allowLarge),
        }));
        return command;
    }

    public static int Run(FitArguments a) => CommandGuard.Run(a.Path, () =>
    {
        if (a.Parameters is not { Length: > 0 } parameters) throw new UsageException("give at least one --param PATH[=LOW:HIGH], e.g. --param qa.ej_sum");
        if (a.Targets is not { Length: > 0 } targets) throw new UsageException("give at least one --target QUANTITY=VALUE, e.g. --target qa.f01=5.25GHz");
        if (a.Levels is < 1) throw new UsageException("--levels must be at least 1");
        var document = CommandGuard.Load(a.Path, a.AllowLarge);
        var device = DeviceInput.Resolve(document, a.Point, a.At, out _);
        var fitParameters = parameters.Select(p => Term("--param", () => FitTerms.Parameter(device, p))).ToArray();
        if (fitParameters.Select(p => p.Path).Distinct().Count() != fitParameters.Length) throw new UsageException("a --param is given twice");
        var fields = fitParameters.Select(p => FitField.Of(document, p.Path)).ToArray();
        if (a.Write && fields.FirstOrDefault(f => f.Refusal is not null) is FitField refused)
            throw new UsageException($"--write refused for {refused.DevicePath}: {refused.Refusal}");
        // a file that cannot be saved (read-only, unwritable folder) is said before the fit runs
        if (a.Write && AtomicFile.Problem(a.Path) is string problem) throw new UsageException($"--write: {problem}");

        var solver = new DeviceSolver();
        var available = DerivedQuantities.From(solver.Solve(device, a.Levels)).Named().Keys.ToArray();
        var fitTargets = targets.Select(t => Term("--target", () => FitTerms.Target(document, t, available))).ToArray();
        var result = SweepExecution.WithCancel(token => Task.Run(() => ParameterFit.Fit(device, fitParameters, fitTargets, solver, a.Levels, cancellation: token), token));

        Console.Write(a.Json ? FitReport.Json(document, fitParameters, fields, result) : FitReport.Table(document, fitParameters, fields, result));
        if (a.Write)
        {
            var edited = document;
            foreach (var f in fields)
            {
                edited = edited.WithValue(f.FieldPath!, f.Format(result.Values[f.DevicePath]), out var error);
                if (error is not null) throw new UsageException($"--write: {error}");
            }
            try { edited.Save(); }
            catch (Exception e) when (e is IOException or UnauthorizedAccessException)
            {
                throw new UsageException(e is FileWriteException ? $"--write: {e.Message}" : $"--write: cannot write {document.Path}: {e.Message}");
            }
            Console.Error.WriteLine($"wrote {fields.Length} value(s) to {document.Path} (previous file kept as {document.Path}.bak)");
        }
        return ExitCodes.Ok;
    });

    /// <summary>Reads one typed term; a problem becomes a usage error naming the option.</summary>
    public static T Term<T>(string option, Func<T> read)
    {
        try { return read(); }
        catch (InputTermException e) { throw new UsageException($"{option} {e.Message}"); }
    }
}
