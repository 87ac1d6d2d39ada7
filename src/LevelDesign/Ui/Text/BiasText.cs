using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Units;
using LevelDesign.Ui.Session;

namespace LevelDesign.Ui.Text;

/// <summary>Values of a sweep axis or bias in its own unit: a bias in its control unit (mA, Φ0…), a parameter path in the parameter's.</summary>
public static class BiasText
{
    public static string Format(DeviceDocument? document, string path, double value)
    {
        if (!double.IsFinite(value)) return value.ToString(System.Globalization.CultureInfo.InvariantCulture);
        if (document?.Bias(path) is { } bias) return QuantityFormatter.Format(value, bias.ControlKind);
        return FieldUnits.Format(value, FieldUnits.Of(path[(path.LastIndexOf('.') + 1)..]));
    }
}
