using System.Globalization;

namespace LevelDesign.Core.DeviceFiles;

/// <summary>
/// Replaces the value written at a line and column of a device file's raw text, for files that do not load (so
/// there is no document to edit). The value token is a quoted string, an array, or a bare word up to a space,
/// comma, bracket or comment. Text the user types is quoted when the old value was quoted or when it is not a bare
/// TOML number or boolean ("205 MHz" becomes "\"205 MHz\""), so the user writes values as the file reads them.
/// </summary>
public static class RawValueFix
{
    /// <returns>The whole new text, or null (with a reason) when no value starts at that place.</returns>
    public static string? Replace(string text, int line, int column, string newValue, out string? problem)
    {
        problem = null;
        int start = Offset(text, line, column);
        if (start < 0 || start >= text.Length || text[start] is '\n' or '\r')
        {
            problem = $"no value at line {line}, column {column}";
            return null;
        }
        int end = TokenEnd(text, start);
        bool wasQuoted = text[start] == '"';
        string typed = newValue.Trim();
        string written = typed.StartsWith('"') || typed.StartsWith('[') ? typed
            : wasQuoted || !IsBareScalar(typed) ? "\"" + typed.Replace("\\", "\\\\").Replace("\"", "\\\"") + "\""
            : typed;
        return text[..start] + written + text[end..];
    }

    /// <summary>The value text written at that place (without quotes), for prefilling an edit; null if none.</summary>
    public static string? ValueAt(string text, int line, int column)
    {
        int start = Offset(text, line, column);
        if (start < 0 || start >= text.Length) return null;
        string token = text[start..TokenEnd(text, start)];
        return token.Length >= 2 && token[0] == '"' && token[^1] == '"' ? token[1..^1] : token;
    }

    private static int Offset(string text, int line, int column)
    {
        if (line < 1 || column < 1) return -1;
        int offset = 0;
        for (int l = 1; l < line; l++)
        {
            offset = text.IndexOf('\n', offset);
            if (offset < 0) return -1;
            offset++;
        }
        int lineEnd = text.IndexOf('\n', offset);
        if (lineEnd < 0) lineEnd = text.Length;
        int at = offset + column - 1;
        return at <= lineEnd ? at : -1;
    }

    private static int TokenEnd(string text, int start)
    {
        if (text[start] == '"')
        {
            for (int i = start + 1; i < text.Length && text[i] != '\n'; i++)
            {
                if (text[i] == '\\') { i++; continue; }
                if (text[i] == '"') return i + 1;
            }
            return LineEnd(text, start);
        }
        if (text[start] == '[')
        {
            int depth = 0;
            for (int i = start; i < text.Length && text[i] != '\n'; i++)
            {
                if (text[i] == '[') depth++;
                else if (text[i] == ']' && --depth == 0) return i + 1;
            }
            return LineEnd(text, start);
        }
        int end = start;
        while (end < text.Length && text[end] is not (' ' or '\t' or ',' or ']' or '#' or '\n' or '\r')) end++;
        return end;
    }

    private static int LineEnd(string text, int start)
    {
        int end = text.IndexOf('\n', start);
        end = end < 0 ? text.Length : end;
        while (end > start && char.IsWhiteSpace(text[end - 1])) end--;
        return end;
    }

    private static bool IsBareScalar(string value) =>
        value is "true" or "false"
        || double.TryParse(value.Replace("_", ""), NumberStyles.Float, CultureInfo.InvariantCulture, out _);
}
