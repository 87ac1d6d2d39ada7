using System.Text.Json;
using System.Text.Json.Nodes;
using LevelDesign.Core.Spread;

namespace LevelDesign.Core.Sweeps.Export;

/// <summary>
/// One shard of a sweep (`sweep --shard I/N`): what identifies the sweep (program version, device text hash,
/// eigensolver, the arguments that shape it, output format), the shard, the table's columns (named from point 0),
/// the rows of the points it owns (one a line), and the labels at its two edges — of its lead-in point (labelled
/// afresh here) and of its last point (carried) — which the merge compares between neighbouring shards of a 1-D
/// sweep: equal edge labels mean every label carried into the next shard is the one a single run would carry. A grid
/// shard computes the labels of its rows exactly (<see cref="SweepBlocks.ForShard(IReadOnlyList{int}, ShardRange)"/>)
/// and has no lead-in.
/// </summary>
public static class SweepShardFile
{
    public const string Kind = "leveldesign sweep shard";

    public sealed record Identity(string Version, string DevicePath, string DeviceSha256, string Eigensolver, JsonObject Arguments, IReadOnlyList<int> AxisCounts)
    {
        public int Points => AxisCounts.Aggregate(1, (n, c) => n * c);

        public bool IsGrid => AxisCounts.Count == 2;

        public IEnumerable<(string Field, string Value)> Fields()
        {
            yield return ("version", Version);
            yield return ("device_sha256", DeviceSha256);
            yield return ("eigensolver", Eigensolver);
            yield return ("arguments", Arguments.ToJsonString());
            yield return ("axis_counts", string.Join(" × ", AxisCounts.Select(c => c.ToString(System.Globalization.CultureInfo.InvariantCulture))));
        }
    }

    public sealed record Contents(Identity Id, ShardRange Shard, int First, int End, bool Completed, string[]? LeadInLabels, string[]? LastLabels, SweepTable Table);

    public static string Write(Contents c)
    {
        var t = c.Table;
        var o = new JsonObject
        {
            ["kind"] = Kind,
            ["version"] = c.Id.Version,
            ["device_file"] = c.Id.DevicePath,
            ["device_sha256"] = c.Id.DeviceSha256,
            ["eigensolver"] = c.Id.Eigensolver,
            ["arguments"] = c.Id.Arguments.DeepClone(),
            ["points"] = c.Id.Points,
            ["axis_counts"] = new JsonArray(c.Id.AxisCounts.Select(n => (JsonNode)n).ToArray()),
            ["split"] = SweepBlocks.Describe(c.Id.AxisCounts),
            ["shard"] = c.Shard.ToString(),
            ["first_point"] = c.First,
            ["end_point"] = c.End,
            ["completed"] = c.Completed,
            ["lead_in_labels"] = Strings(c.LeadInLabels),
            ["last_labels"] = Strings(c.LastLabels),
            ["axis_paths"] = Strings(t.AxisPaths),
            ["element_order"] = Strings(t.ElementOrder),
            ["labels"] = Strings(t.Labels),
            ["quantity_names"] = Strings(t.QuantityNames),
            ["purity_threshold"] = t.PurityThreshold,
        };
        return JsonRows.Write(o, "rows", t.Rows.Select(r => (JsonNode)new JsonObject
        {
            ["point"] = r.Index,
            ["axis_values"] = JsonRows.Numbers(r.AxisValues),
            ["energies"] = JsonRows.Numbers(r.Energies),
            ["purities"] = JsonRows.Numbers(r.Purities),
            ["quantities"] = JsonRows.Numbers(r.Quantities),
            ["quantity_purities"] = JsonRows.Numbers(r.QuantityPurities),
            ["ambiguous"] = r.Ambiguous,
            ["low_purity"] = r.LowPurity,
        }));
    }

    /// <summary>Whether a text is a sweep shard (so `merge` can tell it from a spread shard).</summary>
    public static bool Is(JsonObject o) => (string?)o["kind"] == Kind;

    public static Contents Read(JsonObject o)
    {
        try
        {
            var counts = o["axis_counts"]!.AsArray().Select(n => (int)n!).ToArray();
            if (counts.Length is < 1 or > 2 || counts.Any(n => n < 1) || counts.Aggregate(1L, (n, c) => n * c) > SweepGrid.MaxPoints)
                throw new FormatException("axis_counts: one or two counts of at least 1 expected");
            var id = new Identity((string)o["version"]!, (string)o["device_file"]!, (string)o["device_sha256"]!, (string)o["eigensolver"]!,
                o["arguments"]!.AsObject().DeepClone().AsObject(), counts);
            var shard = ShardRange.Parse((string)o["shard"]!, SweepBlocks.ShardUnits(counts), out string? error) ?? throw new FormatException("shard: " + error);
            var rows = o["rows"]!.AsArray().Select(r => new SweepTableRow((int)r!["point"]!, JsonRows.Doubles(r["axis_values"]!), JsonRows.Doubles(r["energies"]!),
                JsonRows.Doubles(r["purities"]!), JsonRows.Doubles(r["quantities"]!), (bool)r["ambiguous"]!, (bool)r["low_purity"]!)
                { QuantityPurities = JsonRows.Doubles(r["quantity_purities"]!) }).ToArray();
            var table = new SweepTable(Texts(o["axis_paths"])!, Texts(o["element_order"])!, States(o["labels"]), Texts(o["quantity_names"])!,
                (double)o["purity_threshold"]!, rows);
            return new Contents(id, shard, (int)o["first_point"]!, (int)o["end_point"]!, (bool)o["completed"]!, Texts(o["lead_in_labels"]), Texts(o["last_labels"]), table);
        }
        catch (Exception e) when (e is NullReferenceException or InvalidOperationException or JsonException)
        {
            throw new FormatException("a field is missing or of the wrong type: " + e.Message);
        }
    }

    private static JsonNode? Strings(IEnumerable<string>? xs) => xs is null ? null : new JsonArray(xs.Select(x => (JsonNode)JsonValue.Create(x)!).ToArray());

    /// <summary>Tracked states written as level tuples ("|0,1,0⟩") back to levels.</summary>
    private static IReadOnlyList<IReadOnlyList<int>> States(JsonNode? a) =>
        Texts(a)!.Select(t => (IReadOnlyList<int>)t.Trim('|', '⟩').Split(',').Select(int.Parse).ToArray()).ToArray();

    private static string[]? Texts(JsonNode? a) => a?.AsArray().Select(x => (string)x!).ToArray();
}
