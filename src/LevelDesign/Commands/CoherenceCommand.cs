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
        command.SetAction(parse => Run(parse.GetValue(file)!, parse.GetValue(at), parse.GetValue(point), parse.GetValue(vary), parse.GetValue(link),
            parse.GetValue(sweep), parse.GetValue(json), parse.GetValue(csv), parse.GetValue(output), parse.GetValue(allowLarge), file => noise.Read(parse, file)));
        return command;
    }

    public static int Run(string path, string[]? at, string? point, string[]? vary, string[]? links, string? sweepName, bool json, bool csv,
        string? output, bool allowLarge, Func<CoherenceInputs, CoherenceInputs> readInputs) => CommandGuard.Run(path, () =>
    {
        CommandGuard.OneFormat(json, csv);
        var document = CommandGuard.Load(path, allowLarge);
        var inputs = readInputs(document.Coherence);
        var solver = new DeviceSolver();
        if (vary is not { Length: > 0 } && sweepName is null)
        {
            if (csv) throw new UsageException("--csv is for a sweep (give --vary or --sweep); one point prints a table or --json");
            if (output is not null) throw new UsageException("--out is for a sweep (give --vary or --sweep)");
            var device = DeviceInput.Resolve(document, point, at, out var applied);
            var spectrum = solver.Solve(device);
            var budgets = CoherenceEstimator.Estimate(solver, spectrum, inputs);
            Console.Write(json
                ? JsonValues.Write(CoherenceReport.Json(device.Name, applied, budgets, inputs)) + Environment.NewLine
                : CoherenceReport.Table(device.Name, budgets, inputs));
            return ExitCodes.Ok;
        }

        var setup = SweepSetup.Create(document, point, at, vary, links, sweepName, maxAxes: 2);
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
        string text = json
            ? JsonValues.Write(CoherenceReport.SweepJson(document.Device.Name, axes, kept, inputs, completed)) + Environment.NewLine
            : CoherenceReport.Csv(axes, kept, inputs);
        SweepCommand.Write(text, output, kept.Length);
        return completed ? ExitCodes.Ok : ExitCodes.Cancelled;
    });
}
