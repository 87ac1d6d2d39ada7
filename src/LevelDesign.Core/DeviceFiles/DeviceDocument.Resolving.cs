using LevelDesign.Core.Model;

namespace LevelDesign.Core.DeviceFiles;

/// <summary>
/// Resolving: the device a bias setting, a sweep point or a named operating point gives, from the file's device and
/// its biases (control values mapped to model parameters). Nothing here reads or changes the text.
/// </summary>
public sealed partial class DeviceDocument
{
    public BiasDefinition? Bias(string name) => Biases.FirstOrDefault(b => b.Name == name);

    /// <summary>
    /// The device with the named biases (control values) or parameter paths ("qa.flux") set, on top of
    /// <paramref name="from"/> (default: the file's device; a spread study passes a drawn chip).
    /// </summary>
    public Device At(IReadOnlyDictionary<string, double> values, Device? from = null)
    {
        var device = from ?? Device;
        foreach (var (key, value) in values)
        {
            if (Bias(key) is BiasDefinition bias) device = device.WithParameter(bias.Target, bias.ToParameter(value));
            else if (key.Contains('.')) device = device.WithParameter(key, value);
            else throw new ArgumentException($"no bias '{key}'{EditDistance.Suggestion(key, Biases.Select(b => b.Name))}; give a bias name or a parameter path such as qa.flux");
        }
        return device;
    }

    /// <summary>
    /// The device at one point of a sweep: each axis's target set to its value and each linked path to
    /// Scale·value + Shift, on top of <paramref name="start"/> (default: the device at the file's bias values).
    /// </summary>
    public Device Resolve(IReadOnlyList<SweepAxis> axes, IReadOnlyList<double> values, IReadOnlyDictionary<string, double>? start = null,
        Device? from = null)
        => At(Core.Sweeps.ParameterResolver.Settings(axes, values, start), from);

    /// <summary>The device at a named operating point.</summary>
    public Device AtPoint(string name)
    {
        var point = Points.FirstOrDefault(p => p.Name == name)
                    ?? throw new ArgumentException($"no operating point '{name}'{EditDistance.Suggestion(name, Points.Select(p => p.Name))}");
        return At(point.BiasValues);
    }
}
