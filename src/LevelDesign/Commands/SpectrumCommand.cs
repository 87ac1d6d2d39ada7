using System.CommandLine;
using LevelDesign.Core.Composite;
using LevelDesign.Core.Presentation;

namespace LevelDesign.Commands;

/// <summary>leveldesign spectrum FILE [--at ...] [--levels K] [--json|--csv]: dressed states and derived quantities.</summary>
public static class SpectrumCommand
{
    public static Command Create()
    {
        var file = CommonOptions.File();
        var at = CommonOptions.At();
        var point = CommonOptions.Point();
        var levels = CommonOptions.Levels(
            "number of dressed states to list, lowest first (default: every state the derived quantities use)");
        var json = CommonOptions.Json();
        var csv = CommonOptions.Csv();
        var allowLarge = CommonOptions.AllowLarge();
        var purity = CommonOptions.Purity("flag derived quantities read from states less pure than this");
        var states = CommonOptions.States();
        var command = new Command("spectrum", "dressed states (label, energy, purity, components) and derived quantities at one bias point")
            { file, at, point, levels, states, json, csv, allowLarge, purity };
        command.SetAction(parse => Run(new SpectrumArguments
        {
            Path = parse.GetValue(file)!, At = parse.GetValue(at), Point = parse.GetValue(point), Levels = parse.GetValue(levels),
            Json = parse.GetValue(json), Csv = parse.GetValue(csv), AllowLarge = parse.GetValue(allowLarge), Purity = parse.GetValue(purity),
            States = parse.GetValue(states),
        }));
        return command;
    }

    public static int Run(SpectrumArguments a) => CommandGuard.Run(a.Path, () =>
    {
        if (a.Purity is double p && !(p > 0 && p <= 1)) throw new UsageException($"--purity {p}: give a purity in (0, 1], e.g. 0.9");
        CommandGuard.OneFormat(a.Json, a.Csv);
        if (a.Levels is < 1) throw new UsageException("--levels must be at least 1");
        var selection = StateSelection.Auto;
        if (a.States is not null && !StateSelection.TryParse(a.States, out selection, out string stateError)) throw new UsageException($"--states {stateError}");
        var document = DeviceInput.Load(a.Path, a.AllowLarge);
        var device = DeviceInput.Resolve(document, a.Point, a.At, out var applied);
        if (selection.UnknownElement(device) is string unknown) throw new UsageException(unknown);
        var (spectrum, shown) = Compute(new DeviceSolver { Selection = selection }, device, a.Levels);
        var warnings = DeviceWarnings.Print(a.Path, device);
        double threshold = a.Purity ?? document.PurityThreshold;
        if (a.Json)
        {
            var report = SpectrumFormatter.Report(device.Name, spectrum, shown, applied, threshold);
            report["warnings"] = new System.Text.Json.Nodes.JsonArray(warnings.Select(w => (System.Text.Json.Nodes.JsonNode?)w).ToArray());
            Console.WriteLine(JsonValues.Write(report));
        }
        else if (a.Csv) Console.Write(SpectrumFormatter.StatesCsv(spectrum, shown));
        else Console.Write(SpectrumFormatter.Table(device.Name, spectrum, shown, threshold));
        return ExitCodes.Ok;
    });

    /// <summary>
    /// Solves for the states the solver's selection needs (by default all states up to two excitations, or the
    /// neighbours' states of a large module), or more when asked, and returns how many to show.
    /// </summary>
    public static (DressedSpectrum Spectrum, int Shown) Compute(DeviceSolver solver, Core.Model.Device device, int? levels)
    {
        var problem = solver.Prepare(device);
        var selected = solver.Select(problem);
        if (levels > selected.Count) selected = selected with { Count = Math.Min(problem.Basis.Dimension, levels.Value) };
        var spectrum = solver.Solve(problem, selected);
        return (spectrum, Math.Min(levels ?? spectrum.Count, spectrum.Count));
    }
}
