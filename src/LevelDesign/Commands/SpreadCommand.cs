using LevelDesign.Core.Presentation;
using System.CommandLine;
using System.Diagnostics;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Spread;
using LevelDesign.Core.Spread.Export;
using LevelDesign.Output;

namespace LevelDesign.Commands;

/// <summary>
/// leveldesign spread FILE [--samples N] [--seed S] [--rule NAME=TEXT ...] [--shard I/N] [--out DIR] [--json]
/// [--threads K] [--slurm TASKS]: draws chips with the file's fabrication spread ([spread]), checks the rules
/// ([rules]) on each, and reports the yield with its Wilson interval, each rule's failure fraction and the
/// parameters most related to failure. Ctrl-C keeps the finished samples (exit 130).
/// </summary>
public static class SpreadCommand
{
    public static Command Create()
    {
        var file = CommonOptions.File();
        var samples = new Option<int?>("--samples") { Description = "number of drawn chips (default: [spread] samples, else 200)" };
        var seed = new Option<int?>("--seed") { Description = "seed of the random numbers (default: [spread] seed, else 1); sample i depends only on (seed, i)" };
        var rule = new Option<string[]>("--rule") { Description = "NAME=TEXT: use these rules instead of the file's [rules], e.g. --rule 'detuned=qa.f01 - qb.f01 > 300 MHz at idle'; repeatable", AllowMultipleArgumentsPerToken = false };
        var shard = new Option<string?>("--shard") { Description = "I/N: compute only the I-th of N equal blocks of samples and write DIR/shard-I-of-N.json (needs --out); combine with 'leveldesign merge'" };
        var output = new Option<string?>("--out") { Description = "folder for spread.json (one sample a line), samples.csv and a histogram per rule (PNG and SVG)" };
        var json = CommonOptions.Json();
        var threads = new Option<int?>("--threads") { Description = "samples computed at once (default: $SLURM_CPUS_PER_TASK, else all cores)" };
        var slurm = new Option<int?>("--slurm") { Description = "TASKS: write a Slurm job-array script for this study in --out DIR (TASKS shards and a dependent merge) instead of computing" };
        var allowLarge = CommonOptions.AllowLarge();
        var command = new Command("spread", "fabrication spread: the fraction of drawn chips that pass the file's rules, with a 95% Wilson interval; progress on stderr, Ctrl-C keeps finished samples")
            { file, samples, seed, rule, shard, output, json, threads, slurm, allowLarge };
        command.SetAction(parse => Run(new SpreadArguments
        {
            Path = parse.GetValue(file)!, Samples = parse.GetValue(samples), Seed = parse.GetValue(seed), Rules = parse.GetValue(rule),
            Shard = parse.GetValue(shard), Output = parse.GetValue(output), Json = parse.GetValue(json), Threads = parse.GetValue(threads),
            Slurm = parse.GetValue(slurm), AllowLarge = parse.GetValue(allowLarge),
        }));
        return command;
    }

    public static int Run(SpreadArguments a) => CommandGuard.Run(a.Path, () =>
    {
        if (a.Samples is < 1) throw new UsageException("--samples must be at least 1");
        if (a.Seed is < 0) throw new UsageException("--seed must be 0 or more");
        if (a.Threads is < 1) throw new UsageException("--threads must be at least 1");
        var document = CommandGuard.Load(a.Path, a.AllowLarge);
        var definition = Definition(document, a.Samples, a.Seed, a.Rules);
        if (a.Slurm is int tasks)
        {
            if (a.Output is null) throw new UsageException("--slurm needs --out DIR: the folder for the job scripts, the shards and the merged study");
            if (a.Shard is not null) throw new UsageException("--slurm writes the scripts that run every shard; leave out --shard");
            if (tasks < 1 || tasks > definition.Samples) throw new UsageException($"--slurm {tasks}: give 1 to {definition.Samples} tasks (one shard each)");
            SpreadStudyFiles.Prepare(a.Output);
            SlurmJobScripts.ForStudy(document, definition, a.Output, tasks, a.Threads ?? 2, a);
            return ExitCodes.Ok;
        }
        ShardRange range = ShardRange.Whole(definition.Samples);
        if (a.Shard is not null)
        {
            range = ShardRange.Parse(a.Shard, definition.Samples, out string? error) ?? throw new UsageException($"--shard {error}");
            if (a.Output is null) throw new UsageException("--shard needs --out DIR: each shard writes DIR/shard-I-of-N.json for 'leveldesign merge'");
        }
        if (a.Output is not null) SpreadStudyFiles.Prepare(a.Output);

        var nominal = Nominal(document, definition);
        var header = SpreadStudyFiles.Header(document, definition, nominal);
        int parallelism = a.Threads ?? EnvironmentThreads() ?? Environment.ProcessorCount;
        var started = DateTimeOffset.UtcNow;
        var clock = Stopwatch.StartNew();
        var progress = new ProgressBar((int)range.Size);
        var run = SweepExecution.WithCancel(token => SpreadRunner.RunAsync(document, definition, range, parallelism, progress, token), progress.Finish);
        double elapsed = clock.Elapsed.TotalSeconds;
        if (!run.Completed) Console.Error.WriteLine($"cancelled: keeping the {run.Outcomes.Count} of {range.Size} samples finished");
        Console.Error.WriteLine(FormattableString.Invariant($"{run.Outcomes.Count} samples in {elapsed:0.0} s on {parallelism} thread(s): {run.Outcomes.Count / Math.Max(elapsed, 1e-9):0.00} samples/s"));
        if (a.Shard is not null)
        {
            SpreadStudyFiles.WriteShard(a.Output!, header, run, elapsed, started);
            return run.Completed ? ExitCodes.Ok : ExitCodes.Cancelled;
        }
        if (a.Output is not null) SpreadStudyFiles.WriteStudy(a.Output, header, definition, run.Outcomes, run.Completed, elapsed, started, document.Device.Name);
        Print(document.Device.Name, definition, run.Outcomes, nominal, run.Completed, a.Json);
        return run.Completed ? ExitCodes.Ok : ExitCodes.Cancelled;
    });

    public static void Print(string deviceName, SpreadDefinition definition, IReadOnlyList<SampleOutcome> outcomes, IReadOnlyList<double> nominal, bool completed, bool json)
    {
        var summary = SpreadSummary.Of(definition, outcomes);
        if (json)
        {
            var o = SpreadSummaryJson.Of(summary);
            o["device"] = deviceName;
            o["completed"] = completed;
            o["seed"] = definition.Seed;
            o["limits_of_model"] = Core.Analysis.Conventions.LimitsOfModel;
            Console.Write(JsonValues.Write(o) + Environment.NewLine);
        }
        else Console.Write(SpreadReport.Table(deviceName, definition, summary, nominal, completed));
    }

    /// <summary>The file's study with the command line's samples, seed and rules in place of the file's.</summary>
    public static SpreadDefinition Definition(DeviceDocument document, int? samples, int? seed, string[]? rules)
    {
        var definition = document.Spread ?? throw new UsageException(
            $"{document.Path}: no [spread] table: add [spread.NAME] tables with parameters and sigma, and [rules] (see docs/device-format.md, \"Fabrication spread\")");
        if (definition.Groups.Count == 0) throw new UsageException($"{document.Path}: [spread] draws no parameter: add a [spread.NAME] table");
        if (samples is int n) definition = definition with { Samples = n };
        if (seed is int s) definition = definition with { Seed = (ulong)s };
        if (rules is { Length: > 0 })
        {
            var parsed = new List<SpreadRule>();
            foreach (string text in rules)
            {
                int eq = text.IndexOf('=');
                string name = eq > 0 ? text[..eq].Trim() : "";
                if (!SpreadReader.IsPlainName(name))
                    throw new UsageException($"--rule {text}: write NAME=TEXT with a plain name, e.g. detuned=qa.f01 - qb.f01 > 300 MHz at idle");
                if (parsed.Any(r => r.Name == name)) throw new UsageException($"--rule {text}: the name '{name}' is used twice");
                parsed.Add(SpreadRuleParser.Parse(name, text[(eq + 1)..].Trim(), document, out string? problem) ?? throw new UsageException($"--rule {name}: {problem}"));
            }
            definition = definition with { Rules = parsed };
        }
        if (definition.Rules.Count == 0) throw new UsageException($"{document.Path}: no rules: add a [rules] table or give --rule NAME=TEXT ({SpreadRuleParser.Syntax})");
        return definition;
    }

    /// <summary>The rules' figures on the nominal device; a rule naming an unknown quantity is refused here, at its line.</summary>
    public static double[] Nominal(DeviceDocument document, SpreadDefinition definition)
    {
        var (figures, problems) = new RuleEvaluator(document, definition.Rules).Evaluate(document.Device);
        var bad = definition.Rules.Select((r, i) => (r, problems[i])).Where(x => x.Item2 is not null).ToList();
        if (bad.Count > 0)
            throw new UsageException(string.Join(Environment.NewLine, bad.Select(x =>
                x.r.Line > 0 ? $"{document.Path}:{x.r.Line}:{x.r.Column}: rules.{x.r.Name}: {x.Item2}" : $"--rule {x.r.Name}: {x.Item2}")));
        return figures;
    }

    private static int? EnvironmentThreads() =>
        int.TryParse(Environment.GetEnvironmentVariable("SLURM_CPUS_PER_TASK"), out int n) && n > 0 ? n : null;
}
