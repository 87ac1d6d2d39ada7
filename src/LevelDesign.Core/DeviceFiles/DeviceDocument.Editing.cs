using System.Text;
using LevelDesign.Core.DeviceFiles.Source;
using LevelDesign.Core.Files;
using Tomlyn.Parsing;

namespace LevelDesign.Core.DeviceFiles;

/// <summary>
/// Editing values: read a value's text by its field path, change it as typed (only its characters in the file's text
/// change, then the whole text is read again as loading does), and save. Structural edits are in
/// DeviceDocument.Structure.cs.
/// </summary>
public sealed partial class DeviceDocument
{
    /// <summary>The value text of a field as written in the file (without quotes for strings), or null if absent.</summary>
    public string? ValueTextOf(string fieldPath)
    {
        if (Locate(fieldPath) is not var (table, key) || table.Find(key) is not SourceEntry e) return null;
        return e.Value.Kind == SourceValueKind.String ? e.Value.Text : Text.Substring(e.Value.Offset, e.Value.Length);
    }

    /// <summary>
    /// Changes one value by its field path (e.g. "elements.qa.ec", "couplers.g_qa_ra.g", "biases.qa_flux.value")
    /// to the text a user typed ("210 MHz"); on success returns a new document (this one is unchanged).
    /// A key missing from an existing table is added on a new line at the end of that table.
    /// </summary>
    public DeviceDocument WithValue(string fieldPath, string text, out DeviceFileError? error)
    {
        error = null;
        if (Locate(fieldPath) is not var (table, key))
        {
            var tables = _source.Tables.Select(t => t.Name);
            error = new DeviceFileError(Path, 0, 0, fieldPath,
                $"no table in this file holds '{fieldPath}'{EditDistance.Suggestion(fieldPath, tables)}; field paths look like elements.qa.ec");
            return this;
        }
        string newText;
        if (table.Find(key) is SourceEntry entry)
        {
            string literal = Literal(text, entry.Value.Kind == SourceValueKind.String);
            newText = Text[..entry.Value.Offset] + literal + Text[(entry.Value.Offset + entry.Value.Length)..];
        }
        else
        {
            if (table.Column == 0) { error = new DeviceFileError(Path, table.Line, 1, fieldPath, "only values in tables can be added"); return this; }
            string newline = Text.Contains("\r\n") ? "\r\n" : "\n";
            int at = Math.Min(table.InsertOffset, Text.Length);
            string line = $"{QuoteKeyIfNeeded(key)} = {Literal(text, false)}{newline}";
            if (at > 0 && Text[at - 1] != '\n') line = newline + line;
            newText = Text[..at] + line + Text[at..];
        }
        var result = Parse(newText, Path, _options);
        if (result.Document is null)
        {
            var errors = result.Errors;
            error = errors.FirstOrDefault(e => e.Field == fieldPath) ?? errors.FirstOrDefault(e => e.Field.StartsWith(fieldPath)) ?? errors[0];
            return this;
        }
        return result.Document;
    }

    /// <summary>The file text, with comments and layout of the original and only edited values changed.</summary>
    public string ToText() => Text;

    /// <summary>Writes atomically (temporary file, flush, rename), keeping the previous file as PATH.bak (see <see cref="AtomicFile"/>).</summary>
    public void Save(string? path = null) => AtomicFile.Write(path ?? Path, Text);

    private (SourceTable Table, string Key)? Locate(string fieldPath)
    {
        SourceTable? best = null;
        foreach (var t in _source.Tables)
            if (fieldPath.StartsWith(t.Name + ".", StringComparison.Ordinal) && (best is null || t.Name.Length > best.Name.Length))
                best = t;
        if (best is null) return null;
        string key = fieldPath[(best.Name.Length + 1)..];
        return (best, key);
    }

    /// <summary>
    /// The TOML text for a typed value: quoted when replacing a text, or when the typed text is not a TOML
    /// value by itself ("210 MHz"); a number, boolean or array typed as such is written as it is.
    /// </summary>
    private static string Literal(string typed, bool replacingText)
    {
        string t = typed.Trim();
        if (!replacingText && t.Length > 0)
        {
            var probe = SyntaxParser.Parse("x = " + t + "\n", "value");
            if (!probe.HasErrors && probe.KeyValues.ChildrenCount == 1 && probe.Tables.ChildrenCount == 0) return t;
        }
        return Quote(t);
    }

    private static string Quote(string s)
    {
        var b = new StringBuilder("\"");
        foreach (char c in s)
            b.Append(c switch { '"' => "\\\"", '\\' => "\\\\", '\n' => "\\n", '\t' => "\\t", '\r' => "\\r", _ => c.ToString() });
        return b.Append('"').ToString();
    }

    private static string QuoteKeyIfNeeded(string key) =>
        key.All(c => char.IsAsciiLetterOrDigit(c) || c is '_' or '-') ? key : Quote(key);
}
