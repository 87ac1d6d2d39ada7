using System.Text.Encodings.Web;
using System.Text.Json;
using System.Text.Json.Nodes;

namespace LevelDesign.Core.Presentation;

/// <summary>JSON helpers: NaN and infinities become null (JSON has no such numbers); readable indented output.</summary>
public static class JsonValues
{
    public static JsonNode? Number(double x) => double.IsFinite(x) ? JsonValue.Create(x) : null;

    public static readonly JsonSerializerOptions Options = new()
    {
        WriteIndented = true,
        Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping,
    };

    public static string Write(JsonNode node) => node.ToJsonString(Options);

    /// <summary>
    /// Appends a node through JsonArray's non-generic Add: the generic Add&lt;T&gt; (which C# picks for a JsonObject or
    /// JsonArray argument) is marked unsafe for trimmed and ahead-of-time compiled builds.
    /// </summary>
    public static void AddNode(this JsonArray array, JsonNode? node) => array.Add(node);

    public static JsonArray Matrix(double[,] m)
    {
        var rows = new JsonArray();
        for (int i = 0; i < m.GetLength(0); i++)
        {
            var row = new JsonArray();
            for (int j = 0; j < m.GetLength(1); j++) row.Add(Number(m[i, j]));
            rows.AddNode(row);
        }
        return rows;
    }
}
