using System.Text;

namespace LevelDesign.Core.DeviceFiles;

/// <summary>
/// Makes text from a file safe to print: control characters (C0 but newline and tab, DEL, C1) and the bidirectional
/// overrides are shown as \xNN or \uNNNN, so an id, kind or name cannot move the cursor, recolour or clear a
/// terminal, or hide text by reversing it.
/// </summary>
public static class TerminalText
{
    public static string Clean(string text)
    {
        int first = 0;
        while (first < text.Length && !Unsafe(text[first])) first++;
        if (first == text.Length) return text;
        var result = new StringBuilder(text.Length + 8).Append(text, 0, first);
        for (int i = first; i < text.Length; i++)
        {
            char c = text[i];
            if (!Unsafe(c)) result.Append(c);
            else if (c < 0x100) result.Append($"\\x{(int)c:X2}");
            else result.Append($"\\u{(int)c:X4}");
        }
        return result.ToString();
    }

    public static bool Unsafe(char c) =>
        (c < 0x20 && c is not '\n' and not '\t') || c is >= '\u007f' and <= '\u009f' || c is >= '\u202a' and <= '\u202e' || c is >= '\u2066' and <= '\u2069';
}
