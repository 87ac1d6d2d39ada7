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
        command.SetAction(parse => Run(parse.GetValue(file)!, parse.GetValue(vary), parse.GetValue(link), parse.GetValue(sweep), parse.GetValue(at),
            parse.GetValue(point), parse.GetValue(levels), parse.GetValue(labels), parse.GetValue(purity), parse.GetValue(json), parse.GetValue(csv),
            parse.GetValue(output), parse.GetValue(allowLarge), parse.GetValue(states), parse.GetValue(shard), parse.GetValue(slurm)));
        return command;
    }

    public static int Run(string path, string[]? vary, string[]? links, string? sweepName, string[]? at, string? point, int? levels,
        string? labels, double? purity, bool json, bool csv, string? output, bool allowLarge, string? states = null, string? shard = null, int? slurm = null) => CommandGuard.Run(path, () =>
    {
        var selection = StateSelection.Auto;
        if (states is not null && !StateSelection.TryParse(states, out selection, out string stateError)) throw new UsageException($"--states {stateError}");
        CommandGuard.OneFormat(json, csv);
        var mode = CommandGuard.LabelMode(labels);
        if (purity is double p && !(p > 0 && p <= 1)) throw new UsageException($"--purity {p}: give a purity in (0, 1], e.g. 0.9");
        if (slurm is not null && shard is not null) throw new UsageException("--slurm writes the scripts that run every shard; leave out --shard");
        if (shard is null && slurm is null) OutputFile.Check(output, path);
        else if (output is null) throw new UsageException($"{(shard is null ? "--slurm" : "--shard")} needs --out DIR: the folder for the shard files (sweep-shard-I-of-N.json) and the merged sweep");
        var document = CommandGuard.Load(path, allowLarge);
        if (selection.UnknownElement(document.Device) is string unknown) throw new UsageException(unknown);
        double threshold = CommonOptions.PurityThreshold(purity, document);
        var setup = SweepSetup.Create(document, point, at, vary, links, sweepName, maxAxes: 2);
        if (slurm is int tasks)
        {
            var counts = SweepShards.Counts(setup);
            int units = SweepBlocks.ShardUnits(counts);
            if (tasks < 1 || tasks > units) throw new UsageException($"--slurm {tasks}: give 1 to {units} tasks (this sweep runs in {SweepBlocks.Describe(counts)})");
            SpreadStudyFiles.Prepare(output!);
            SlurmJobScripts.ForSweep(document, output!, tasks, 2, counts,
                SweepShards.CommandLine(vary, links, sweepName, at, point, levels, labels, purity, states, allowLarge, csv), csv);
            return ExitCodes.Ok;
        }
        var solver = new DeviceSolver { Selection = selection };
        var (planLevels, shown) = SweepExecution.Levels(setup, levels, solver);
        if (shard is not null)
        {
            var arguments = SweepShards.Arguments(vary, links, sweepName, at, point, levels, labels, purity, states, allowLarge, csv);
            return SweepShards.RunShard(document, setup, mode, planLevels, shown, threshold, solver, shard, arguments, output!);
        }
        // a sweep runs in fixed blocks (a grid: each row as a 1-D sweep), so its numbers do not depend on the cores or
        // on a split into shards
        var blocks = SweepBlocks.All(SweepShards.Counts(setup));
        // a point that fails (e.g. a device invalid at the end of the range) stops the sweep; the points before it are written
        var result = SweepExecution.Run(setup, mode, planLevels, solver, blocks, keepPointsOnFailure: true);
        if (result.Failure is { } failure && result.Points.Count == 0) throw failure.Error;
        var table = SweepTable.From(result, shown, threshold);
        int total = SweepGrid.PointCount(result.Plan);
        if (result.Failure is { } failed)
            Console.Error.WriteLine($"error: the point at {SweepFiles.FailedAt(document, result, failed)} failed: {TerminalText.Clean(failed.Error.Message)}; keeping the {result.Points.Count} of {total} points computed before the sweep stopped");
        else if (!result.Completed) Console.Error.WriteLine($"cancelled: keeping the {result.Points.Count} of {total} points computed");
        Write(json ? SweepFiles.Json(document, result, table) : SweepFiles.Csv(document, result, table), output, result.Points.Count);
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
