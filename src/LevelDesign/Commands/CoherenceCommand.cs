using LevelDesign.Core.Presentation;
using System.CommandLine;
using LevelDesign.Core.Analysis;
using LevelDesign.Core.Composite;
using LevelDesign.Core.Sweeps;
using LevelDesign.Output;

namespace LevelDesign.Commands;

/// <summary>
/// leveldesign coherence FILE [--at ...] [--point P] [noise and loss options] [--json]: every qubit's coherence budget
/// (each channel with formula and source, T1, T_φ, T2, the dominant channel); with --vary or --sweep the same along a
/// sweep as CSV (or --json). Model estimates, to confirm by measurement.
/// </summary>
public static class CoherenceCommand
{
    public static Command Create()
    {
        var file = CommonOptions.File();
        var at = CommonOptions.At();
        var point = CommonOptions.Point();
        var vary = SweepCommand.Vary("tabulate along an axis BIAS=START:STOP:COUNT (two for a grid) instead of one point");
        var link = SweepCommand.Link();
        var sweep = new Option<string?>("--sweep") { Description = "tabulate along a sweep defined in the file ([sweeps.NAME])" };
        var json = CommonOptions.Json();
        var csv = CommonOptions.Csv();
        var output = new Option<string?>("--out") { Description = "write a sweep's table to this file instead of stdout" };
        var allowLarge = CommonOptions.AllowLarge();
        var noise = new CoherenceOptions();
        var command = new Command("coherence", "each qubit's coherence budget (Purcell, dielectric, inductive, flux and charge noise, thermal photons): T1, T_φ, T2 and what limits them, at a point or along a sweep")
            { file, at, point, vary, link, sweep, json, csv, output, allowLarge };
        foreach (var o in noise.All) command.Options.Add(o);
        command.SetAction(parse => Run(new CoherenceArguments
        {
            Path = parse.GetValue(file)!, At = parse.GetValue(at), Point = parse.GetValue(point), Vary = parse.GetValue(vary),
            Links = parse.GetValue(link), SweepName = parse.GetValue(sweep), Json = parse.GetValue(json), Csv = parse.GetValue(csv),
            Output = parse.GetValue(output), AllowLarge = parse.GetValue(allowLarge), Inputs = fromFile => noise.Read(parse, fromFile),
        }));
        return command;
    }

    public static int Run(CoherenceArguments a) => CommandGuard.Run(a.Path, () =>
    {
        CommandGuard.OneFormat(a.Json, a.Csv);
        var document = CommandGuard.Load(a.Path, a.AllowLarge);
        var inputs = a.Inputs(document.Coherence);
        var solver = new DeviceSolver();
        if (a.Vary is not { Length: > 0 } && a.SweepName is null)
        {
            if (a.Csv) throw new UsageException("--csv is for a sweep (give --vary or --sweep); one point prints a table or --json");
            if (a.Output is not null) throw new UsageException("--out is for a sweep (give --vary or --sweep)");
            var device = DeviceInput.Resolve(document, a.Point, a.At, out var applied);
            var spectrum = solver.Solve(device);
            var budgets = CoherenceEstimator.Estimate(solver, spectrum, inputs);
            Console.Write(a.Json
                ? JsonValues.Write(CoherenceReport.Json(device.Name, applied, budgets, inputs)) + Environment.NewLine
                : CoherenceReport.Table(device.Name, budgets, inputs));
            return ExitCodes.Ok;
        }

        var setup = SweepSetup.Create(document, a, maxAxes: 2);
        // the budgets read matrix elements from every point's vectors
        var result = SweepExecution.Run(setup, LabelMode.ByCharacter, null, solver, keepVectors: true);
        // the budget needs extra solves per point (flux and charge derivatives); points are independent
        var rows = new (IReadOnlyList<double>, IReadOnlyList<CoherenceBudget>)[result.Points.Count];
        var progress = new ProgressBar(rows.Length);
        bool completed = result.Completed && SweepExecution.WithCancel(token => Task.Run(() =>
        {
            int done = 0;
            var options = new ParallelOptions { CancellationToken = token };
            try
            {
                Parallel.For(0, rows.Length, options, i =>
                {
                    var p = result.Points[i];
                    rows[i] = (p.AxisValues, CoherenceEstimator.Estimate(solver, p.Spectrum, inputs));
                    progress.Report(Interlocked.Increment(ref done));
                });
                return true;
            }
            catch (OperationCanceledException) { return false; }
        }, token), progress.Finish);
        var kept = rows.Where(r => r.Item2 is not null).ToArray();
        if (!completed) Console.Error.WriteLine($"cancelled: keeping the {kept.Length} points whose budget was computed");
        var axes = setup.Axes.Select(a => a.Path).ToArray();
        string text = a.Json
            ? JsonValues.Write(CoherenceReport.SweepJson(document.Device.Name, axes, kept, inputs, completed)) + Environment.NewLine
            : CoherenceReport.Csv(axes, kept, inputs);
        SweepCommand.Write(text, a.Output, kept.Length);
        return completed ? ExitCodes.Ok : ExitCodes.Cancelled;
    });
}
