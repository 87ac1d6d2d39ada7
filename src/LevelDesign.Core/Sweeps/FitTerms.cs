using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Model;
using LevelDesign.Core.Units;

namespace LevelDesign.Core.Sweeps;

/// <summary>The fit's terms as typed, read the same way by the `fit` command and the terminal UI's fit prompt.</summary>
public static class FitTerms
{
    /// <summary>Every residual is measured in units of 1 MHz, so targets of different sizes weigh alike.</summary>
    public const double ResidualScaleGHz = 1e-3;

    /// <summary>PATH[=LOW:HIGH] with bounds in the parameter's unit; the start value is the device's, moved inside the bounds.</summary>
    public static FitParameter Parameter(Device device, string text)
    {
        int eq = text.IndexOf('=');
        string path = (eq < 0 ? text : text[..eq]).Trim();
        if (!path.Contains('.')) throw new InputTermException($"{text}: give a parameter path ELEMENT.PARAMETER or COUPLER.PARAMETER, e.g. qa.ej_sum");
        double initial;
        try { initial = device.GetParameter(path); }
        catch (ArgumentException e) { throw new InputTermException($"{text}: {e.Message}"); }
        var kind = ParameterKinds.OfPath(path);
        double lower, upper;
        if (eq < 0)
        {
            if (!(initial > 0)) throw new InputTermException($"{text}: the value is {initial}; give bounds PATH=LOW:HIGH");
            (lower, upper) = (initial / 2, initial * 2);
        }
        else
        {
            var parts = text[(eq + 1)..].Split(':');
            if (parts.Length != 2) throw new InputTermException($"{text}: write PATH=LOW:HIGH, e.g. qa.ec=150MHz:300MHz");
            if (!QuantityParser.TryParseModelValue(parts[0], kind, out lower, out string e1)) throw new InputTermException($"{text}: LOW: {e1}");
            if (!QuantityParser.TryParseModelValue(parts[1], kind, out upper, out string e2)) throw new InputTermException($"{text}: HIGH: {e2}");
            if (!(lower < upper)) throw new InputTermException($"{text}: LOW must be below HIGH");
        }
        return new FitParameter(path, Math.Clamp(initial, lower, upper), lower, upper);
    }

    /// <summary>QUANTITY=VALUE[@POINT|@BIAS=V,...]: the settings are parameter paths (a bias becomes its target parameter).</summary>
    public static FitTarget Target(DeviceDocument document, string text, IReadOnlyCollection<string> available)
    {
        int atSign = text.IndexOf('@');
        var (quantity, value) = TargetTerm.Parse(atSign < 0 ? text : text[..atSign], available);
        var settings = new Dictionary<string, double>();
        if (atSign >= 0)
        {
            string where = text[(atSign + 1)..].Trim();
            if (document.Points.FirstOrDefault(p => p.Name == where) is OperatingPoint p)
                foreach (var (bias, v) in p.BiasValues) Add(bias, v);
            else if (!where.Contains('='))
                throw new InputTermException($"{text}: no operating point '{where}'{EditDistance.Suggestion(where, document.Points.Select(x => x.Name))} (points: {string.Join(", ", document.Points.Select(x => x.Name))}); or write @BIAS=VALUE");
            else
                foreach (string setting in where.Split(','))
                {
                    if (!ControlValues.TryParseSetting(document, setting, out string name, out double v, out string error))
                        throw new InputTermException($"{text}: {error}");
                    Add(name, v);
                }
        }
        return new FitTarget(quantity, value, settings, ResidualScaleGHz);

        void Add(string name, double v)
        {
            if (document.Bias(name) is BiasDefinition b) settings[b.Target] = b.ToParameter(v);
            else settings[name] = v;
        }
    }
}
