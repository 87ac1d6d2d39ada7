using LevelDesign.Core.Files;

namespace LevelDesign.Commands;

/// <summary>
/// --out of every command: checked before anything is computed (refused with exit 2 when it is the device file
/// itself, a directory, in a missing or unwritable directory, read-only), then written by <see cref="AtomicFile"/>.
/// </summary>
public static class OutputFile
{
    public static void Check(string? output, string input)
    {
        if (output is null) return;
        if (AtomicFile.SameFile(output, input))
            throw new UsageException($"--out {output}: that is the device file {input}; the output would replace it. Choose another name");
        if (AtomicFile.Problem(output) is string problem) throw new UsageException($"--out {problem}");
    }

    /// <summary>Runs the write; a failure is a usage error naming the path the user gave.</summary>
    public static void Write(string output, Action write)
    {
        try { write(); }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException) { throw new UsageException($"--out {output}: {e.Message}"); }
    }
}
