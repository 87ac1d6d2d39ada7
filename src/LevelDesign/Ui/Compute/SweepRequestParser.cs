using LevelDesign.Core.Presentation;
using System.Globalization;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Units;

namespace LevelDesign.Ui.Compute;

/// <summary>
/// Reads what the user typed in the sweep prompt: either the name of a sweep kept in the file, or
/// "BIAS START STOP POINTS" (START and STOP with units as the file writes them, e.g. "0.3 mA", or plain numbers in SI base units) optionally followed by "link PATH SCALE SHIFT" (repeatable) for a linked set.
/// BIAS is a bias name or a parameter path such as qa.flux.
/// </summary>
public static class SweepRequestParser
{
    public const string Syntax = "BIAS START STOP POINTS (e.g. qc_flux 0.3 mA 0.6 mA 41) [link PATH SCALE SHIFT]... [; a second axis for a map]  or a sweep name from the file";

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
        // two axes separated by ";" make a grid (the first across, the second up on the map page)
        var parts = text.Split(';', StringSplitOptions.TrimEntries);
        if (parts.Length > 2) { error = "at most two axes, separated by ';'"; return null; }
        var axes = new List<SweepAxis>();
        foreach (var part in parts)
        {
            var axis = ParseAxis(part.Split(' ', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries), document, out error);
            if (axis is null) { if (parts.Length > 1) error = $"axis {axes.Count + 1}: {error}"; return null; }
            axes.Add(axis);
        }
        if (axes.Count == 2 && axes[0].Path == axes[1].Path) { error = $"both axes sweep {axes[0].Path}"; return null; }
        if (Core.Sweeps.SweepGrid.AxisProblems(axes) is { Count: > 0 } problems) { error = string.Join("; ", problems); return null; }
        if (axes.Count == 2 && axes[0].Count * axes[1].Count > MaxGridPoints)
        { error = $"a grid of {axes[0].Count}×{axes[1].Count} points is more than the screen's {MaxGridPoints}; use the sweep command for larger grids"; return null; }
        return new SweepRequest(text.Trim(), axes);
    }

    /// <summary>Most points of a two-axis sweep started from the screen (a map of about 60×40 cells).</summary>
    public const int MaxGridPoints = 2601;

    private static SweepAxis? ParseAxis(string[] words, DeviceDocument document, out string? error)
    {
        if (words.Length < 4) { error = "type " + Syntax; return null; }
        // START and STOP may carry units as the file writes them ("0.3 mA" or "0.3mA"); a plain number is in SI base units
        string path = words[0];
        bool known = document.Biases.Any(b => b.Name == path) || IsParameterPath(document, path);
        if (!known) { error = $"'{path}' is neither a bias ({string.Join(", ", document.Biases.Select(b => b.Name))}) nor a parameter path like qa.flux"; return null; }
        int next = 1;
        if (!Value(document, path, words, ref next, out double start, out error)) { error = "START: " + error; return null; }
        if (!Value(document, path, words, ref next, out double stop, out error)) { error = "STOP: " + error; return null; }
        error = null;
        if (next >= words.Length || !int.TryParse(words[next], NumberStyles.Integer, CultureInfo.InvariantCulture, out int count) || count < 2 || count > 2001)
        { error = "POINTS must be a whole number from 2 to 2001"; return null; }
        var links = new List<LinkedPath>();
        for (int i = next + 1; i < words.Length; i += 4)
        {
            if (words[i] != "link" || i + 3 >= words.Length || !Number(words[i + 2], out double scale) || !Number(words[i + 3], out double shift))
            { error = "a linked path is written: link PATH SCALE SHIFT"; return null; }
            links.Add(new LinkedPath(words[i + 1], scale, shift));
        }
        return new SweepAxis(path, start, stop, count, links);
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

    /// <summary>
    /// One START or STOP at words[next] (with the following word when that is a unit): a plain number as it is,
    /// otherwise read in the bias's control unit kind, or the parameter's kind for a path such as qa.flux.
    /// </summary>
    private static bool Value(DeviceDocument document, string path, string[] words, ref int next, out double value, out string error)
    {
        value = 0;
        error = "missing value";
        if (next >= words.Length) return false;
        string text = words[next++];
        if (next < words.Length && IsUnitWord(words[next])) text += " " + words[next++];
        if (Number(text, out value)) { error = ""; return true; }
        bool ok = document.Bias(path) is { } bias
            ? bias.TryParseControl(text, out value, out error)
            : QuantityParser.TryParseModelValue(text, ParameterKinds.Of(path[(path.LastIndexOf('.') + 1)..]), out value, out error);
        return ok;
    }

    private static bool IsUnitWord(string word) => word != "link" && !(char.IsAsciiDigit(word[0]) || word[0] is '+' or '-' or '.');

    private static bool Number(string text, out double value) =>
        double.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out value) && double.IsFinite(value);
}
