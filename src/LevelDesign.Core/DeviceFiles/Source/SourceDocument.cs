namespace LevelDesign.Core.DeviceFiles.Source;

/// <summary>A parsed device file: top-level entries, the [a.b] tables in file order, and syntax errors.</summary>
public sealed class SourceDocument
{
    public required SourceTable Root { get; init; }
    public List<SourceTable> Tables { get; } = [];
    public List<DeviceFileError> SyntaxErrors { get; } = [];
}
