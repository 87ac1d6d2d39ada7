using LevelDesign.Core.DeviceFiles;
using LevelDesign.Ui.Session;

namespace LevelDesign.Ui.Text;

/// <summary>Values of a sweep axis or bias for reading (6 significant digits) in its own unit: a bias in its control unit (mA, Φ0…), a parameter path in the parameter's.</summary>
public static class BiasText
{
    public static string Format(DeviceDocument? document, string path, double value, int digits = FieldUnits.DisplayDigits)
    {
        if (!double.IsFinite(value)) return value.ToString(System.Globalization.CultureInfo.InvariantCulture);
        if (document?.Bias(path) is { } bias) return FieldUnits.Display(value, bias.ControlKind, digits);
        return FieldUnits.Display(value, FieldUnits.Of(path[(path.LastIndexOf('.') + 1)..]), digits);
    }
}
