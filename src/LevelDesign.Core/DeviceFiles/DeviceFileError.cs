namespace LevelDesign.Core.DeviceFiles;

/// <summary>A problem in a device file: where it is, which field, and what was expected.</summary>
public sealed record DeviceFileError(string File, int Line, int Column, string Field, string Message)
{
    public override string ToString() => $"{File}:{Line}:{Column}: {Field}: {Message}";
}
