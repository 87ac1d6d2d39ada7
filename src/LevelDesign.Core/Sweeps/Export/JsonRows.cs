using System.Text;
using System.Text.Encodings.Web;
using System.Text.Json;
using System.Text.Json.Nodes;

namespace LevelDesign.Core.Sweeps.Export;

/// <summary>
/// A JSON document whose header is indented and whose last field is an array written one element a line, so a
/// long table stays one JSON document and is still easy to read line by line (study and shard files).
/// </summary>
public static class JsonRows
{
    private static readonly JsonSerializerOptions Indented = new() { WriteIndented = true, Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping };
    private static readonly JsonSerializerOptions Compact = new() { WriteIndented = false, Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping };

    public static string Write(JsonObject header, string arrayName, IEnumerable<JsonNode> rows)
    {
        header[arrayName] = new JsonArray();
        string head = header.ToJsonString(Indented);
        header.Remove(arrayName);
        // the empty array closes the text as "[]\n}"; the rows go in its place
        int open = head.LastIndexOf("[]", StringComparison.Ordinal);
        var b = new StringBuilder(head[..open]).Append('[');
        bool any = false;
        foreach (var row in rows)
        {
            b.Append(any ? ",\n    " : "\n    ").Append(row.ToJsonString(Compact));
            any = true;
        }
        return b.Append(any ? "\n  ]" : "]").Append(head[(open + 2)..]).Append('\n').ToString();
    }

    public static JsonNode? Number(double x) => double.IsFinite(x) ? JsonValue.Create(x) : null;

    public static JsonArray Numbers(IEnumerable<double> xs) => new(xs.Select(Number).ToArray());

    public static double[] Doubles(JsonNode array) => array.AsArray().Select(x => x is null ? double.NaN : (double)x).ToArray();
}
