using LevelDesign.Core.Presentation;
using System.Globalization;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Units;
using LevelDesign.Ui.Session;

namespace LevelDesign.Ui.Compute;

/// <summary>
/// Reads the target prompt, "QUANTITY = VALUE by BIAS LOW to HIGH" (LOW and HIGH in the bias's control unit,
/// e.g. "0.15 mA to 1.05 mA"; "LOW HIGH" without "to" for plain numbers), and says which file value a found
/// bias value goes to.
/// </summary>
public static class TargetRequestParser
{
    public const string Syntax = "QUANTITY = VALUE by BIAS LOW to HIGH [in N], e.g. qa.f01 = 5.2 GHz by qa_flux 0 to 0.5 in 81";

    public static TargetRequest? Parse(string text, DeviceDocument document, IEnumerable<string>? knownQuantities, out string? error)
    {
        error = "write " + Syntax;
        int equals = text.IndexOf('='), by = text.IndexOf(" by ", StringComparison.Ordinal);
        if (equals < 0 || by < equals) return null;
        var known = knownQuantities?.ToList();
        var expression = Core.Sweeps.QuantityExpression.Parse(text[..equals], known is { Count: > 0 } ? known : null, out string? problem);
        if (expression is null)
        {
            error = known is { Count: > 0 } ? $"{problem}; names look like {string.Join(", ", known.Take(4))} (or a difference: qa.f01 - qb.f01)" : problem;
            return null;
        }
        string quantity = expression.ToString();
        if (!QuantityParser.TryParse(text[(equals + 1)..by].Trim(), UnitKind.Frequency, out double goal, out string unitError)) { error = unitError; return null; }
        string rest = text[(by + 4)..].Trim();
        int space = rest.IndexOf(' ');
        if (space < 0) return null;
        string bias = rest[..space];
        string range = rest[(space + 1)..].Trim();
        // "in N" at the end sets the scan count
        int scan = TargetSearch.ScanPoints;
        int inAt = range.LastIndexOf(" in ", StringComparison.Ordinal);
        if (inAt >= 0)
        {
            if (!int.TryParse(range[(inAt + 4)..].Trim(), NumberStyles.None, CultureInfo.InvariantCulture, out scan) || scan is < 3 or > 2001)
            {
                error = "in N: the scan count must be a whole number from 3 to 2001";
                return null;
            }
            range = range[..inAt].Trim();
        }
        string[] ends = range.Contains(" to ") ? range.Split(" to ", 2, StringSplitOptions.TrimEntries) : range.Split(' ', StringSplitOptions.RemoveEmptyEntries);
        if (ends.Length != 2) return null;
        var definition = document.Bias(bias);
        if (definition is null && !IsParameter(document, bias))
        {
            error = $"'{bias}' is neither a bias ({string.Join(", ", document.Biases.Select(b => b.Name))}) nor a parameter path like qa.flux";
            return null;
        }
        double low, high;
        if (definition is not null)
        {
            if (!definition.TryParseControl(ends[0], out low, out string e1)) { error = "LOW: " + e1; return null; }
            if (!definition.TryParseControl(ends[1], out high, out string e2)) { error = "HIGH: " + e2; return null; }
        }
        else if (!Number(ends[0], out low) || !Number(ends[1], out high)) { error = "LOW and HIGH must be numbers for a parameter path"; return null; }
        if (low == high) { error = "LOW and HIGH must differ"; return null; }
        error = null;
        return new TargetRequest(quantity, goal, bias, low, high) { ScanPoints = scan };
    }

    /// <summary>
    /// The file value that sets <paramref name="biasOrPath"/> to <paramref name="value"/>: a bias's value (in its
    /// control unit); for a parameter path moved by a bias, that bias (the file's biases override element values);
    /// otherwise the element or coupler value itself. Null when the path is not written in the file.
    /// </summary>
    public static (string Field, string Text)? FieldFor(DeviceDocument document, string biasOrPath, double value)
    {
        if (document.Bias(biasOrPath) is { } bias) return ($"biases.{bias.Name}.value", QuantityFormatter.Format(value, bias.ControlKind));
        if (document.Biases.FirstOrDefault(b => b.Target == biasOrPath) is { } over)
            return ($"biases.{over.Name}.value", QuantityFormatter.Format(over.ToControl(value), over.ControlKind));
        int dot = biasOrPath.IndexOf('.');
        if (dot < 0) return null;
        string owner = biasOrPath[..dot], name = biasOrPath[(dot + 1)..];
        string section = document.Device.IndexOf(owner) >= 0 ? "elements" : "couplers";
        return ($"{section}.{owner}.{name}", ParameterText.Format(value, ParameterKinds.Of(name)));
    }

    private static bool IsParameter(DeviceDocument document, string path)
    {
        try { document.Device.GetParameter(path); return true; }
        catch (ArgumentException) { return false; }
    }

    private static bool Number(string text, out double value) =>
        double.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out value) && double.IsFinite(value);
}
