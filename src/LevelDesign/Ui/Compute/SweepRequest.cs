using LevelDesign.Core.DeviceFiles;

namespace LevelDesign.Ui.Compute;

/// <summary>A sweep the user asked for: its text (to offer again) and its axes.</summary>
public sealed record SweepRequest(string Text, IReadOnlyList<SweepAxis> Axes)
{
    /// <summary>Axis values (and linked paths) as the named values handed to DeviceDocument.At.</summary>
    public IReadOnlyDictionary<string, double> ValuesAt(IReadOnlyList<double> axisValues)
    {
        var values = new Dictionary<string, double>();
        for (int a = 0; a < Axes.Count && a < axisValues.Count; a++)
        {
            values[Axes[a].Path] = axisValues[a];
            foreach (var link in Axes[a].Links) values[link.Path] = link.Scale * axisValues[a] + link.Shift;
        }
        return values;
    }
}
