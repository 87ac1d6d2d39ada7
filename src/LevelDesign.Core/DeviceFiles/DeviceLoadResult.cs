namespace LevelDesign.Core.DeviceFiles;

/// <summary>A parse result: a document when the file is valid, and every error found otherwise.</summary>
public sealed record DeviceLoadResult(DeviceDocument? Document, IReadOnlyList<DeviceFileError> Errors)
{
    public bool Ok => Document is not null && Errors.Count == 0;
}
