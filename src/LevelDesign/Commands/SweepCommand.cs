using LevelDesign.Core.Presentation;
using System.CommandLine;
using LevelDesign.Core.Composite;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Files;
using LevelDesign.Core.Sweeps;

namespace LevelDesign.Commands;

/// <summary>
/// leveldesign sweep FILE --vary BIAS=START:STOP:COUNT [--vary ...] [--link ...] [--sweep NAME] [--labels ...]
/// [--levels K] [--purity P] [--json|--csv] [--out PATH]: the labelled spectrum and derived quantities at every
/// point, computed in parallel; Ctrl-C keeps the finished points (exit 130).
/// </summary>
public static class SweepCommand
{
    public static Option<string[]> Vary(string description) => new("--vary") { Description = description, AllowMultipleArgumentsPerToken = false };

    public static Option<string[]> Link() => new("--link")
    {
        Description = "move another bias or parameter with an axis: TARGET=SCALE*AXIS+SHIFT (base units; SHIFT in TARGET's unit), e.g. qb_flux=1.0*qa_flux+0.05; repeatable",
        AllowMultipleArgumentsPerToken = false,
    };

    public static Option<string?> Labels() => new("--labels") { Description = "label states by 'character' (follow the bare character through crossings; default) or 'order' (k-th level stays k-th)" };

    public static Option<string?> SweepName() => new("--sweep") { Description = "use a sweep defined in the file ([sweeps.NAME]); default: the first one when no --vary is given" };

    public static Command Create()
    {
        var file = CommonOptions.File();
        var vary = Vary("an axis BIAS=START:STOP:COUNT (bias name or parameter path; values in the bias's unit); give two for a grid");
        var link = Link();
        var sweep = SweepName();
        var at = CommonOptions.At();
        var point = CommonOptions.Point();
        var levels = CommonOptions.Levels(
            "number of labelled dressed states reported at each point (default: all states up to two excitations)");
        var labels = Labels();
        var purity = CommonOptions.Purity("flag points where a tracked state's purity is below this");
        var json = CommonOptions.Json();
        var csv = CommonOptions.Csv();
        var output = new Option<string?>("--out") { Description = "write the result to this file instead of stdout" };
        var allowLarge = CommonOptions.AllowLarge();
        var states = CommonOptions.States();
        var shard = new Option<string?>("--shard") { Description = "I/N: compute only the I-th of N runs of points (blocks of a 1-D sweep, rows of the first axis of a grid) and write DIR/sweep-shard-I-of-N.json (--out names the folder); 'leveldesign merge' joins them into exactly the unsharded output" };
        var slurm = new Option<int?>("--slurm") { Description = "TASKS: write a Slurm job array for this sweep or grid in --out DIR (TASKS shards of 2 CPUs and a dependent merge into DIR/sweep.json or .csv) instead of computing" };
        var command = new Command("sweep", "the labelled spectrum at every point of a bias sweep (parallel); progress on stderr, Ctrl-C keeps finished points")
            { file, vary, link, sweep, at, point, levels, states, labels, purity, json, csv, output, allowLarge, shard, slurm };
        command.SetAction(parse => Run(new SweepArguments
        {
            Path = parse.GetValue(file)!, Vary = parse.GetValue(vary), Links = parse.GetValue(link), SweepName = parse.GetValue(sweep),
            At = parse.GetValue(at), Point = parse.GetValue(point), Levels = parse.GetValue(levels), States = parse.GetValue(states),
            Labels = parse.GetValue(labels), Purity = parse.GetValue(purity), Json = parse.GetValue(json), Csv = parse.GetValue(csv),
            Output = parse.GetValue(output), AllowLarge = parse.GetValue(allowLarge), Shard = parse.GetValue(shard), Slurm = parse.GetValue(slurm),
        }));
        return command;
    }

    public static int Run(SweepArguments a) => CommandGuard.Run(a.Path, () =>
    {
        var selection = StateSelection.Auto;
        if (a.States is not null && !StateSelection.TryParse(a.States, out selection, out string stateError)) throw new UsageException($"--states {stateError}");
        CommandGuard.OneFormat(a.Json, a.Csv);
        var mode = CommandGuard.LabelMode(a.Labels);
        if (a.Purity is double p && !(p > 0 && p <= 1)) throw new UsageException($"--purity {p}: give a purity in (0, 1], e.g. 0.9");
        if (a.Slurm is not null && a.Shard is not null) throw new UsageException("--slurm writes the scripts that run every shard; leave out --shard");
        if (a.Shard is null && a.Slurm is null) OutputFile.Check(a.Output, a.Path);
        else if (a.Output is null) throw new UsageException($"{(a.Shard is null ? "--slurm" : "--shard")} needs --out DIR: the folder for the shard files (sweep-shard-I-of-N.json) and the merged sweep");
        var document = CommandGuard.Load(a.Path, a.AllowLarge);
        if (selection.UnknownElement(document.Device) is string unknown) throw new UsageException(unknown);
        double threshold = CommonOptions.PurityThreshold(a.Purity, document);
        var setup = SweepSetup.Create(document, a, maxAxes: 2);
        if (a.Slurm is int tasks)
        {
            var counts = SweepShards.Counts(setup);
            int units = SweepBlocks.ShardUnits(counts);
            if (tasks < 1 || tasks > units) throw new UsageException($"--slurm {tasks}: give 1 to {units} tasks (this sweep runs in {SweepBlocks.Describe(counts)})");
            SpreadStudyFiles.Prepare(a.Output!);
            SlurmJobScripts.ForSweep(document, a.Output!, tasks, 2, counts, SweepShards.CommandLine(a), a.Csv);
            return ExitCodes.Ok;
        }
        var solver = new DeviceSolver { Selection = selection };
        var (planLevels, shown) = SweepExecution.Levels(setup, a.Levels, solver);
        if (a.Shard is not null)
            return SweepShards.RunShard(new ShardRun
            {
                Arguments = a, Setup = setup, Mode = mode, PlanLevels = planLevels, Shown = shown, PurityThreshold = threshold, Solver = solver,
            });
        // a sweep runs in fixed blocks (a grid: each row as a 1-D sweep), so its numbers do not depend on the cores or
        // on a split into shards
        var blocks = SweepBlocks.All(SweepShards.Counts(setup));
        // a point that fails (e.g. a device invalid at the end of the range) stops the sweep; the points before it are written
        // only the table is written: eigenvectors are dropped once a point is labelled (less memory to touch)
        var result = SweepExecution.Run(setup, mode, planLevels, solver, blocks, keepVectors: false, keepPointsOnFailure: true);
        if (result.Failure is { } failure && result.Points.Count == 0) throw failure.Error;
        var table = SweepTable.From(result, shown, threshold);
        int total = SweepGrid.PointCount(result.Plan);
        if (result.Failure is { } failed)
            Console.Error.WriteLine($"error: the point at {SweepFiles.FailedAt(document, result, failed)} failed: {TerminalText.Clean(failed.Error.Message)}; keeping the {result.Points.Count} of {total} points computed before the sweep stopped");
        else if (!result.Completed) Console.Error.WriteLine($"cancelled: keeping the {result.Points.Count} of {total} points computed");
        Write(a.Json ? SweepFiles.Json(document, result, table) : SweepFiles.Csv(document, result, table), a.Output, result.Points.Count);
        int flagged = table.Rows.Count(r => r.LowPurity), ambiguous = table.Rows.Count(r => r.Ambiguous);
        if (flagged > 0 || ambiguous > 0)
            Console.Error.WriteLine($"{flagged} point(s) with a tracked state below purity {table.PurityThreshold}, {ambiguous} with an ambiguous label (columns low_purity, ambiguous)");
        return result.Completed ? ExitCodes.Ok : result.Failure is not null ? ExitCodes.ComputationFailed : ExitCodes.Cancelled;
    });

    /// <summary>Writes to stdout, or to a file by <see cref="OutputFile"/> (a previous regular file kept as .bak).</summary>
    public static void Write(string text, string? output, int points)
    {
        if (output is null) { Console.Write(text); return; }
        OutputFile.Write(output, () => AtomicFile.Write(output, text));
        Console.Error.WriteLine($"wrote {points} points to {output}");
    }
}
