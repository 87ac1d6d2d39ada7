using LevelDesign.Core.Presentation;
using System.Text.Json.Nodes;
using LevelDesign.Core.Composite;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Eigen;
using LevelDesign.Core.Files;
using LevelDesign.Core.Spread;
using LevelDesign.Core.Sweeps;
using LevelDesign.Core.Sweeps.Export;

namespace LevelDesign.Commands;

/// <summary>
/// `sweep --shard I/N` and the merge of its shard files. A sweep runs in fixed blocks (<see cref="SweepBlocks"/>),
/// so a shard computes its points exactly as the single run does. In a 1-D sweep labels are carried into a shard from
/// its lead-in point, labelled afresh there, and the merge checks that those labels are the ones the previous shard
/// carried to the same point (otherwise the split fell inside a crossing and is refused). A grid is split by rows of
/// its outer axis; a shard also computes the first point of every earlier row, which is where its labels come from. The merged output is the unsharded
/// `sweep` output (JSON or CSV, as the shards were asked for), byte for byte.
/// </summary>
public static class SweepShards
{
    public static string FileName(ShardRange shard) => $"sweep-shard-{shard.Shard}-of-{shard.Count}.json";

    /// <summary>The arguments that shape a sweep's output, recorded so the merge can rebuild its setup and compare shards.</summary>
    public static JsonObject Arguments(SweepArguments a) => new()
    {
        ["vary"] = Texts(a.Vary), ["link"] = Texts(a.Links), ["sweep"] = a.SweepName, ["at"] = Texts(a.At), ["point"] = a.Point,
        ["levels"] = a.Levels, ["labels"] = a.Labels, ["purity"] = a.Purity, ["states"] = a.States, ["allow_large"] = a.AllowLarge,
        ["format"] = a.Csv ? "csv" : "json",
    };

    /// <summary>The same arguments as options for the command line of a shard task.</summary>
    public static IReadOnlyList<string> CommandLine(SweepArguments options)
    {
        var a = new List<string>();
        foreach (string v in options.Vary ?? []) a.AddRange(["--vary", v]);
        foreach (string l in options.Links ?? []) a.AddRange(["--link", l]);
        if (options.SweepName is not null) a.AddRange(["--sweep", options.SweepName]);
        foreach (string x in options.At ?? []) a.AddRange(["--at", x]);
        if (options.Point is not null) a.AddRange(["--point", options.Point]);
        if (options.Levels is int n) a.AddRange(["--levels", n.ToString(System.Globalization.CultureInfo.InvariantCulture)]);
        if (options.Labels is not null) a.AddRange(["--labels", options.Labels]);
        if (options.Purity is double p) a.AddRange(["--purity", p.ToString("R", System.Globalization.CultureInfo.InvariantCulture)]);
        if (options.States is not null) a.AddRange(["--states", options.States]);
        if (options.AllowLarge) a.Add("--allow-large");
        a.Add(options.Csv ? "--csv" : "--json");
        return a;
    }

    public static int RunShard(ShardRun run)
    {
        var (setup, document, folder) = (run.Setup, run.Setup.Document, run.Arguments.Output!);
        var counts = Counts(setup);
        var shard = ShardRange.Parse(run.Arguments.Shard!, SweepBlocks.ShardUnits(counts), out string? error)
            ?? throw new UsageException($"--shard {error} (this sweep of {SweepBlocks.All(counts)[^1].End} points runs in {SweepBlocks.Describe(counts)})");
        SpreadStudyFiles.Prepare(folder);
        var (compute, first, end, leadIn) = SweepBlocks.ForShard(counts, shard);
        var result = SweepExecution.Run(setup, run.Mode, run.PlanLevels, run.Solver, compute, keepVectors: false);
        var table = SweepTable.From(result, run.Shown, run.PurityThreshold);
        var own = table with { Rows = table.Rows.Where(r => r.Index >= first && r.Index < end).ToArray() };
        string[]? Labels(int index) => result.Points.FirstOrDefault(p => p.Index == index) is { } p ? LabelList(p) : null;
        var id = new SweepShardFile.Identity(SpreadStudyFiles.Version(), document.Path, SpreadStudyFiles.Sha256(document.Text), EigenSolvers.Describe(),
            Arguments(run.Arguments), counts);
        var contents = new SweepShardFile.Contents(id, shard, first, end, result.Completed, leadIn >= 0 ? Labels(leadIn) : null, Labels(end - 1), own);
        string path = Path.Combine(folder, FileName(shard));
        OutputFile.Write(path, () => AtomicFile.Write(path, SweepShardFile.Write(contents)));
        if (!result.Completed) Console.Error.WriteLine($"cancelled: keeping the {own.Rows.Count} of {end - first} points computed; the shard is marked incomplete");
        Console.Error.WriteLine($"wrote points {first}–{end - 1} (shard {shard}) to {path}");
        return result.Completed ? ExitCodes.Ok : ExitCodes.Cancelled;
    }

    /// <summary>The sweep's axis counts, outer first (what fixes its blocks and how it is split).</summary>
    public static int[] Counts(SweepSetup setup) => setup.Axes.Select(a => a.Count).ToArray();

    /// <summary>The label of every dressed state of a point, in state order: equal lists mean labels carried on from it agree.</summary>
    private static string[] LabelList(SweepPoint point) =>
        Enumerable.Range(0, point.Spectrum.Count).Select(k => string.Join(",", point.Spectrum.LabelLevels(k))).ToArray();

    public static int Merge(IReadOnlyList<(string Path, JsonObject Json)> files, string output, string? devicePath)
    {
        var shards = files.Select(f =>
        {
            try { return (f.Path, Contents: SweepShardFile.Read(f.Json)); }
            catch (FormatException e) { throw new UsageException($"{f.Path}: {e.Message}"); }
        }).ToList();
        var (firstPath, first) = shards[0];
        foreach (var (path, c) in shards)
        {
            foreach (var ((field, mine), (_, theirs)) in c.Id.Fields().Zip(first.Id.Fields()))
                if (mine != theirs) throw new UsageException($"{path}: {field} differs from {firstPath}; these shards are not of one sweep");
            if (c.Shard.Count != first.Shard.Count) throw new UsageException($"{path}: shard {c.Shard} is of a split into {c.Shard.Count}, {firstPath} of one into {first.Shard.Count}");
            if (!c.Completed || c.Table.Rows.Count != c.End - c.First) throw new UsageException($"{path}: shard {c.Shard} is incomplete (cancelled); run it again");
        }
        int count = first.Shard.Count;
        var repeated = shards.GroupBy(s => s.Contents.Shard.Shard).Where(g => g.Count() > 1).Select(g => g.Key).ToList();
        if (repeated.Count > 0) throw new UsageException($"shard(s) {string.Join(", ", repeated.Select(i => $"{i}/{count}"))} given more than once");
        var missing = Enumerable.Range(1, count).Where(i => shards.All(s => s.Contents.Shard.Shard != i)).ToList();
        if (missing.Count > 0) throw new UsageException($"shard(s) {string.Join(", ", missing.Select(i => $"{i}/{count}"))} missing: give all {count} shard files");
        var ordered = shards.OrderBy(s => s.Contents.Shard.Shard).Select(s => s.Contents).ToList();
        // a 1-D shard labels its lead-in point afresh; a grid shard's labels are exact (no hand-over to check)
        for (int k = 1; k < ordered.Count && !first.Id.IsGrid; k++)
            if (!(ordered[k].LeadInLabels ?? []).SequenceEqual(ordered[k - 1].LastLabels ?? []))
                throw new UsageException($"the labels at point {ordered[k].First - 1}, where shard {ordered[k].Shard} takes over from shard {ordered[k - 1].Shard}, " +
                                         "differ between the two (the split falls where labels are being handed over at a crossing); use another number of shards");

        var id = first.Id;
        string file = devicePath ?? id.DevicePath;
        var document = CommandGuard.Load(file, allowLarge: true);
        if (SpreadStudyFiles.Sha256(document.Text) != id.DeviceSha256)
            throw new UsageException($"{file}: the device file has changed since the shards were computed (its SHA-256 differs); run the sweep again");
        var a = id.Arguments;
        var recorded = new SweepArguments
        {
            Path = file, Point = (string?)a["point"], At = Texts(a["at"]), Vary = Texts(a["vary"]), Links = Texts(a["link"]), SweepName = (string?)a["sweep"],
        };
        var setup = SweepSetup.Create(document, recorded, maxAxes: 2);
        var plan = new SweepPlan(setup.Axes, CommandGuard.LabelMode((string?)a["labels"]));
        var table = first.Table with { Rows = ordered.SelectMany(c => c.Table.Rows).ToArray() };
        var sweep = new SweepResult(plan, [], true);
        bool csv = (string?)a["format"] == "csv";
        SweepCommand.Write(csv ? SweepFiles.Csv(document, sweep, table) : SweepFiles.Json(document, sweep, table), output, table.Rows.Count);
        return ExitCodes.Ok;
    }

    private static JsonNode? Texts(string[]? xs) => xs is null ? null : new JsonArray(xs.Select(x => (JsonNode)JsonValue.Create(x)!).ToArray());

    private static string[]? Texts(JsonNode? a) => a?.AsArray().Select(x => (string)x!).ToArray();
}
