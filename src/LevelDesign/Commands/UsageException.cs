namespace LevelDesign.Commands;

/// <summary>A bad command-line argument: printed as one clear line on stderr, exit 2, never a stack trace.</summary>
public sealed class UsageException(string message) : Exception(message);
