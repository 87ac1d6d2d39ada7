using System.Globalization;
using System.Text.Json;
using System.Text.Json.Nodes;
using LevelDesign.Core.Sweeps.Export;

namespace LevelDesign.Core.Spread.Export;

/// <summary>
/// The JSON file of a study or of one shard: a header (indented), then "sample_rows" with one sample a line, so
/// the file is both one JSON document and easy to read line by line. A shard file carries "shard", "first_sample"
/// and "end_sample"; the whole study's file carries "summary" instead. "elapsed_seconds" and "started" are the only
/// timing fields. Numbers are written in the shortest form that reads back to the same double, so a merge rewrites
/// them byte for byte.
/// </summary>
public static class SpreadResultFile
{
    public const string Kind = "leveldesign spread study";

    public static string Write(SpreadStudyHeader header, ShardRange? shard, bool completed, double elapsedSeconds, DateTimeOffset started,
        IReadOnlyList<SampleOutcome> outcomes, JsonObject? summary, string limitsOfModel)
    {
        var o = new JsonObject
        {
            ["kind"] = Kind,
            ["version"] = header.Version,
            ["device"] = header.DeviceName,
            ["device_file"] = header.DevicePath,
            ["device_sha256"] = header.DeviceSha256,
            ["eigensolver"] = header.Eigensolver,
            ["seed"] = header.Seed,
            ["samples"] = header.Samples,
        };
        if (shard is not null)
        {
            o["shard"] = shard.ToString();
            o["first_sample"] = shard.First;
            o["end_sample"] = shard.End;
        }
        o["completed"] = completed;
        o["started"] = started.ToUniversalTime().ToString("yyyy-MM-dd'T'HH:mm:ss'Z'", CultureInfo.InvariantCulture);
        o["elapsed_seconds"] = Math.Round(elapsedSeconds, 3);
        o["rules"] = new JsonArray(header.Rules.Select((r, i) => (JsonNode)new JsonObject
        {
            ["name"] = r.Name, ["text"] = r.Text, ["nominal_figure"] = Number(header.NominalFigures[i]),
        }).ToArray());
        o["parameters"] = new JsonArray(header.Parameters.Select(p => (JsonNode)JsonValue.Create(p)!).ToArray());
        if (summary is not null) o["summary"] = summary;
        o["figures"] = "per rule: the quantity at its point, or its worst value along its sweep (GHz; purities plain); crossing rules: the largest gap (GHz); root rules: the root's bias (NaN written as null: none)";
        o["deviations"] = "per parameter: the drawn deviation in units of its total sigma";
        o["limits_of_model"] = limitsOfModel;
        return JsonRows.Write(o, "sample_rows", outcomes.Select(x => (JsonNode)Row(x)));
    }

    private static JsonObject Row(SampleOutcome s) => new()
    {
        ["sample"] = s.Index,
        ["pass"] = s.Pass,
        ["values"] = Numbers(s.Values),
        ["deviations"] = Numbers(s.Deviations),
        ["figures"] = Numbers(s.Figures),
        ["passed"] = new JsonArray(s.Passed.Select(p => (JsonNode)JsonValue.Create(p)).ToArray()),
        ["error"] = s.Error,
    };

    private static JsonArray Numbers(IEnumerable<double> xs) => JsonRows.Numbers(xs);

    private static JsonNode? Number(double x) => JsonRows.Number(x);

    /// <summary>A file read back: header, shard (null for a whole study), completion, timing and samples.</summary>
    public sealed record Contents(SpreadStudyHeader Header, ShardRange? Shard, bool Completed, double ElapsedSeconds, IReadOnlyList<SampleOutcome> Outcomes);

    /// <summary>Reads a file this class wrote; FormatException with the reason when it is not one.</summary>
    public static Contents Read(string text)
    {
        JsonObject o;
        try { o = JsonNode.Parse(text)?.AsObject() ?? throw new FormatException("empty"); }
        catch (Exception e) when (e is JsonException or InvalidOperationException) { throw new FormatException("not a JSON object: " + e.Message); }
        return Read(o);
    }

    public static Contents Read(JsonObject o)
    {
        if ((string?)o["kind"] != Kind) throw new FormatException($"not a spread study file (its \"kind\" is not \"{Kind}\")");
        try
        {
            var rules = o["rules"]!.AsArray().Select(r => ((string)r!["name"]!, (string)r["text"]!)).ToList();
            var nominal = o["rules"]!.AsArray().Select(r => r!["nominal_figure"] is JsonNode n ? (double)n : double.NaN).ToList();
            var parameters = o["parameters"]!.AsArray().Select(p => (string)p!).ToList();
            var header = new SpreadStudyHeader((string)o["version"]!, (string)o["device_file"]!, (string)o["device"]!, (string)o["device_sha256"]!,
                (string)o["eigensolver"]!, (ulong)o["seed"]!, (int)o["samples"]!, rules, parameters, nominal);
            ShardRange? shard = null;
            if (o["shard"] is JsonNode s)
            {
                shard = ShardRange.Parse((string)s!, header.Samples, out string? error) ?? throw new FormatException("shard: " + error);
                if (shard.First != (long)o["first_sample"]! || shard.End != (long)o["end_sample"]!) throw new FormatException("first_sample/end_sample do not match the shard");
            }
            var outcomes = o["sample_rows"]!.AsArray().Select(r => new SampleOutcome(
                (long)r!["sample"]!, Doubles(r["values"]!), Doubles(r["deviations"]!), Doubles(r["figures"]!),
                r["passed"]!.AsArray().Select(p => (bool)p!).ToArray(), (string?)r["error"])).ToList();
            return new Contents(header, shard, (bool)o["completed"]!, (double)o["elapsed_seconds"]!, outcomes);
        }
        catch (Exception e) when (e is NullReferenceException or InvalidOperationException or FormatException or JsonException)
        {
            throw new FormatException("a field is missing or of the wrong type: " + e.Message);
        }
    }

    private static double[] Doubles(JsonNode array) => JsonRows.Doubles(array);
}
