using System.Globalization;
using System.Text;
using LevelDesign.Core.Composite;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Files;
using LevelDesign.Core.Spread;

namespace LevelDesign.Commands;

/// <summary>
/// Writes a ready Slurm job array for a spread study into its output folder: spread-array.sbatch (one task a
/// shard, `--array=0-(N−1)`), spread-merge.sbatch (the merge), and submit.sh, which submits the array and then the
/// merge with `--dependency=afterok` on it. Paths are absolute so the jobs run from any folder; per-task memory is
/// estimated from the device (see <see cref="MemoryMegabytes"/>). See docs/cluster.md.
/// </summary>
public static class SlurmJobScripts
{
    public const string ArrayScript = "spread-array.sbatch";
    public const string MergeScript = "spread-merge.sbatch";
    public const string SubmitScript = "submit.sh";

    public static void Write(DeviceDocument document, SpreadDefinition definition, string folder, int tasks, int cpus,
        int? samples, int? seed, string[]? rules, bool allowLarge)
    {
        string out_ = Path.GetFullPath(folder), device = Path.GetFullPath(document.Path), logs = Path.Combine(out_, "logs");
        Directory.CreateDirectory(logs);
        string program = Program();
        string name = "spread-" + new string(document.Device.Name.Select(c => char.IsAsciiLetterOrDigit(c) || c is '_' or '-' ? c : '_').ToArray());
        var extra = new StringBuilder();
        if (samples is int n) extra.Append(CultureInfo.InvariantCulture, $" --samples {n}");
        if (seed is int s) extra.Append(CultureInfo.InvariantCulture, $" --seed {s}");
        foreach (string r in rules ?? []) extra.Append(" --rule ").Append(Quote(r));
        if (allowLarge) extra.Append(" --allow-large");
        long memory = MemoryMegabytes(document, definition, cpus);
        long perTask = (definition.Samples + tasks - 1) / tasks;

        var array = new StringBuilder()
            .AppendLine("#!/bin/bash")
            .AppendLine($"# Spread study of {document.Device.Name}: {definition.Samples} samples in {tasks} shards of about {perTask}, written by 'leveldesign spread --slurm'.")
            .AppendLine("# Submit with submit.sh (it also queues the merge); see docs/cluster.md.")
            .AppendLine($"#SBATCH --job-name={name}")
            .AppendLine($"#SBATCH --array=0-{tasks - 1}")
            .AppendLine(CultureInfo.InvariantCulture, $"#SBATCH --cpus-per-task={cpus}")
            .AppendLine(CultureInfo.InvariantCulture, $"#SBATCH --mem={memory}M")
            .AppendLine($"#SBATCH --output={logs}/shard-%a.out")
            .AppendLine($"#SBATCH --error={logs}/shard-%a.err")
            .AppendLine("set -euo pipefail")
            .AppendLine("shard=$((SLURM_ARRAY_TASK_ID + 1))")
            .AppendLine($"exec {program} spread {Quote(device)}{extra} --shard \"$shard/{tasks}\" --out {Quote(out_)} --threads \"${{SLURM_CPUS_PER_TASK:-{cpus}}}\" </dev/null");
        var shardFiles = string.Join(" ", Enumerable.Range(1, tasks).Select(i => Quote(Path.Combine(out_, $"shard-{i}-of-{tasks}.json"))));
        var merge = new StringBuilder()
            .AppendLine("#!/bin/bash")
            .AppendLine("# Merges the shards into the study's files (spread.json, samples.csv, histograms); queued by submit.sh after the array.")
            .AppendLine($"#SBATCH --job-name={name}-merge")
            .AppendLine("#SBATCH --cpus-per-task=1")
            .AppendLine(CultureInfo.InvariantCulture, $"#SBATCH --mem={Math.Max(512, MergeMegabytes(definition))}M")
            .AppendLine($"#SBATCH --output={logs}/merge.out")
            .AppendLine($"#SBATCH --error={logs}/merge.err")
            .AppendLine("set -euo pipefail")
            .AppendLine($"{program} merge {shardFiles} --out {Quote(out_)} --device {Quote(device)} > {Quote(Path.Combine(out_, "summary.txt"))} </dev/null");
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
        Console.Error.WriteLine($"wrote {ArrayScript}, {MergeScript} and {SubmitScript} to {out_}: {tasks} tasks × {cpus} CPUs, {memory} MB each; run: bash {Path.Combine(out_, SubmitScript)}");
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
            return Quote(process) + " " + Quote(typeof(SlurmJobScripts).Assembly.Location);
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
