using System.Text.RegularExpressions;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Sweeps;

namespace LevelDesign.Ui.Compute;

/// <summary>
/// Reads "fit PATH [LOW..HIGH] ... to QUANTITY = VALUE [at POINT | at BIAS=V], ..." from the target prompt.
/// Bounds and targets are read by the fit command's own rules (<see cref="FitTerms.Parameter"/>,
/// <see cref="FitTerms.Target"/>); a parameter the file cannot take back as it is written (<see cref="FitField"/>)
/// is refused before any work, with the reason.
/// </summary>
public static partial class FitRequestParser
{
    public const string Syntax = "fit PATH [LOW..HIGH] [PATH ...] to QUANTITY = VALUE [at POINT][, ...]  e.g. fit qa.ej_sum qa.ec to qa.f01 = 5.2 GHz, qa.anharmonicity = -230 MHz";

    public static bool IsFit(string text) => text.TrimStart().StartsWith("fit ", StringComparison.Ordinal);

    public static FitRequest? Parse(string text, DeviceDocument document, IReadOnlyCollection<string> available, out string? error)
    {
        error = "write " + Syntax;
        string body = text.Trim();
        if (!IsFit(body)) return null;
        body = body[4..];
        int to = body.IndexOf(" to ", StringComparison.Ordinal);
        if (to < 0) return null;
        try
        {
            var parameters = Parameters(body[..to], document);
            if (parameters.Count == 0) { error = "name at least one parameter path after 'fit', e.g. qa.ej_sum"; return null; }
            if (parameters.Select(p => p.Path).Distinct().Count() != parameters.Count) { error = "a parameter is named twice"; return null; }
            var fields = parameters.Select(p => FitField.Of(document, p.Path)).ToArray();
            if (fields.FirstOrDefault(f => f.Refusal is not null) is { } refused)
            {
                error = $"fit refused for {refused.DevicePath}: {refused.Refusal}";
                return null;
            }
            var targets = body[(to + 4)..].Split(',', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries)
                .Select(t => FitTerms.Target(document, AtSign().Replace(t, "@"), available)).ToArray();
            if (targets.Length == 0) { error = "give at least one target after 'to', e.g. qa.f01 = 5.2 GHz"; return null; }
            error = null;
            return new FitRequest(parameters, fields, targets);
        }
        catch (InputTermException e)
        {
            error = e.Message;
            return null;
        }
    }

    /// <summary>Words from one path to the next are that path's bounds, "LOW..HIGH" with units (e.g. 10 GHz..40 GHz).</summary>
    private static List<FitParameter> Parameters(string text, DeviceDocument document)
    {
        var result = new List<FitParameter>();
        string? path = null;
        var bounds = new List<string>();
        foreach (string word in text.Split(' ', StringSplitOptions.RemoveEmptyEntries))
        {
            if (PathWord().IsMatch(word))
            {
                Flush();
                path = word;
            }
            else if (path is null) throw new InputTermException($"'{word}': start with a parameter path such as qa.ej_sum");
            else bounds.Add(word);
        }
        Flush();
        return result;

        void Flush()
        {
            if (path is null) return;
            string range = string.Join(' ', bounds);
            string argument = path;
            if (range.Length > 0)
            {
                var ends = range.Split("..");
                if (ends.Length != 2) throw new InputTermException($"{path} {range}: write bounds as LOW..HIGH, e.g. {path} 10 GHz..40 GHz");
                argument = $"{path}={ends[0].Trim()}:{ends[1].Trim()}";
            }
            result.Add(FitTerms.Parameter(document.Device, argument));
            bounds.Clear();
        }
    }

    [GeneratedRegex(@"^[A-Za-z_]\w*\.[A-Za-z_]\w*$")]
    private static partial Regex PathWord();

    [GeneratedRegex(@"\s+at\s+")]
    private static partial Regex AtSign();
}
