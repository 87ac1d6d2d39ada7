using System.CommandLine;
using LevelDesign.Core.Composite;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Output;

namespace LevelDesign.Commands;

/// <summary>
/// leveldesign sweep FILE --vary BIAS=START:STOP:COUNT [...] [--sweep NAME] [--json|--csv] [--out PATH].
/// Runs point by point (the parallel sweep engine will replace the loop); Ctrl-C stops and keeps finished points.
/// </summary>
public static class SweepCommand
{
    public static Command Create()
    {
        var file = CommonOptions.File();
        var vary = new Option<string[]>("--vary")
        {
            Description = "an axis BIAS=START:STOP:COUNT (bias name or parameter path; values in the bias's unit); give two for a grid",
            AllowMultipleArgumentsPerToken = false,
        };
        var sweep = new Option<string?>("--sweep") { Description = "use a sweep defined in the file ([sweeps.NAME])" };
        var at = CommonOptions.At();
        var point = CommonOptions.Point();
        var levels = CommonOptions.Levels();
        var json = CommonOptions.Json();
        var csv = CommonOptions.Csv();
        var output = new Option<string?>("--out") { Description = "write the result to this file instead of stdout" };
        var allowLarge = CommonOptions.AllowLarge();
        var command = new Command("sweep", "the spectrum at every point of a bias sweep; progress on stderr, Ctrl-C keeps finished points")
            { file, vary, sweep, at, point, levels, json, csv, output, allowLarge };
        command.SetAction(parse => Run(parse.GetValue(file)!, parse.GetValue(vary), parse.GetValue(sweep), parse.GetValue(at),
            parse.GetValue(point), parse.GetValue(levels), parse.GetValue(json), parse.GetValue(csv), parse.GetValue(output), parse.GetValue(allowLarge)));
        return command;
    }

    public static int Run(string path, string[]? vary, string? sweepName, string[]? at, string? point, int? levels,
        bool json, bool csv, string? output, bool allowLarge)
    {
        if (json && csv) { Console.Error.WriteLine("choose one of --json and --csv"); return ExitCodes.InvalidInput; }
        var document = DeviceInput.Load(path, allowLarge);
        if (document is null) return ExitCodes.InvalidInput;
        if (DeviceInput.Resolve(document, point, at, out var applied) is null) return ExitCodes.InvalidInput;
        var start = applied.ToDictionary(kv => kv.Key, kv => kv.Value!.GetValue<double>());
        var axes = Axes(document, vary, sweepName);
        if (axes is null) return ExitCodes.InvalidInput;

        using var cancel = new CancellationTokenSource();
        ConsoleCancelEventHandler onCancel = (_, e) => { e.Cancel = true; cancel.Cancel(); };
        Console.CancelKeyPress += onCancel;
        var points = new List<SweepFormatter.Point>();
        var solver = new DeviceSolver();
        int total = axes.Aggregate(1, (n, a) => n * a.Count);
        var progress = new ProgressBar(total);
        try
        {
            foreach (var values in Grid(axes))
            {
                if (cancel.IsCancellationRequested) break;
                var device = document.Resolve(axes, values, start);
                var (spectrum, _) = SpectrumCommand.Compute(solver, device, levels);
                points.Add(new SweepFormatter.Point(values, spectrum));
                progress.Report(points.Count);
            }
        }
        catch (Exception e) when (ComputationErrors.IsExpected(e))
        {
            progress.Finish();
            Console.Error.WriteLine($"stopped at point {points.Count + 1} of {total}");
            int code = ComputationErrors.Report(path, e);
            Write(document, axes, points, levels, json, csv, output, completed: false);
            return code;
        }
        finally
        {
            Console.CancelKeyPress -= onCancel;
        }
        bool completed = points.Count == total;
        if (!completed) Console.Error.WriteLine($"\ncancelled: keeping the {points.Count} of {total} points computed");
        Write(document, axes, points, levels, json, csv, output, completed);
        return completed ? ExitCodes.Ok : ExitCodes.Cancelled;
    }

    private static void Write(DeviceDocument document, IReadOnlyList<SweepAxis> axes, List<SweepFormatter.Point> points, int? levels,
        bool json, bool csv, string? output, bool completed)
    {
        string text = json
            ? JsonValues.Write(SweepFormatter.Json(document.Device.Name, axes, points, levels, completed)) + Environment.NewLine
            : SweepFormatter.Csv(axes, points, levels);
        if (!json && !csv && output is null)
            Console.Error.WriteLine("(no --json given: writing CSV)");
        if (output is null) Console.Write(text);
        else
        {
            AtomicFile.Write(output, text);
            Console.Error.WriteLine($"wrote {points.Count} points to {output}");
        }
    }

    private static IReadOnlyList<SweepAxis>? Axes(DeviceDocument document, string[]? vary, string? sweepName)
    {
        if (vary is { Length: > 0 })
        {
            if (vary.Length > 2) { Console.Error.WriteLine("at most two --vary axes (a grid)"); return null; }
            var axes = new List<SweepAxis>();
            foreach (var v in vary)
            {
                if (ParseAxis(document, v, out var axis, out string error)) axes.Add(axis!);
                else { Console.Error.WriteLine($"--vary {v}: {error}"); return null; }
            }
            return axes;
        }
        var sweeps = document.Sweeps;
        var chosen = sweepName is null ? sweeps.FirstOrDefault() : sweeps.FirstOrDefault(s => s.Name == sweepName);
        if (chosen is null)
        {
            Console.Error.WriteLine(sweepName is null
                ? "give --vary BIAS=START:STOP:COUNT (this file defines no sweep)"
                : $"no sweep '{sweepName}'{EditDistance.Suggestion(sweepName, sweeps.Select(s => s.Name))} (sweeps: {string.Join(", ", sweeps.Select(s => s.Name))})");
            return null;
        }
        return chosen.Axes;
    }

    public static bool ParseAxis(DeviceDocument document, string text, out SweepAxis? axis, out string error)
    {
        axis = null;
        int eq = text.IndexOf('=');
        var parts = eq > 0 ? text[(eq + 1)..].Split(':') : [];
        if (eq <= 0 || parts.Length != 3)
        {
            error = "write BIAS=START:STOP:COUNT, e.g. qc_flux=0:0.5:101";
            return false;
        }
        string name = text[..eq].Trim();
        if (!DeviceInput.TryParseValue(document, name, parts[0], out double from, out error)) return false;
        if (!DeviceInput.TryParseValue(document, name, parts[1], out double to, out error)) return false;
        if (!int.TryParse(parts[2], out int count) || count < 1)
        {
            error = $"COUNT '{parts[2]}' must be a whole number ≥ 1";
            return false;
        }
        axis = new SweepAxis(name, from, to, count, []);
        return true;
    }

    /// <summary>Axis values in row-major order (the last axis varies fastest).</summary>
    public static IEnumerable<double[]> Grid(IReadOnlyList<SweepAxis> axes)
    {
        var index = new int[axes.Count];
        int total = axes.Aggregate(1, (n, a) => n * a.Count);
        for (int p = 0; p < total; p++)
        {
            int rest = p;
            for (int a = axes.Count - 1; a >= 0; a--) { index[a] = rest % axes[a].Count; rest /= axes[a].Count; }
            yield return axes.Select((a, i) => a.Count == 1 ? a.Start : a.Start + (a.Stop - a.Start) * index[i] / (a.Count - 1)).ToArray();
        }
    }
}
