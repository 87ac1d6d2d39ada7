namespace LevelDesign.Tests.Support;

/// <summary>Finds the repository (the folder holding LevelDesign.sln) from the test assembly's location.</summary>
public static class RepositoryPaths
{
    public static string Root { get; } = FindRoot();

    public static string Devices => Path.Combine(Root, "devices");

    public static string Malformed => Path.Combine(Root, "tests", "LevelDesign.Tests", "Malformed");

    public static IEnumerable<string> DeviceFiles() => Directory.GetFiles(Devices, "*.toml").OrderBy(f => f, StringComparer.Ordinal);

    private static string FindRoot()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "LevelDesign.sln"))) dir = dir.Parent;
        return dir?.FullName ?? throw new InvalidOperationException("LevelDesign.sln not found above " + AppContext.BaseDirectory);
    }
}
