namespace LevelDesign.Core.DeviceFiles;

/// <summary>Replace <see cref="Length"/> characters of a file's text at <see cref="Start"/> by <see cref="Replacement"/>.</summary>
internal sealed record TextEdit(int Start, int Length, string Replacement)
{
    /// <summary>Applies edits that do not overlap, back to front so earlier offsets stay valid.</summary>
    public static string Apply(string text, IEnumerable<TextEdit> edits)
    {
        var ordered = edits.OrderByDescending(e => e.Start).ToList();
        for (int i = 1; i < ordered.Count; i++)
            if (ordered[i].Start + ordered[i].Length > ordered[i - 1].Start)
                throw new InvalidOperationException($"overlapping text edits at {ordered[i].Start} and {ordered[i - 1].Start}");
        foreach (var e in ordered) text = text[..e.Start] + e.Replacement + text[(e.Start + e.Length)..];
        return text;
    }
}
