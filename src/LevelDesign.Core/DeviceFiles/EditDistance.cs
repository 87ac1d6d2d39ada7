namespace LevelDesign.Core.DeviceFiles;

/// <summary>Levenshtein distance, used to suggest the nearest valid key for a misspelling.</summary>
public static class EditDistance
{
    public static int Between(string a, string b)
    {
        var previous = new int[b.Length + 1];
        var current = new int[b.Length + 1];
        for (int j = 0; j <= b.Length; j++) previous[j] = j;
        for (int i = 1; i <= a.Length; i++)
        {
            current[0] = i;
            for (int j = 1; j <= b.Length; j++)
            {
                int substitution = previous[j - 1] + (char.ToLowerInvariant(a[i - 1]) == char.ToLowerInvariant(b[j - 1]) ? 0 : 1);
                current[j] = Math.Min(substitution, Math.Min(previous[j] + 1, current[j - 1] + 1));
            }
            (previous, current) = (current, previous);
        }
        return previous[b.Length];
    }

    /// <summary>The closest candidate if it is near enough to be a plausible misspelling (at most 1/2 of the word), else null.</summary>
    public static string? Nearest(string word, IEnumerable<string> candidates)
    {
        string? best = null;
        int bestDistance = int.MaxValue;
        foreach (var c in candidates)
        {
            int d = Between(word, c);
            if (d < bestDistance) { best = c; bestDistance = d; }
        }
        return best is not null && bestDistance <= Math.Max(2, word.Length / 2) ? best : null;
    }

    /// <summary>"; did you mean 'x'?" or "" when nothing is close.</summary>
    public static string Suggestion(string word, IEnumerable<string> candidates) =>
        Nearest(word, candidates) is string s ? $"; did you mean '{s}'?" : "";
}
