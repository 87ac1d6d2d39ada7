namespace LevelDesign.Core.Files;

/// <summary>A file could not be written; the message names the path the user gave, never a hidden temporary.</summary>
public sealed class FileWriteException(string message, Exception? inner = null) : IOException(message, inner);
