using System.Globalization;
using LevelDesign.Core.DeviceFiles;

namespace LevelDesign.Commands;

/// <summary>
/// Reads sweep axes from the command line: --vary BIAS=START:STOP:COUNT (values in the bias's control unit, or a
/// parameter path in its own unit) and --link TARGET=SCALE*AXIS[+SHIFT|-SHIFT] (TARGET moved with the axis AXIS:
/// target = SCALE·axis + SHIFT, both in base units, SHIFT written in TARGET's unit, e.g. "0.1mA").
/// </summary>
public static class AxisArguments
{
    /// <summary>Parses one axis; <paramref name="defaultCount"/> is used when COUNT is left out (null: COUNT required).</summary>
    public static SweepAxis Axis(DeviceDocument document, string text, int? defaultCount = null)
    {
        int eq = text.IndexOf('=');
        var parts = eq > 0 ? text[(eq + 1)..].Split(':') : [];
        string shape = defaultCount is null ? "BIAS=START:STOP:COUNT, e.g. qc_flux=0.15mA:1.05mA:61" : "BIAS=START:STOP[:COUNT], e.g. qc_flux=0.15mA:1.05mA:41";
        if (eq <= 0 || parts.Length < 2 || parts.Length > 3 || (parts.Length == 2 && defaultCount is null))
            throw new UsageException($"--vary {text}: write {shape}");
        string name = text[..eq].Trim();
        double from = Value(document, name, parts[0], $"--vary {text}");
        double to = Value(document, name, parts[1], $"--vary {text}");
        int count = defaultCount ?? 0;
        if (parts.Length == 3 && (!int.TryParse(parts[2], NumberStyles.Integer, CultureInfo.InvariantCulture, out count) || count < 1))
            throw new UsageException($"--vary {text}: COUNT '{parts[2]}' must be a whole number ≥ 1");
        return new SweepAxis(name, from, to, count, []);
    }

    /// <summary>Adds each --link to the axis it names; returns the axes with their links.</summary>
    public static IReadOnlyList<SweepAxis> WithLinks(DeviceDocument document, IReadOnlyList<SweepAxis> axes, string[]? links)
    {
        var result = axes.ToArray();
        foreach (string text in links ?? [])
        {
            int eq = text.IndexOf('=');
            if (eq <= 0) throw new UsageException($"--link {text}: write TARGET=SCALE*AXIS+SHIFT, e.g. qb_flux=1.0*qa_flux+0.05");
            string target = text[..eq].Trim();
            string expression = text[(eq + 1)..].Replace(" ", "");
            // a target must name a bias or parameter the file knows; parsing a zero in its unit checks that
            Value(document, target, "0", $"--link {text}");
            int star = expression.IndexOf('*');
            double scale = 1;
            if (star >= 0 && !double.TryParse(expression[..star], NumberStyles.Float, CultureInfo.InvariantCulture, out scale))
                throw new UsageException($"--link {text}: SCALE '{expression[..star]}' is not a number");
            string rest = star >= 0 ? expression[(star + 1)..] : expression;
            int axis = Array.FindIndex(result, a => rest.StartsWith(a.Path, StringComparison.Ordinal)
                && (rest.Length == a.Path.Length || rest[a.Path.Length] is '+' or '-'));
            if (axis < 0)
                throw new UsageException($"--link {text}: '{rest}' must start with a swept axis ({string.Join(", ", result.Select(a => a.Path))})");
            string shiftText = rest[result[axis].Path.Length..];
            double shift = 0;
            if (shiftText.Length > 0)
            {
                shift = Value(document, target, shiftText[1..], $"--link {text}");
                if (shiftText[0] == '-') shift = -shift;
            }
            if (!double.IsFinite(scale)) throw new UsageException($"--link {text}: SCALE must be finite");
            if (result.Any(a => a.Path == target || a.Links.Any(l => l.Path == target)))
                throw new UsageException($"--link {text}: '{target}' is already swept or linked");
            result[axis] = result[axis] with { Links = [.. result[axis].Links, new LinkedPath(target, scale, shift)] };
        }
        return result;
    }

    /// <summary>A value for a bias (control unit) or parameter path (its unit), or a usage error naming the option.</summary>
    public static double Value(DeviceDocument document, string name, string text, string option)
    {
        if (!ControlValues.TryParseValue(document, name, text, out double value, out string error))
            throw new UsageException($"{option}: {error}");
        return value;
    }
}
