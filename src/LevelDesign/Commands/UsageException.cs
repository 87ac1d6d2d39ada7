namespace LevelDesign.Commands;

/// <summary>
/// Bad input — an argument, or a device file with located problems: every line is printed on stderr, exit 2, never a
/// stack trace. <see cref="CommandGuard"/> is the one place that prints it.
/// </summary>
public sealed class UsageException(string message, IReadOnlyList<string>? lines = null) : Exception(message)
{
    /// <summary>What to print: the message, or the located problems (FILE:LINE:COL: field: message) and a summary.</summary>
    public IReadOnlyList<string> Lines { get; } = lines ?? [message];
}
