using LevelDesign.Core.Units;

namespace LevelDesign.Core.DeviceFiles;

/// <summary>Reads "NAME=VALUE" settings and values typed for a bias (in its control unit) or a parameter path.</summary>
public static class ControlValues
{
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
            var kind = ParameterKinds.OfPath(name);
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
}
