using System.Globalization;

namespace LevelDesign.Core.DeviceFiles.Source;

/// <summary>
/// One TOML value with where it stands in the text (1-based line and column, and the character span of the
/// value itself, without comments), so errors can point at it and edits can replace exactly it.
/// </summary>
public sealed class SourceValue
{
    public required SourceValueKind Kind { get; init; }
    public string? Text { get; init; }
    public double Number { get; init; }
    public bool Boolean { get; init; }
    public IReadOnlyList<SourceValue> Items { get; init; } = [];
    public SourceTable? Table { get; init; }
    public required int Line { get; init; }
    public required int Column { get; init; }
    public required int Offset { get; init; }
    public required int Length { get; init; }

    public bool IsNumber => Kind is SourceValueKind.Integer or SourceValueKind.Float;

    /// <summary>A short human description of the value for messages, e.g. "the number 4" or "an array".</summary>
    public string Describe() => Kind switch
    {
        SourceValueKind.String => $"the text \"{Text}\"",
        SourceValueKind.Integer or SourceValueKind.Float => $"the number {Number.ToString("R", CultureInfo.InvariantCulture)}",
        SourceValueKind.Boolean => Boolean ? "true" : "false",
        SourceValueKind.Array => "an array",
        SourceValueKind.Table => "a table",
        _ => "a value of an unsupported type",
    };
}
