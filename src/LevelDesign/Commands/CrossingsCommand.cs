using System.CommandLine;
using LevelDesign.Core.Composite;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Sweeps;
using LevelDesign.Core.Units;
using LevelDesign.Core.Presentation;

namespace LevelDesign.Commands;

/// <summary>
/// leveldesign crossings FILE --vary BIAS=START:STOP:COUNT [--near POINT ...] [--min-gap F] [--max-gap F]
/// [--json|--csv]: every near-approach of two labelled levels along a 1-D sweep, ranked by distance to the
/// operating points.
/// </summary>
public static class CrossingsCommand
{
    public static Command Create()
    {
        var file = CommonOptions.File();
        var vary = SweepCommand.Vary("the axis BIAS=START:STOP:COUNT to search along (one axis)");
        var link = SweepCommand.Link();
        var sweep = SweepCommand.SweepName();
        var near = new Option<string[]>("--near") { Description = "rank by distance to this operating point (a [points] name or a value of the swept bias); repeatable; default: every point of the file", AllowMultipleArgumentsPerToken = false };
        var minGap = new Option<string?>("--min-gap") { Description = "leave out crossings whose gap is below this (e.g. 1MHz: levels that do not couple)" };
        var maxGap = new Option<string?>("--max-gap") { Description = "leave out crossings whose gap is above this (default 500MHz)" };
        var at = CommonOptions.At();
        var point = CommonOptions.Point();
        var levels = CommonOptions.Levels(
            "number of lowest labelled states searched for crossings with each other (default: the ground and one-excitation states; the cost grows with its square)");
        var labels = SweepCommand.Labels();
        var json = CommonOptions.Json();
        var csv = CommonOptions.Csv();
        var allowLarge = CommonOptions.AllowLarge();
        var command = new Command("crossings", "every avoided crossing along a 1-D sweep: labels, bias, gap (2g_eff), purity, distance to operating points")
            { file, vary, link, sweep, near, minGap, maxGap, at, point, levels, labels, json, csv, allowLarge };
        command.SetAction(parse => Run(parse.GetValue(file)!, parse.GetValue(vary), parse.GetValue(link), parse.GetValue(sweep), parse.GetValue(near),
            parse.GetValue(minGap), parse.GetValue(maxGap), parse.GetValue(at), parse.GetValue(point), parse.GetValue(levels), parse.GetValue(labels),
            parse.GetValue(json), parse.GetValue(csv), parse.GetValue(allowLarge)));
        return command;
    }

    public static int Run(string path, string[]? vary, string[]? links, string? sweepName, string[]? near, string? minGap, string? maxGap,
        string[]? at, string? point, int? levels, string? labels, bool json, bool csv, bool allowLarge) => CommandGuard.Run(path, () =>
    {
        CommandGuard.OneFormat(json, csv);
        var mode = CommandGuard.LabelMode(labels);
        double min = Gap("--min-gap", minGap, 0), max = Gap("--max-gap", maxGap, 0.5);
        if (min > max) throw new UsageException($"--min-gap {minGap} is above --max-gap {maxGap ?? "500MHz"}");
        var document = CommandGuard.Load(path, allowLarge);
        var setup = SweepSetup.Create(document, point, at, vary, links, sweepName, maxAxes: 1);
        var axis = setup.Axes[0];
        if (axis.Count < 3) throw new UsageException($"--vary: a crossing search needs at least 3 points (got {axis.Count})");
        var points = OperatingPoints(setup, near);
        var (result, crossings, _) = Find(setup, mode, levels, min, max, points.Select(p => p.Value).ToArray());
        if (result is null) return ExitCodes.Cancelled;
        var rows = CrossingReport.Rows(crossings, points);
        Console.Write(json ? CrossingReport.Json(document, axis, rows, result.Completed)
            : csv ? CrossingReport.Csv(document, axis, rows)
            : CrossingReport.Table(document, axis, rows));
        return ExitCodes.Ok;
    });

    /// <summary>Runs the sweep and the crossing search; null result when Ctrl-C stopped it.</summary>
    public static (SweepResult? Result, IReadOnlyList<Crossing> Crossings, int Shown) Find(SweepSetup setup, LabelMode mode, int? levels,
        double minGapGHz, double maxGapGHz, IReadOnlyList<double> operatingPoints)
    {
        var solver = new DeviceSolver();
        var (planLevels, shown) = SweepExecution.Levels(setup, levels, solver);
        var result = SweepExecution.Run(setup, mode, planLevels, solver);
        if (!result.Completed)
        {
            Console.Error.WriteLine("cancelled: the crossing search needs the whole sweep");
            return (null, [], shown);
        }
        var options = CrossingSearch.Options(result, operatingPoints, levels, maxGapGHz);
        var crossings = SweepExecution.WithCancel(token => Task.Run(() => CrossingFinder.Find(result, x => setup.Resolve([x]), options, solver, token), token));
        var kept = crossings.Where(c => c.GapGHz >= minGapGHz && c.GapGHz <= maxGapGHz).ToArray();
        return (result, kept, shown);
    }

    /// <summary>The operating points as values of the swept bias: named points of the file, or values typed.</summary>
    public static IReadOnlyList<(string Name, double Value)> OperatingPoints(SweepSetup setup, string[]? near)
    {
        var document = setup.Document;
        var axis = setup.Axes[0];
        double otherwise = setup.Start.TryGetValue(axis.Path, out double v) ? v : CrossingSearch.FileValue(document, axis.Path);
        var named = CrossingSearch.OperatingPoints(document, axis.Path, otherwise);
        if (near is not { Length: > 0 }) return named;
        return near.Select(n =>
        {
            if (named.FirstOrDefault(p => p.Name == n) is { Name: not null } p) return p;
            if (ControlValues.TryParseValue(document, axis.Path, n, out double v, out _)) return (n, v);
            throw new UsageException($"--near {n}: not an operating point{EditDistance.Suggestion(n, document.Points.Select(x => x.Name))} (points: {string.Join(", ", document.Points.Select(x => x.Name))}) nor a value of {axis.Path}");
        }).ToArray();
    }

    private static double Gap(string option, string? text, double fallback)
    {
        if (text is null) return fallback;
        if (!QuantityParser.TryParse(text, UnitKind.Frequency, out double v, out string error)) throw new UsageException($"{option} {text}: {error}");
        if (!(v >= 0)) throw new UsageException($"{option} {text}: a gap cannot be negative");
        return v;
    }
}
