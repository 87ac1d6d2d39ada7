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
        command.SetAction(parse => Run(new CrossingsArguments
        {
            Path = parse.GetValue(file)!, Vary = parse.GetValue(vary), Links = parse.GetValue(link), SweepName = parse.GetValue(sweep),
            Near = parse.GetValue(near), MinGap = parse.GetValue(minGap), MaxGap = parse.GetValue(maxGap), At = parse.GetValue(at),
            Point = parse.GetValue(point), Levels = parse.GetValue(levels), Labels = parse.GetValue(labels), Json = parse.GetValue(json),
            Csv = parse.GetValue(csv), AllowLarge = parse.GetValue(allowLarge),
        }));
        return command;
    }

    public static int Run(CrossingsArguments a) => CommandGuard.Run(a.Path, () =>
    {
        CommandGuard.OneFormat(a.Json, a.Csv);
        var mode = CommandGuard.LabelMode(a.Labels);
        double min = Gap("--min-gap", a.MinGap, 0), max = Gap("--max-gap", a.MaxGap, 0.5);
        if (min > max) throw new UsageException($"--min-gap {a.MinGap} is above --max-gap {a.MaxGap ?? "500MHz"}");
        var document = CommandGuard.Load(a.Path, a.AllowLarge);
        var setup = SweepSetup.Create(document, a, maxAxes: 1);
        var axis = setup.Axes[0];
        if (axis.Count < 3) throw new UsageException($"--vary: a crossing search needs at least 3 points (got {axis.Count})");
        var points = OperatingPoints(setup, a.Near);
        var (result, crossings, _) = Find(setup, mode, a.Levels, min, max, points.Select(p => p.Value).ToArray());
        if (result is null) return ExitCodes.Cancelled;
        var rows = CrossingReport.Rows(crossings, points);
        Console.Write(a.Json ? CrossingReport.Json(document, axis, rows, result.Completed)
            : a.Csv ? CrossingReport.Csv(document, axis, rows)
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
