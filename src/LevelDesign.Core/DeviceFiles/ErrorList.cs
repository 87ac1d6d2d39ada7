using LevelDesign.Core.DeviceFiles.Source;

namespace LevelDesign.Core.DeviceFiles;

/// <summary>Collects every problem found while reading one file, each with file, line, column and field.</summary>
public sealed class ErrorList(string file)
{
    private readonly List<DeviceFileError> _errors = [];

    public string File { get; } = file;
    public IReadOnlyList<DeviceFileError> Items => _errors;
    public int Count => _errors.Count;

    public void Add(int line, int column, string field, string message) =>
        _errors.Add(new DeviceFileError(File, line, column, field, message));

    public void At(SourceValue value, string field, string message) => Add(value.Line, value.Column, field, message);

    public void At(SourceEntry entry, string field, string message) => Add(entry.Line, entry.Column, field, message);

    public void At(SourceTable table, string field, string message) => Add(table.Line, table.Column, field, message);

    public void AddRange(IEnumerable<DeviceFileError> errors) => _errors.AddRange(errors);
}
