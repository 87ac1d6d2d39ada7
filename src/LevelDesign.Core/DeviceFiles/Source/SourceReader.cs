using Tomlyn.Parsing;
using Tomlyn.Syntax;

namespace LevelDesign.Core.DeviceFiles.Source;

/// <summary>
/// Reads TOML text with Tomlyn's syntax parser (which keeps every character, so positions are exact) into
/// <see cref="SourceDocument"/>. Tomlyn counts lines and columns from 0; ours start at 1 like editors.
/// </summary>
public static class SourceReader
{
    public static SourceDocument Read(string text, string path)
    {
        DocumentSyntax syntax = SyntaxParser.Parse(text, path);
        var root = new SourceTable { Name = "", Line = 1, Column = 1 };
        var document = new SourceDocument { Root = root };
        document.SyntaxErrors.AddRange(ParserErrors(syntax, path, text));
        AddEntries(root, syntax.KeyValues, text);
        root.InsertOffset = EndOf(syntax.KeyValues, 0);
        foreach (var table in syntax.Tables)
        {
            string name = table.Name is null ? "" : string.Join(".", Segments(table.Name, text));
            var source = new SourceTable { Name = name, Line = table.Span.Start.Line + 1, Column = table.Span.Start.Column + 1 };
            if (table is TableArraySyntax)
                document.SyntaxErrors.Add(new DeviceFileError(path, source.Line, source.Column, name,
                    $"[[{name}]] (an array of tables) is not used in device files; write one table per id, e.g. [{name}.name]"));
            AddEntries(source, table.Items, text);
            source.InsertOffset = EndOf(table.Items, table.Span.End.Offset + 1);
            document.Tables.Add(source);
        }
        return document;
    }

    /// <summary>
    /// The parser's errors in file order. A string whose closing quote is missing runs into the next lines and makes
    /// the parser report dozens of errors there (one missing quote gave 87, the first two on the wrong line): then
    /// only the open string is reported, at its own line, with how many follow-on errors were left out.
    /// </summary>
    private static IEnumerable<DeviceFileError> ParserErrors(DocumentSyntax syntax, string path, string text)
    {
        var errors = syntax.Diagnostics.Where(d => d.Kind == DiagnosticMessageKind.Error)
            .Select(d => (Line: d.Span.Start.Line + 1, Column: d.Span.Start.Column + 1, d.Message))
            .OrderBy(e => e.Line).ThenBy(e => e.Column).ToList();
        int open = errors.FindIndex(e => e.Message.Contains("newline in a string", StringComparison.OrdinalIgnoreCase));
        if (open >= 0)
        {
            var (line, column, _) = errors[open];
            var before = errors.Take(open).Where(e => e.Line < line).ToList();   // unrelated errors above it stay
            foreach (var e in before) yield return Explain(path, e.Line, e.Column, e.Message);
            int left = errors.Count - before.Count - 1;
            // point at the opening quote (the parser reports the line's end): the last quote before that end
            string lineText = text.Split('\n').ElementAtOrDefault(line - 1) ?? "";
            int quote = lineText[..Math.Min(lineText.Length, Math.Max(0, column - 1))].LastIndexOfAny(['"', '\'']);
            if (quote >= 0) column = quote + 1;
            yield return new DeviceFileError(path, line, column, "syntax",
                "a string on this line is not closed: its closing quote (\") is missing" +
                (left > 0 ? $" ({left} further syntax error{(left == 1 ? "" : "s")} after it follow from it and are not listed)" : ""));
            yield break;
        }
        foreach (var e in errors) yield return Explain(path, e.Line, e.Column, e.Message);
    }

    /// <summary>Rewords the parser's message for a repeated key or table as a duplicate, naming the first place.</summary>
    private static DeviceFileError Explain(string path, int line, int column, string message)
    {
        var m = System.Text.RegularExpressions.Regex.Match(message, @"The key `([^`]+)` is already defined at \((\d+),(\d+)\)");
        // the parser may quote the rest of the file in its message: keep the reason, not pages of text
        if (!m.Success) return new DeviceFileError(path, line, column, "syntax", "not valid TOML: " + TerminalTextCut(message));
        string key = m.Groups[1].Value, first = m.Groups[2].Value;
        var parts = key.Split('.');
        string text = parts.Length == 2 && parts[0] is "elements" or "couplers" or "biases" or "points" or "sweeps"
            ? $"duplicate id '{parts[1]}': [{key}] is already defined at line {first}; ids must be unique"
            : $"key '{parts[^1]}' is given twice (first at line {first})";
        return new DeviceFileError(path, line, column, key, text);
    }

    private static string TerminalTextCut(string message) => message.Length <= 160 ? message : message[..159] + "…";

    private static int EndOf(SyntaxList<KeyValueSyntax> items, int fallback)
    {
        int end = fallback;
        foreach (var kv in items) end = Math.Max(end, kv.Span.End.Offset + 1);
        return end;
    }

    private static void AddEntries(SourceTable table, SyntaxList<KeyValueSyntax> items, string text)
    {
        foreach (var kv in items)
        {
            if (kv.Key is null || kv.Value is null) continue; // already reported as a syntax error
            string key = string.Join(".", Segments(kv.Key, text));
            table.Entries.Add(new SourceEntry(key, kv.Key.Span.Start.Line + 1, kv.Key.Span.Start.Column + 1, Convert(kv.Value, text, key)));
        }
    }

    internal static IEnumerable<string> Segments(KeySyntax key, string text)
    {
        if (key.Key is not null) yield return Segment(key.Key, text);
        foreach (var dotted in key.DotKeys)
            if (dotted.Key is not null) yield return Segment(dotted.Key, text);
    }

    private static string Segment(BareKeyOrStringValueSyntax part, string text) => part switch
    {
        StringValueSyntax s => s.Value ?? "",
        _ => text.Substring(part.Span.Offset, part.Span.Length).Trim(),
    };

    private static SourceValue Convert(ValueSyntax value, string text, string name)
    {
        int line = value.Span.Start.Line + 1, column = value.Span.Start.Column + 1;
        int offset = value.Span.Offset, length = value.Span.Length;
        switch (value)
        {
            case StringValueSyntax s:
                return new SourceValue { Kind = SourceValueKind.String, Text = s.Value ?? "", Line = line, Column = column, Offset = offset, Length = length };
            case IntegerValueSyntax i:
                return new SourceValue { Kind = SourceValueKind.Integer, Number = i.Value, Line = line, Column = column, Offset = offset, Length = length };
            case FloatValueSyntax f:
                return new SourceValue { Kind = SourceValueKind.Float, Number = f.Value, Line = line, Column = column, Offset = offset, Length = length };
            case BooleanValueSyntax b:
                return new SourceValue { Kind = SourceValueKind.Boolean, Boolean = b.Value, Line = line, Column = column, Offset = offset, Length = length };
            case ArraySyntax a:
            {
                var items = new List<SourceValue>();
                foreach (var item in a.Items)
                    if (item.Value is not null) items.Add(Convert(item.Value, text, name));
                return new SourceValue { Kind = SourceValueKind.Array, Items = items, Line = line, Column = column, Offset = offset, Length = length };
            }
            case InlineTableSyntax t:
            {
                var table = new SourceTable { Name = name, Line = line, Column = column };
                foreach (var item in t.Items)
                    if (item.KeyValue is { Key: not null, Value: not null } kv)
                        table.Entries.Add(new SourceEntry(string.Join(".", Segments(kv.Key, text)), kv.Key.Span.Start.Line + 1,
                            kv.Key.Span.Start.Column + 1, Convert(kv.Value, text, name)));
                return new SourceValue { Kind = SourceValueKind.Table, Table = table, Line = line, Column = column, Offset = offset, Length = length };
            }
            default:
                return new SourceValue { Kind = SourceValueKind.Other, Line = line, Column = column, Offset = offset, Length = length };
        }
    }
}
