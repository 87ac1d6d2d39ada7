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
    /// <summary>Residuals are weighted equally in this unit (1 MHz), whatever the quantity.</summary>
    public const double ResidualScaleGHz = 1e-3;

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
        command.SetAction(parse => Run(parse.GetValue(file)!, parse.GetValue(param), parse.GetValue(target), parse.GetValue(write), parse.GetValue(at),
            parse.GetValue(point), parse.GetValue(levels), parse.GetValue(json), parse.GetValue(allowLarge)));
        return command;
    }

    public static int Run(string path, string[]? parameters, string[]? targets, bool write, string[]? at, string? point, int? levels, bool json,
        bool allowLarge) => CommandGuard.Run(path, () =>
    {
        if (parameters is not { Length: > 0 }) throw new UsageException("give at least one --param PATH[=LOW:HIGH], e.g. --param qa.ej_sum");
        if (targets is not { Length: > 0 }) throw new UsageException("give at least one --target QUANTITY=VALUE, e.g. --target qa.f01=5.25GHz");
        if (levels is < 1) throw new UsageException("--levels must be at least 1");
        var document = CommandGuard.Load(path, allowLarge);
        var device = DeviceInput.Resolve(document, point, at, out _) ?? throw new UsageException("");
        var fitParameters = parameters.Select(p => Parameter(device, p)).ToArray();
        if (fitParameters.Select(p => p.Path).Distinct().Count() != fitParameters.Length) throw new UsageException("a --param is given twice");
        var fields = fitParameters.Select(p => FitField.Of(document, p.Path)).ToArray();
        if (write && fields.FirstOrDefault(f => f.Refusal is not null) is FitField refused)
            throw new UsageException($"--write refused for {refused.DevicePath}: {refused.Refusal}");
        // a file that cannot be saved (read-only, unwritable folder) is said before the fit runs
        if (write && AtomicFile.Problem(path) is string problem) throw new UsageException($"--write: {problem}");

        var solver = new DeviceSolver();
        var available = DerivedQuantities.From(solver.Solve(device, levels)).Named().Keys.ToArray();
        var fitTargets = targets.Select(t => Target(document, t, available)).ToArray();
        var result = SweepExecution.WithCancel(token => Task.Run(() => ParameterFit.Fit(device, fitParameters, fitTargets, solver, levels, cancellation: token), token));

        Console.Write(json ? FitReport.Json(document, fitParameters, fields, result) : FitReport.Table(document, fitParameters, fields, result));
        if (write)
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

    /// <summary>PATH[=LOW:HIGH] with bounds in the parameter's unit; the start value is the device's, moved inside the bounds.</summary>
    public static FitParameter Parameter(Core.Model.Device device, string text)
    {
        int eq = text.IndexOf('=');
        string path = (eq < 0 ? text : text[..eq]).Trim();
        if (!path.Contains('.')) throw new UsageException($"--param {text}: give a parameter path ELEMENT.PARAMETER or COUPLER.PARAMETER, e.g. qa.ej_sum");
        double initial;
        try { initial = device.GetParameter(path); }
        catch (ArgumentException e) { throw new UsageException($"--param {text}: {e.Message}"); }
        var kind = ParameterKinds.Of(path[(path.LastIndexOf('.') + 1)..]);
        double lower, upper;
        if (eq < 0)
        {
            if (!(initial > 0)) throw new UsageException($"--param {text}: the value is {initial}; give bounds PATH=LOW:HIGH");
            (lower, upper) = (initial / 2, initial * 2);
        }
        else
        {
            var parts = text[(eq + 1)..].Split(':');
            if (parts.Length != 2) throw new UsageException($"--param {text}: write PATH=LOW:HIGH, e.g. qa.ec=150MHz:300MHz");
            if (!QuantityParser.TryParseModelValue(parts[0], kind, out lower, out string e1)) throw new UsageException($"--param {text}: LOW: {e1}");
            if (!QuantityParser.TryParseModelValue(parts[1], kind, out upper, out string e2)) throw new UsageException($"--param {text}: HIGH: {e2}");
            if (!(lower < upper)) throw new UsageException($"--param {text}: LOW must be below HIGH");
        }
        return new FitParameter(path, Math.Clamp(initial, lower, upper), lower, upper);
    }

    /// <summary>QUANTITY=VALUE[@POINT|@BIAS=V,...]: the settings are parameter paths (a bias becomes its target parameter).</summary>
    public static FitTarget Target(DeviceDocument document, string text, IReadOnlyCollection<string> available)
    {
        int atSign = text.IndexOf('@');
        var (quantity, value) = TargetArguments.Parse(atSign < 0 ? text : text[..atSign], available);
        var settings = new Dictionary<string, double>();
        if (atSign >= 0)
        {
            string where = text[(atSign + 1)..].Trim();
            if (document.Points.FirstOrDefault(p => p.Name == where) is OperatingPoint p)
                foreach (var (bias, v) in p.BiasValues) Add(bias, v);
            else if (!where.Contains('='))
                throw new UsageException($"--target {text}: no operating point '{where}'{EditDistance.Suggestion(where, document.Points.Select(x => x.Name))} (points: {string.Join(", ", document.Points.Select(x => x.Name))}); or write @BIAS=VALUE");
            else
                foreach (string setting in where.Split(','))
                {
                    if (!DeviceInput.TryParseSetting(document, setting, out string name, out double v, out string error))
                        throw new UsageException($"--target {text}: {error}");
                    Add(name, v);
                }
        }
        return new FitTarget(quantity, value, settings, ResidualScaleGHz);

        void Add(string name, double v)
        {
            if (document.Bias(name) is BiasDefinition b) settings[b.Target] = b.ToParameter(v);
            else settings[name] = v;
        }
    }
}
