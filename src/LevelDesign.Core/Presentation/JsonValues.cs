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

    public static JsonArray Matrix(double[,] m)
    {
        var rows = new JsonArray();
        for (int i = 0; i < m.GetLength(0); i++)
        {
            var row = new JsonArray();
            for (int j = 0; j < m.GetLength(1); j++) row.Add(Number(m[i, j]));
            rows.Add(row);
        }
        return rows;
    }
}
