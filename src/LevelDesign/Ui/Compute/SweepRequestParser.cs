using System.Globalization;
using LevelDesign.Core.DeviceFiles;

namespace LevelDesign.Ui.Compute;

/// <summary>
/// Reads what the user typed in the sweep prompt: either the name of a sweep kept in the file, or
/// "BIAS START STOP POINTS" optionally followed by "link PATH SCALE SHIFT" (repeatable) for a linked set.
/// BIAS is a bias name or a parameter path such as qa.flux.
/// </summary>
public static class SweepRequestParser
{
    public const string Syntax = "BIAS START STOP POINTS [link PATH SCALE SHIFT]…  or a sweep name from the file";

    public static SweepRequest? Parse(string text, DeviceDocument document, out string? error)
    {
        error = null;
        var words = text.Split(' ', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries);
        if (words.Length == 0) { error = "type " + Syntax; return null; }
        if (words.Length == 1)
        {
            var named = document.Sweeps.FirstOrDefault(s => s.Name == words[0]);
            if (named is null) { error = $"no sweep named '{words[0]}' in the file; type {Syntax}"; return null; }
            return new SweepRequest(text.Trim(), named.Axes);
        }
        if (words.Length < 4) { error = "type " + Syntax; return null; }
        string path = words[0];
        bool known = document.Biases.Any(b => b.Name == path) || IsParameterPath(document, path);
        if (!known) { error = $"'{path}' is neither a bias ({string.Join(", ", document.Biases.Select(b => b.Name))}) nor a parameter path like qa.flux"; return null; }
        if (!Number(words[1], out double start) || !Number(words[2], out double stop)) { error = "START and STOP must be numbers"; return null; }
        if (!int.TryParse(words[3], NumberStyles.Integer, CultureInfo.InvariantCulture, out int count) || count < 2 || count > 2001)
        { error = "POINTS must be a whole number from 2 to 2001"; return null; }
        var links = new List<LinkedPath>();
        for (int i = 4; i < words.Length; i += 4)
        {
            if (words[i] != "link" || i + 3 >= words.Length || !Number(words[i + 2], out double scale) || !Number(words[i + 3], out double shift))
            { error = "a linked path is written: link PATH SCALE SHIFT"; return null; }
            links.Add(new LinkedPath(words[i + 1], scale, shift));
        }
        return new SweepRequest(text.Trim(), [new SweepAxis(path, start, stop, count, links)]);
    }

    /// <summary>A sensible first sweep: the first bias (or the first flux) over one period in 61 points.</summary>
    public static string Suggest(DeviceDocument document)
    {
        if (document.Sweeps.Count > 0) return document.Sweeps[0].Name;
        if (document.Biases.Count > 0)
        {
            var b = document.Biases[0];
            return string.Create(CultureInfo.InvariantCulture, $"{b.Name} {b.Offset} {b.Offset + b.Period / 2} 61");
        }
        var flux = document.Device.Elements.FirstOrDefault(e => e.Parameters.ContainsKey("flux"));
        return flux is null ? "" : $"{flux.Id}.flux 0 0.5 61";
    }

    private static bool IsParameterPath(DeviceDocument document, string path)
    {
        try { document.Device.GetParameter(path); return true; }
        catch (ArgumentException) { return false; }
    }

    private static bool Number(string text, out double value) =>
        double.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out value) && double.IsFinite(value);
}
