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
        command.SetAction(parse => Run(parse.GetValue(file)!, parse.GetValue(at), parse.GetValue(point), parse.GetValue(levels),
            parse.GetValue(json), parse.GetValue(csv), parse.GetValue(allowLarge), parse.GetValue(purity), parse.GetValue(states)));
        return command;
    }

    public static int Run(string path, string[]? at, string? point, int? levels, bool json, bool csv, bool allowLarge, double? purity = null,
        string? states = null) => CommandGuard.Run(path, () =>
    {
        if (purity is double p && !(p > 0 && p <= 1)) throw new UsageException($"--purity {p}: give a purity in (0, 1], e.g. 0.9");
        CommandGuard.OneFormat(json, csv);
        if (levels is < 1) throw new UsageException("--levels must be at least 1");
        var selection = StateSelection.Auto;
        if (states is not null && !StateSelection.TryParse(states, out selection, out string stateError)) throw new UsageException($"--states {stateError}");
        var document = DeviceInput.Load(path, allowLarge);
        var device = DeviceInput.Resolve(document, point, at, out var applied);
        if (selection.UnknownElement(device) is string unknown) throw new UsageException(unknown);
        var (spectrum, shown) = Compute(new DeviceSolver { Selection = selection }, device, levels);
        var warnings = DeviceWarnings.Print(path, device);
        double threshold = purity ?? document.PurityThreshold;
        if (json)
        {
            var report = SpectrumFormatter.Report(device.Name, spectrum, shown, applied, threshold);
            report["warnings"] = new System.Text.Json.Nodes.JsonArray(warnings.Select(w => (System.Text.Json.Nodes.JsonNode?)w).ToArray());
            Console.WriteLine(JsonValues.Write(report));
        }
        else if (csv) Console.Write(SpectrumFormatter.StatesCsv(spectrum, shown));
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
