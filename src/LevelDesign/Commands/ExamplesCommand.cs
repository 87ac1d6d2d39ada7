using System.CommandLine;
using System.Reflection;

namespace LevelDesign.Commands;

/// <summary>
/// leveldesign examples DIR: copies the example devices and the manuals (embedded in the executable, so an installed
/// tool or a single-file build has them without the repository) into a folder; never overwrites a file.
/// </summary>
public static class ExamplesCommand
{
    /// <summary>Embedded resources under this prefix are written to DIR under the rest of their name.</summary>
    private const string Prefix = "examples/";

    public static Command Create()
    {
        var folder = new Argument<string>("DIR") { Description = "folder to copy them into (created if missing; existing files are never replaced)" };
        var command = new Command("examples", "copy the example devices (*.toml) and the manuals (docs/*.md) into a folder") { folder };
        command.SetAction(parse => CommandGuard.Run(parse.GetValue(folder)!, () => Run(parse.GetValue(folder)!)));
        return command;
    }

    /// <summary>Relative paths of everything the command writes, in a stable order.</summary>
    public static IReadOnlyList<string> Files() =>
        Assembly.GetManifestResourceNames().Where(n => n.StartsWith(Prefix, StringComparison.Ordinal))
            .Select(n => n[Prefix.Length..]).Order(StringComparer.Ordinal).ToArray();

    private static Assembly Assembly => typeof(ExamplesCommand).Assembly;

    public static int Run(string folder)
    {
        if (File.Exists(folder)) throw new UsageException($"{folder}: is a file; name a folder to copy the examples into");
        var files = Files();
        // all or nothing: a folder that already holds one of them is left exactly as it was
        var existing = files.Where(f => Path.Exists(Path.Combine(folder, f))).ToArray();
        if (existing.Length > 0)
            throw new UsageException($"{folder}: already has {string.Join(", ", existing)}; nothing copied (name a new or empty folder)");
        try
        {
            foreach (var f in files)
            {
                string target = Path.Combine(folder, f);
                Directory.CreateDirectory(Path.GetDirectoryName(target)!);
                using var source = Assembly.GetManifestResourceStream(Prefix + f)!;
                // CreateNew: a file that appeared since the check above is still not replaced
                using var output = new FileStream(target, FileMode.CreateNew, FileAccess.Write);
                source.CopyTo(output);
                Console.WriteLine(target);
            }
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            throw new UsageException($"{folder}: cannot write: {e.Message}");
        }
        Console.Error.WriteLine($"copied {files.Count} files; try: leveldesign check {Path.Combine(folder, "pair.toml")}");
        return ExitCodes.Ok;
    }
}
