using System.Collections.Concurrent;
using System.Text.RegularExpressions;
using LevelDesign.Core.DeviceFiles;

namespace LevelDesign.Tests.Support;

/// <summary>
/// Paths of the example devices for tests that compute every one of them several times. A module too large for that
/// (the 3×3 lattice: 46,376 states, tens of seconds a point) is computed from a copy in a temporary folder with
/// max_excitations lowered to 3 (5,456 states, the same code paths: sparse iterative solve, large-module default
/// states); its full size is checked by <see cref="ExampleDeviceTests"/> without solving it.
/// </summary>
public static class ExampleDevices
{
    /// <summary>Above this many states an example is computed from a reduced copy.</summary>
    public const long AffordableDimension = 20_000;

    private static readonly string Folder = System.IO.Path.Combine(System.IO.Path.GetTempPath(), $"leveldesign-examples-{Environment.ProcessId}");
    private static readonly ConcurrentDictionary<string, string> Paths = new();

    public static string Path(string name) => Paths.GetOrAdd(name, Make);

    private static string Make(string name)
    {
        string original = System.IO.Path.Combine(RepositoryPaths.Devices, name);
        var document = DeviceDocument.Load(original).Document!;
        if (document.CompositeDimension <= AffordableDimension) return original;
        Directory.CreateDirectory(Folder);
        string copy = System.IO.Path.Combine(Folder, name);
        string text = Regex.Replace(File.ReadAllText(original), @"(?m)^max_excitations = \d+", "max_excitations = 3");
        File.WriteAllText(copy, text);
        return copy;
    }
}
