using System.CommandLine;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Spread;
using System.Text.Json.Nodes;
using LevelDesign.Core.Spread.Export;
using LevelDesign.Core.Sweeps.Export;

namespace LevelDesign.Commands;

/// <summary>
/// leveldesign merge SHARD... --out DIR [--device FILE] [--json]: combines the shard files of a spread study
/// (`spread --shard I/N`) into the files one unsharded run writes, or those of a sweep or grid (`sweep --shard I/N`,
/// see <see cref="SweepShards.Merge"/>) into its output file. Refused, with the reason, when the shards come
/// from different devices, seeds, rules, eigensolvers or program versions, when one is missing, repeated or was
/// cancelled, or when the device file changed since.
/// </summary>
public static class MergeCommand
{
    public static Command Create()
    {
        var shards = new Argument<string[]>("SHARD") { Description = "shard files (DIR/shard-I-of-N.json of `spread`, DIR/sweep-shard-I-of-N.json of `sweep`), all N of them", Arity = ArgumentArity.OneOrMore };
        var output = new Option<string?>("--out") { Description = "spread shards: the folder for the study's files (as `spread --out` writes them); sweep shards: the output file", Required = true };
        var device = new Option<string?>("--device") { Description = "the device file, when it has moved since the shards were computed (default: the path recorded in the shards)" };
        var json = CommonOptions.Json();
        var command = new Command("merge", "combine the shard files of a spread study or a sweep into the result of one unsharded run") { shards, output, device, json };
        command.SetAction(parse => Run(parse.GetValue(shards)!, parse.GetValue(output)!, parse.GetValue(device), parse.GetValue(json)));
        return command;
    }

    public static int Run(string[] shardPaths, string output, string? devicePath, bool json) => CommandGuard.Run(devicePath ?? shardPaths.FirstOrDefault() ?? "", () =>
    {
        var files = shardPaths.Select(p => (Path: p, Json: ReadJson(p))).ToList();
        int sweeps = files.Count(f => SweepShardFile.Is(f.Json));
        if (sweeps > 0 && sweeps < files.Count) throw new UsageException("these files mix sweep shards and spread-study shards; merge one kind at a time");
        if (sweeps > 0) return SweepShards.Merge(files, output, devicePath);
        var shards = files.Select(f => Parse(f.Path, f.Json)).ToList();
        var first = shards[0];
        foreach (var (path, contents) in shardPaths.Zip(shards))
        {
            if (contents.Shard is null) throw new UsageException($"{path}: this is a whole study, not a shard; merge takes the shard-I-of-N.json files");
            foreach (var ((field, mine), (_, theirs)) in contents.Header.Identity().Zip(first.Header.Identity()))
                if (mine != theirs) throw new UsageException($"{path}: {field} differs from {shardPaths[0]} ({Short(mine)} against {Short(theirs)}); these shards are not of one study");
            if (contents.Shard.Count != first.Shard!.Count) throw new UsageException($"{path}: shard {contents.Shard} is of a split into {contents.Shard.Count}, {shardPaths[0]} of one into {first.Shard.Count}");
            if (!contents.Completed) throw new UsageException($"{path}: shard {contents.Shard} was cancelled ({contents.Outcomes.Count} of {contents.Shard.Size} samples); run it again");
            if (contents.Outcomes.Count != contents.Shard.Size || contents.Outcomes.Select((o, i) => o.Index != contents.Shard.First + i).Any(x => x))
                throw new UsageException($"{path}: shard {contents.Shard} should hold samples {contents.Shard.First}–{contents.Shard.End - 1} in order");
        }
        int count = first.Shard!.Count;
        var missing = Enumerable.Range(1, count).Where(i => shards.All(s => s.Shard!.Shard != i)).ToList();
        var repeated = shards.GroupBy(s => s.Shard!.Shard).Where(g => g.Count() > 1).Select(g => g.Key).ToList();
        if (repeated.Count > 0) throw new UsageException($"shard(s) {string.Join(", ", repeated.Select(i => $"{i}/{count}"))} given more than once");
        if (missing.Count > 0) throw new UsageException($"shard(s) {string.Join(", ", missing.Select(i => $"{i}/{count}"))} missing: give all {count} shard files");

        var header = first.Header;
        string file = devicePath ?? header.DevicePath;
        var document = CommandGuard.Load(file, allowLarge: true);
        if (SpreadStudyFiles.Sha256(document.Text) != header.DeviceSha256)
            throw new UsageException($"{file}: the device file has changed since the shards were computed (its SHA-256 differs); run the study again");
        var definition = SpreadCommand.Definition(document, header.Samples, (int)header.Seed, header.Rules.Select(r => $"{r.Name}={r.Text}").ToArray());
        var outcomes = shards.OrderBy(s => s.Shard!.Shard).SelectMany(s => s.Outcomes).ToList();
        // the header as the unsharded run writes it: the recorded path, not --device
        SpreadStudyFiles.Prepare(output);
        SpreadStudyFiles.WriteStudy(output, header, definition, outcomes, true, shards.Sum(s => s.ElapsedSeconds), DateTimeOffset.UtcNow, header.DeviceName);
        SpreadCommand.Print(header.DeviceName, definition, outcomes, header.NominalFigures, true, json);
        return ExitCodes.Ok;
    });

    private static JsonObject ReadJson(string path)
    {
        try
        {
            var info = new FileInfo(path);
            if (!info.Exists) throw new UsageException($"{path}: no such file");
            if (info.Length > 1L << 30) throw new UsageException($"{path}: larger than 1 GiB; not a shard file of this program");
            return JsonNode.Parse(File.ReadAllText(path)) as JsonObject ?? throw new UsageException($"{path}: not a JSON object; not a shard file of this program");
        }
        catch (System.Text.Json.JsonException e) { throw new UsageException($"{path}: not JSON ({e.Message}); not a shard file of this program"); }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException) { throw new UsageException($"{path}: {e.Message}"); }
    }

    private static SpreadResultFile.Contents Parse(string path, JsonObject json)
    {
        try { return SpreadResultFile.Read(json); }
        catch (FormatException e) { throw new UsageException($"{path}: {e.Message}"); }
    }

    private static string Short(string s) => s.Length > 60 ? s[..57] + "..." : s;
}
