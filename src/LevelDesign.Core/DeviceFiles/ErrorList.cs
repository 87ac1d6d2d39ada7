using LevelDesign.Core.DeviceFiles.Source;

namespace LevelDesign.Core.DeviceFiles;

/// <summary>
/// Collects the problems found while reading one file, each with file, line, column and field. Only the first
/// <see cref="MaxListed"/> are kept (random bytes gave 51,846 errors and 4 MB of output); <see cref="Items"/> then
/// ends with one line saying how many more there were. <see cref="Count"/> counts them all.
/// </summary>
public sealed class ErrorList(string file)
{
    /// <summary>Most problems listed for one file.</summary>
    public const int MaxListed = 50;

    private readonly List<DeviceFileError> _errors = [];

    public string File { get; } = file;
    public IReadOnlyList<DeviceFileError> Items => Count > _errors.Count ? [.. _errors, More(File, Count - _errors.Count)] : _errors;
    public int Count { get; private set; }

    public void Add(int line, int column, string field, string message)
    {
        if (Count++ < MaxListed) _errors.Add(new DeviceFileError(File, line, column, field, TerminalText.Clean(message)));
    }

    /// <summary>The first <see cref="MaxListed"/> of a list made elsewhere (the TOML syntax errors), then the count of the rest.</summary>
    public static IReadOnlyList<DeviceFileError> Capped(IReadOnlyList<DeviceFileError> errors)
    {
        var listed = errors.Take(MaxListed).Select(e => e with { Message = TerminalText.Clean(e.Message) });
        return errors.Count <= MaxListed ? [.. listed] : [.. listed, More(errors[0].File, errors.Count - MaxListed)];
    }

    /// <summary>"N problem(s)" for a summary line, counting those left out of a capped list.</summary>
    public static string CountText(IReadOnlyList<DeviceFileError> errors) =>
        errors.Count > 0 && errors[^1].Field == MoreField && errors[^1].Line == 0
            ? $"more than {errors.Count - 1} problems"
            : $"{errors.Count} problem(s)";

    private const string MoreField = "file (list cut)";

    private static DeviceFileError More(string file, int more) =>
        new(file, 0, 0, MoreField, $"and {more:N0} more problem(s) not listed; fix the first ones and check again");

    public void At(SourceValue value, string field, string message) => Add(value.Line, value.Column, field, message);

    public void At(SourceEntry entry, string field, string message) => Add(entry.Line, entry.Column, field, message);

    public void At(SourceTable table, string field, string message) => Add(table.Line, table.Column, field, message);

    public void AddRange(IEnumerable<DeviceFileError> errors)
    {
        foreach (var e in errors) Add(e.Line, e.Column, e.Field, e.Message);
    }
}
