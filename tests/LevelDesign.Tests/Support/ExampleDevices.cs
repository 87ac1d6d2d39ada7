using System.Collections.Concurrent;
using System.Text.RegularExpressions;
using LevelDesign.Core.DeviceFiles;

namespace LevelDesign.Tests.Support;

/// <summary>
/// Paths of the example devices for tests that compute every one of them several times (a debug build, on a shared
/// machine). A module too large for that (devices/line4.toml: 4,364 states; the 3×3 lattice: 46,376) is computed from
/// a copy in a temporary folder with max_excitations lowered until it has at most <see cref="AffordableDimension"/>
/// states (line4 at 4 excitations: 1,365 states, still the sparse iterative path; the lattice at 2: 496). Their full
/// sizes and the large-module default states are checked by <see cref="ModuleTests"/> without solving them whole.
/// </summary>
public static class ExampleDevices
{
    /// <summary>Above this many states an example is computed from a reduced copy.</summary>
    public const long AffordableDimension = 2_000;

    private static readonly string Folder = System.IO.Path.Combine(System.IO.Path.GetTempPath(), $"leveldesign-examples-{Environment.ProcessId}");

    // the reduced copies are removed when the test process ends, so no run leaves them behind
    static ExampleDevices() => AppDomain.CurrentDomain.ProcessExit += (_, _) =>
    {
        try { if (Directory.Exists(Folder)) Directory.Delete(Folder, recursive: true); }
        catch (IOException) { }
        catch (UnauthorizedAccessException) { }
    };
    private static readonly ConcurrentDictionary<string, string> Paths = new();

    public static string Path(string name) => Paths.GetOrAdd(name, Make);

    private static string Make(string name)
    {
        string original = System.IO.Path.Combine(RepositoryPaths.Devices, name);
        var document = DeviceDocument.Load(original).Document!;
        if (document.CompositeDimension <= AffordableDimension) return original;
        Directory.CreateDirectory(Folder);
        string copy = System.IO.Path.Combine(Folder, name);
        for (int cap = document.Device.Truncation.MaxExcitations!.Value - 1; cap >= 1; cap--)
        {
            string text = Regex.Replace(File.ReadAllText(original), @"(?m)^max_excitations = \d+", $"max_excitations = {cap}");
            File.WriteAllText(copy, text);
            if (DeviceDocument.Load(copy).Document!.CompositeDimension <= AffordableDimension) break;
        }
        return copy;
    }
}
