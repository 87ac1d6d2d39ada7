using LevelDesign.Core.Analysis;
using LevelDesign.Core.Model;

namespace LevelDesign.Commands;

/// <summary>Warnings about a device that do not stop a computation (e.g. levels cut inside a multiplet), on stderr.</summary>
public static class DeviceWarnings
{
    public static IReadOnlyList<string> Print(string path, Device device)
    {
        var warnings = TruncationWarnings.For(device);
        foreach (string w in warnings) Console.Error.WriteLine($"{path}: warning: {w}");
        return warnings;
    }
}
