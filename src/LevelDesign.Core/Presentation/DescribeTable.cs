using System.Globalization;
using System.Text;
using System.Text.Json;
using System.Text.Json.Nodes;

namespace LevelDesign.Core.Presentation;

/// <summary>
/// The resolved model of <see cref="DescribeFormatter"/> as aligned text tables for a terminal. It reads the JSON
/// object rather than the model so both forms always say the same; what does not fit a cell (matrices of a level
/// list) is named and left to --json.
/// </summary>
public static class DescribeTable
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    public static string Format(JsonObject model)
    {
        var b = new StringBuilder();
        var units = model["units"] as JsonObject;
        b.AppendLine($"device {Text(model["device"])}: energies in {Text(units?["energy"])}, flux in {Text(units?["flux"])}, offset charge in {Text(units?["ng"])}");
        if (model["at"] is JsonObject { Count: > 0 } at)
            b.AppendLine("at " + string.Join(", ", at.Select(p => $"{p.Key}={Text(p.Value)}")));
        b.AppendLine();

        b.AppendLine("Elements (bare levels in GHz above each element's ground)");
        var elements = Rows(model["elements"], e =>
        [
            Text(e["id"]), Text(e["kind"]),
            e["basis"] is JsonObject basis ? $"{Text(basis["kind"])} {Text(basis["size"])}" : "",
            Text(e["levels_kept"]),
            e["parameters"] is JsonObject p ? string.Join(" ", p.Select(x => $"{x.Key}={Text(x.Value)}")) : "",
            Text(e["bare_energies_ghz"]),
        ]);
        Append(b, ["id", "kind", "basis", "levels", "parameters", "bare levels"], elements);
        b.AppendLine();

        b.AppendLine("Couplers (each adds coefficient × op_a ⊗ op_b to H)");
        var couplers = Rows(model["couplers"], c =>
        [
            Text(c["id"]), Text(c["kind"]), Pair(c["elements"], "–"), Pair(c["operators"], " ⊗ "), Text(c["form"]),
            Text(c["coefficient_ghz"]),
            c["given_as"] is JsonObject g ? string.Join(" ", g.Select(x => $"{x.Key}={Text(x.Value)}")) : "",
            c["adds_conjugate"] is JsonValue v && v.TryGetValue(out bool conj) ? (conj ? "yes" : "no") : "",
        ]);
        Append(b, ["id", "kind", "elements", "operators", "form", "coefficient GHz", "given as", "+ h.c."], couplers);
        b.AppendLine();

        if (model["truncation"] is JsonObject t)
        {
            string levels = t["levels"] is JsonObject l ? string.Join(" ", l.Select(x => $"{x.Key}={Text(x.Value)}")) : "";
            b.AppendLine($"Truncation: levels {levels}; at most {Text(t["max_excitations"])} excitations; "
                         + $"bare energy cap {(t["max_bare_energy_ghz"] is null ? "none" : Text(t["max_bare_energy_ghz"]) + " GHz")}; "
                         + $"composite dimension {Text(t["composite_dimension"])}");
        }
        // fields this table has no place for are still shown, so the table never hides part of the model
        var known = new HashSet<string> { "device", "at", "units", "elements", "couplers", "truncation", "hamiltonian" };
        foreach (var (key, value) in model.Where(p => !known.Contains(p.Key)))
            b.AppendLine($"{key}: {Text(value)}");
        if (model["hamiltonian"] is JsonNode h) b.AppendLine(Text(h));
        b.AppendLine("(--json gives the same model as data, with the full matrices of level-list elements)");
        return b.ToString();
    }

    private static List<string[]> Rows(JsonNode? array, Func<JsonObject, string[]> row) =>
        array is JsonArray a ? a.OfType<JsonObject>().Select(row).ToList() : [];

    private static string Pair(JsonNode? node, string separator) =>
        node is JsonArray a ? string.Join(separator, a.Select(Text)) : Text(node);

    /// <summary>A cell: numbers to 6 significant digits, lists of numbers inline, matrices by their shape.</summary>
    private static string Text(JsonNode? node) => node switch
    {
        null => "—",
        // the model holds ints and doubles; read either through its JSON text
        JsonValue v when v.GetValueKind() == JsonValueKind.Number => double.Parse(v.ToJsonString(), NumberStyles.Float, Inv).ToString("G6", Inv),
        JsonValue v when v.GetValueKind() == JsonValueKind.String => v.GetValue<string>(),
        JsonArray { Count: > 0 } a when a[0] is JsonArray row => $"{a.Count}×{row.Count} matrix (--json)",
        JsonArray a => "[" + string.Join(", ", a.Select(Text)) + "]",
        JsonObject o => "{" + string.Join(", ", o.Select(p => $"{p.Key}: {Text(p.Value)}")) + "}",
        _ => node.ToJsonString(),
    };

    private static void Append(StringBuilder b, string[] header, List<string[]> rows)
    {
        if (rows.Count == 0) { b.AppendLine("  (none)"); return; }
        var width = header.Select((h, i) => Math.Max(h.Length, rows.Max(r => r[i].Length))).ToArray();
        string Line(string[] cells) => "  " + string.Join("  ", cells.Select((c, i) => i == cells.Length - 1 ? c : c.PadRight(width[i]))).TrimEnd();
        b.AppendLine(Line(header));
        foreach (var r in rows) b.AppendLine(Line(r));
    }
}
