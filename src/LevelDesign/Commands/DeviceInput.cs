using System.Text.Json.Nodes;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Model;
using LevelDesign.Core.Units;

namespace LevelDesign.Commands;

/// <summary>Loads a device file for a command and reads --at / --point; problems go to stderr as FILE:LINE:COL: field: message.</summary>
public static class DeviceInput
{
    public static DeviceDocument? Load(string path, bool allowLarge)
    {
        var result = DeviceDocument.Load(path, new DeviceLoadOptions(AllowLarge: allowLarge));
        if (result.Ok) return result.Document;
        foreach (var e in result.Errors) Console.Error.WriteLine(e.ToString());
        Console.Error.WriteLine($"{path}: {ErrorList.CountText(result.Errors)}; nothing computed");
        return null;
    }

    /// <summary>Reads one "NAME=VALUE" where NAME is a bias (value in its control unit) or a parameter path.</summary>
    public static bool TryParseSetting(DeviceDocument document, string setting, out string name, out double value, out string error)
    {
        name = "";
        value = 0;
        int eq = setting.IndexOf('=');
        if (eq <= 0)
        {
            error = $"'{setting}': write BIAS=VALUE, e.g. qa_flux=0.1 or qc_flux=\"0.6 mA\"";
            return false;
        }
        name = setting[..eq].Trim();
        return TryParseValue(document, name, setting[(eq + 1)..], out value, out error);
    }

    public static bool TryParseValue(DeviceDocument document, string name, string text, out double value, out string error)
    {
        value = 0;
        if (document.Bias(name) is BiasDefinition bias)
            return bias.TryParseControl(text, out value, out error) || Fail($"{name}: {error}", out error);
        if (name.Contains('.'))
        {
            try { document.Device.GetParameter(name); }
            catch (ArgumentException e) { error = e.Message; return false; }
            var kind = ParameterKinds.Of(name[(name.LastIndexOf('.') + 1)..]);
            return QuantityParser.TryParseModelValue(text, kind, out value, out error) || Fail($"{name}: {error}", out error);
        }
        error = $"no bias '{name}'{EditDistance.Suggestion(name, document.Biases.Select(b => b.Name))}; biases in this file: {string.Join(", ", document.Biases.Select(b => b.Name))} (or give a parameter path such as qa.flux)";
        return false;
    }

    private static bool Fail(string message, out string error)
    {
        error = message;
        return false;
    }

    /// <summary>The device at the operating point (if named) with --at settings on top; null after printing the problem.</summary>
    public static Device? Resolve(DeviceDocument document, string? point, string[]? settings, out JsonObject applied)
    {
        applied = new JsonObject();
        var values = new Dictionary<string, double>();
        if (point is not null)
        {
            var p = document.Points.FirstOrDefault(x => x.Name == point);
            if (p is null)
            {
                Console.Error.WriteLine($"{document.Path}: no operating point '{point}'{EditDistance.Suggestion(point, document.Points.Select(x => x.Name))} (points: {string.Join(", ", document.Points.Select(x => x.Name))})");
                return null;
            }
            foreach (var (k, v) in p.BiasValues) values[k] = v;
        }
        foreach (var s in settings ?? [])
        {
            if (!TryParseSetting(document, s, out string name, out double v, out string error))
            {
                Console.Error.WriteLine($"--at {s}: {error}");
                return null;
            }
            values[name] = v;
        }
        foreach (var (k, v) in values) applied[k] = v;
        try
        {
            var device = document.At(values);
            var problems = device.Validate();
            if (problems.Count > 0)
            {
                foreach (var p in problems) Console.Error.WriteLine($"{document.Path}: at the requested bias: {p}");
                return null;
            }
            return device;
        }
        catch (ArgumentException e)
        {
            Console.Error.WriteLine($"{document.Path}: {e.Message}");
            return null;
        }
    }
}
