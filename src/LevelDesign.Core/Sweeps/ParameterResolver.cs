using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Model;

namespace LevelDesign.Core.Sweeps;

/// <summary>
/// Builds the <c>resolve</c> function of <see cref="SweepRunner"/> for axes that name plain parameter paths
/// (qa.flux, ra.frequency, g_qa_ra.coefficient): each axis sets its path, and each linked path is set to
/// Scale·value + Shift. Bias names are the caller's business (the command line maps them to paths first).
/// </summary>
public static class ParameterResolver
{
    /// <summary>Every path is tried once here, so a wrong name fails before the sweep starts, with its reason.</summary>
    public static Func<IReadOnlyList<double>, Device> ForPaths(Device device, IReadOnlyList<SweepAxis> axes)
    {
        var problems = new List<string>();
        foreach (var axis in axes)
            foreach (string path in new[] { axis.Path }.Concat(axis.Links.Select(l => l.Path)))
                try { device.WithParameter(path, axis.Start); }
                catch (ArgumentException e) { problems.Add(e.Message); }
        if (problems.Count > 0) throw new ArgumentException(string.Join("; ", problems));
        return values => Apply(device, axes, values);
    }

    public static Device Apply(Device device, IReadOnlyList<SweepAxis> axes, IReadOnlyList<double> values)
    {
        foreach (var (path, value) in Settings(axes, values)) device = device.WithParameter(path, value);
        return device;
    }

    /// <summary>
    /// What one point of a sweep sets, in order: each axis's path (a parameter path or, for a document, a bias name)
    /// to its value and each linked path to Scale·value + Shift, after the <paramref name="start"/> settings. The one
    /// place this rule is written; <see cref="DeviceFiles.DeviceDocument.Resolve"/> maps bias names on top of it.
    /// </summary>
    public static Dictionary<string, double> Settings(IReadOnlyList<SweepAxis> axes, IReadOnlyList<double> values,
        IReadOnlyDictionary<string, double>? start = null)
    {
        if (values.Count != axes.Count) throw new ArgumentException($"{values.Count} axis values given for {axes.Count} axes");
        var settings = new Dictionary<string, double>(start ?? new Dictionary<string, double>());
        for (int i = 0; i < axes.Count; i++)
        {
            settings[axes[i].Path] = values[i];
            foreach (var link in axes[i].Links) settings[link.Path] = link.Scale * values[i] + link.Shift;
        }
        return settings;
    }

    /// <summary>A one-axis resolver as a function of the bias alone (for crossings, targets and fits).</summary>
    public static Func<double, Device> OneAxis(Func<IReadOnlyList<double>, Device> resolve) => x => resolve([x]);
}
