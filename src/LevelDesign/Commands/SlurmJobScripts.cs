using System.Globalization;
using System.Text;
using LevelDesign.Core.Composite;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Files;
using LevelDesign.Core.Spread;

namespace LevelDesign.Commands;

/// <summary>
/// Writes a ready Slurm job array for a spread study into its output folder: shards.sbatch (one task a
/// shard, `--array=0-(N−1)`), merge.sbatch (the merge), and submit.sh, which submits the array and then the
/// merge with `--dependency=afterok` on it. Paths are absolute so the jobs run from any folder; per-task memory is
/// estimated from the device (see <see cref="MemoryMegabytes"/>). See docs/cluster.md.
/// </summary>
public static class SlurmJobScripts
{
    public const string ArrayScript = "shards.sbatch";
    public const string MergeScript = "merge.sbatch";
    public const string SubmitScript = "submit.sh";


    /// <summary>
    /// What a job array runs: <paramref name="command"/> ("spread" or "sweep") on the device with
    /// <paramref name="arguments"/> (already quoted, each with a leading space), one shard a task; the merge writes
    /// <paramref name="mergeOutput"/> (a folder for a study, a file for a sweep) from the shard files named by
    /// <paramref name="shardFile"/>; <paramref name="what"/> describes the work in the scripts' first comment.
    /// </summary>
    public static void Write(DeviceDocument document, string folder, string command, string arguments, int tasks, int cpus, long memoryMegabytes,
        long mergeMegabytes, Func<int, string> shardFile, string mergeOutput, string what)
    {
        string out_ = Path.GetFullPath(folder), device = Path.GetFullPath(document.Path), logs = Path.Combine(out_, "logs");
        Directory.CreateDirectory(logs);
        string program = Program();
        string name = command + "-" + new string(document.Device.Name.Select(c => char.IsAsciiLetterOrDigit(c) || c is '_' or '-' ? c : '_').ToArray());
        // .NET sizes its thread pool (and the sweep its workers) by the processor count: make it the task's CPUs
        string threads = command == "spread" ? $" --threads \"${{SLURM_CPUS_PER_TASK:-{cpus}}}\"" : "";
        var array = new StringBuilder()
            .AppendLine("#!/bin/bash")
            .AppendLine($"# {what}, in {tasks} shards; written by 'leveldesign {command} --slurm'.")
            .AppendLine("# Submit with submit.sh (it also queues the merge); see docs/cluster.md.")
            .AppendLine($"#SBATCH --job-name={name}")
            .AppendLine($"#SBATCH --array=0-{tasks - 1}")
            .AppendLine(CultureInfo.InvariantCulture, $"#SBATCH --cpus-per-task={cpus}")
            .AppendLine(CultureInfo.InvariantCulture, $"#SBATCH --mem={memoryMegabytes}M")
            .AppendLine($"#SBATCH --output={logs}/shard-%a.out")
            .AppendLine($"#SBATCH --error={logs}/shard-%a.err")
            .AppendLine("set -euo pipefail")
            .AppendLine($"export DOTNET_PROCESSOR_COUNT=\"${{SLURM_CPUS_PER_TASK:-{cpus}}}\"")
            .AppendLine("shard=$((SLURM_ARRAY_TASK_ID + 1))")
            .AppendLine($"exec {program} {command} {Quote(device)}{arguments} --shard \"$shard/{tasks}\" --out {Quote(out_)}{threads} </dev/null");
        var shardFiles = string.Join(" ", Enumerable.Range(1, tasks).Select(i => Quote(Path.Combine(out_, shardFile(i)))));
        var merge = new StringBuilder()
            .AppendLine("#!/bin/bash")
            .AppendLine($"# Merges the shards into {Path.GetFileName(mergeOutput)}; queued by submit.sh to start when every shard has succeeded.")
            .AppendLine($"#SBATCH --job-name={name}-merge")
            .AppendLine("#SBATCH --cpus-per-task=1")
            .AppendLine(CultureInfo.InvariantCulture, $"#SBATCH --mem={Math.Max(512, mergeMegabytes)}M")
            .AppendLine($"#SBATCH --output={logs}/merge.out")
            .AppendLine($"#SBATCH --error={logs}/merge.err")
            .AppendLine("set -euo pipefail")
            .AppendLine("export DOTNET_PROCESSOR_COUNT=1")
            .AppendLine($"{program} merge {shardFiles} --out {Quote(mergeOutput)} --device {Quote(device)} > {Quote(Path.Combine(out_, "summary.txt"))} </dev/null");
        var submit = new StringBuilder()
            .AppendLine("#!/bin/bash")
            .AppendLine("# Queues the shards as a job array and the merge as a job that starts when every shard has succeeded.")
            .AppendLine("set -euo pipefail")
            .AppendLine($"cd {Quote(out_)}")
            .AppendLine($"array=$(sbatch --parsable {ArrayScript})")
            .AppendLine("array=${array%%;*}")
            .AppendLine($"merge=$(sbatch --parsable --dependency=afterok:$array {MergeScript})")
            .AppendLine(CultureInfo.InvariantCulture, $"echo \"array job $array ({tasks} tasks), merge job ${{merge%%;*}}; results in {out_.Replace("\"", "\\\"")}\"");
        Save(Path.Combine(out_, ArrayScript), array.ToString());
        Save(Path.Combine(out_, MergeScript), merge.ToString());
        Save(Path.Combine(out_, SubmitScript), submit.ToString());
        Console.Error.WriteLine($"wrote {ArrayScript}, {MergeScript} and {SubmitScript} to {out_}: {tasks} tasks × {cpus} CPUs, {memoryMegabytes} MB each; run: bash {Path.Combine(out_, SubmitScript)}");
    }

    /// <summary>The scripts of a spread study: each task a block of samples; the merge writes the study's files into the folder.</summary>
    public static void ForStudy(DeviceDocument document, SpreadDefinition definition, string folder, int tasks, int cpus, SpreadArguments options)
    {
        var extra = new StringBuilder();
        if (options.Samples is int n) extra.Append(CultureInfo.InvariantCulture, $" --samples {n}");
        if (options.Seed is int s) extra.Append(CultureInfo.InvariantCulture, $" --seed {s}");
        foreach (string r in options.Rules ?? []) extra.Append(" --rule ").Append(Quote(r));
        if (options.AllowLarge) extra.Append(" --allow-large");
        long perTask = (definition.Samples + tasks - 1) / tasks;
        Write(document, folder, "spread", extra.ToString(), tasks, cpus, MemoryMegabytes(document, definition, cpus), MergeMegabytes(definition),
            i => $"shard-{i}-of-{tasks}.json", Path.GetFullPath(folder),
            $"Spread study of {document.Device.Name}: {definition.Samples} samples, about {perTask} a task");
    }

    /// <summary>
    /// The scripts of a sweep: each task a run of blocks (1-D) or of rows (grid); the merge writes sweep.json (or
    /// sweep.csv) into the folder. Memory: see <see cref="SweepMemoryMegabytes"/>.
    /// </summary>
    public static void ForSweep(DeviceDocument document, string folder, int tasks, int cpus, IReadOnlyList<int> counts, IReadOnlyList<string> arguments, bool csv)
    {
        long points = counts.Aggregate(1L, (n, c) => n * c);
        long merge = 300 + (long)(points * document.CompositeDimension / 20_000);
        string output = Path.Combine(Path.GetFullPath(folder), csv ? "sweep.csv" : "sweep.json");
        Write(document, folder, "sweep", string.Concat(arguments.Select(a => " " + Quote(a))), tasks, cpus, SweepMemoryMegabytes(document, counts, tasks, cpus), merge,
            i => $"sweep-shard-{i}-of-{tasks}.json", output, $"Sweep of {document.Device.Name}: {points} points in {Core.Sweeps.SweepBlocks.Describe(counts)}");
    }

    /// <summary>
    /// Memory of one sweep task: the runtime (~300 MB), one eigen solve per thread and the kept states of the task's
    /// points (dimension × ~50 levels × 24 bytes each; a task's points are its blocks or rows and what it computes
    /// besides: the lead-in block and point 0, or a grid's first point of each earlier row), with 50 % margin; at least 1 GB.
    /// </summary>
    public static long SweepMemoryMegabytes(DeviceDocument document, IReadOnlyList<int> counts, int tasks, int cpus)
    {
        double dimension = document.CompositeDimension;
        double solve = CompositeSizeEstimate.PathBytes(dimension, document.Device.Couplers.Count, DeviceSolver.DefaultIterativeMinimumDimension);
        int units = Core.Sweeps.SweepBlocks.ShardUnits(counts), perTask = (units + tasks - 1) / tasks;
        long taskPoints = counts.Count == 1
            ? (perTask + 1) * (long)Core.Sweeps.SweepBlocks.Size(counts[0]) + 1
            : perTask * (long)counts[1] + counts[0];
        double bytes = 300e6 + cpus * solve + taskPoints * dimension * 50 * 24;
        return Math.Max(1024, (long)Math.Ceiling(1.5 * bytes / (1 << 20) / 100) * 100);
    }

    /// <summary>
    /// Memory of one task: the runtime (~300 MB) plus, per thread, the eigen solve of one point
    /// (<see cref="CompositeSizeEstimate.PathBytes"/>) and the kept states of the longest sweep a rule walks
    /// (points × dimension × ~50 states × 24 bytes), with 50 % margin; at least 1 GB.
    /// </summary>
    public static long MemoryMegabytes(DeviceDocument document, SpreadDefinition definition, int cpus)
    {
        double dimension = document.CompositeDimension;
        double solve = CompositeSizeEstimate.PathBytes(dimension, document.Device.Couplers.Count, DeviceSolver.DefaultIterativeMinimumDimension);
        long points = definition.Rules.Select(r => r.Sweep is string s ? document.Sweeps.First(x => x.Name == s).Axes.Aggregate(1L, (n, a) => n * a.Count)
            : r.Kind == SpreadRuleKind.Root ? r.RootScanPoints : 1).DefaultIfEmpty(1).Max();
        double kept = points * dimension * 50 * 24;
        double bytes = 300e6 + cpus * (solve + kept);
        return Math.Max(1024, (long)Math.Ceiling(1.5 * bytes / (1 << 20) / 100) * 100);
    }

    private static long MergeMegabytes(SpreadDefinition definition) =>
        300 + definition.Samples * (definition.Paths.Count * 2 + definition.Rules.Count * 2) * 40L / (1 << 20) * 4;

    /// <summary>The command that runs this program: the executable, or `dotnet leveldesign.dll` when run through dotnet.</summary>
    private static string Program()
    {
        string process = Environment.ProcessPath ?? "leveldesign";
        if (Path.GetFileNameWithoutExtension(process) == "dotnet")
            // run through dotnet: name the program's own assembly (AppContext, not Assembly.Location, which a single
            // file leaves empty)
            return Quote(process) + " " + Quote(Path.Combine(AppContext.BaseDirectory, typeof(SlurmJobScripts).Assembly.GetName().Name + ".dll"));
        return Quote(process);
    }

    private static string Quote(string s) =>
        s.All(c => char.IsAsciiLetterOrDigit(c) || c is '/' or '.' or '_' or '-' or '+' or ':' or '=' or ',') ? s : "'" + s.Replace("'", "'\\''") + "'";

    private static void Save(string path, string text)
    {
        OutputFile.Write(path, () => AtomicFile.Write(path, text));
        if (OperatingSystem.IsWindows()) return;
        try { File.SetUnixFileMode(path, File.GetUnixFileMode(path) | UnixFileMode.UserExecute); }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or PlatformNotSupportedException) { }
    }
}
