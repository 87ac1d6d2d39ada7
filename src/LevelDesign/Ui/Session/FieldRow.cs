namespace LevelDesign.Ui.Session;

/// <summary>
/// One row of the parameter form: the name, the value as text with its unit, and the field path used for
/// editing (null for read-only rows such as the kind).
/// </summary>
public sealed record FieldRow(string Name, string ValueText, string? FieldPath, string Hint)
{
    public bool Editable => FieldPath is not null;
}
