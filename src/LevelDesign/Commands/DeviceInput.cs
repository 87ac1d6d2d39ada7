using LevelDesign.Core.Presentation;
using System.Text.Json.Nodes;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Model;
using LevelDesign.Core.Units;

namespace LevelDesign.Commands;

/// <summary>
/// Loads a device file for a command and reads --at / --point. Problems are thrown as a <see cref="UsageException"/>
/// carrying every located line (FILE:LINE:COL: field: message), which the command guard prints.
/// </summary>
public static class DeviceInput
{
    public static DeviceDocument Load(string path, bool allowLarge)
    {
        var result = DeviceDocument.Load(path, new DeviceLoadOptions(AllowLarge: allowLarge));
        if (result.Ok) return result.Document!;
        string summary = $"{path}: {ErrorList.CountText(result.Errors)}; nothing computed";
        throw new UsageException(summary, [.. result.Errors.Select(e => e.ToString()), summary]);
    }

    /// <summary>The device at the operating point (if named) with --at settings on top; a usage error naming the problem.</summary>
    public static Device Resolve(DeviceDocument document, string? point, string[]? settings, out JsonObject applied)
    {
        applied = new JsonObject();
        var values = new Dictionary<string, double>();
        if (point is not null)
        {
            var p = document.Points.FirstOrDefault(x => x.Name == point);
            if (p is null)
                throw new UsageException($"{document.Path}: no operating point '{point}'{EditDistance.Suggestion(point, document.Points.Select(x => x.Name))} (points: {string.Join(", ", document.Points.Select(x => x.Name))})");
            foreach (var (k, v) in p.BiasValues) values[k] = v;
        }
        foreach (var s in settings ?? [])
        {
            if (!ControlValues.TryParseSetting(document, s, out string name, out double v, out string error))
                throw new UsageException($"--at {s}: {error}");
            values[name] = v;
        }
        foreach (var (k, v) in values) applied[k] = v;
        try
        {
            var device = document.At(values);
            var problems = device.Validate();
            if (problems.Count > 0)
                throw new UsageException(problems[0].Message, [.. problems.Select(p => $"{document.Path}: at the requested bias: {p}")]);
            return device;
        }
        catch (ArgumentException e)
        {
            throw new UsageException($"{document.Path}: {e.Message}");
        }
    }
}
