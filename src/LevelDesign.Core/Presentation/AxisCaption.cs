using System.Globalization;
using LevelDesign.Core.DeviceFiles;

namespace LevelDesign.Core.Presentation;

/// <summary>The caption of a sweep axis on plots and pages: its name, the unit it is shown in, and what a bias moves.</summary>
public static class AxisCaption
{
    public static string Of(DeviceDocument? document, string path)
    {
        var unit = ShownUnit.Of(document, path);
        string caption = unit.Caption(path);
        if (document?.Bias(path) is not BiasDefinition bias) return caption;
        if (bias.Period != 1 || bias.Offset != 0)
            return caption + string.Create(CultureInfo.InvariantCulture,
                $";  {bias.Target} = (value − {unit.ToShown(bias.Offset):G6}) / {unit.ToShown(bias.Period):G6}");
        return caption + $" = {bias.Target}";
    }
}
