namespace LevelDesign.Ui.Session;

/// <summary>
/// One row of the parameter form: the name, the value as text with its unit, and the field path used for
/// editing (null for read-only rows such as the kind). <see cref="EditText"/> is what the edit box starts with
/// when it differs from the shown text (a value set by a bias shows the parameter but edits the bias's control value).
/// <see cref="Note"/> says where the value comes from ("← bias qa_flux", "(from capacitance)");
/// <see cref="ShortNote"/> is its form for a narrow form ("← qa_flux"), empty when it may be left out.
/// </summary>
public sealed record FieldRow(string Name, string ValueText, string? FieldPath, string Hint, string? EditText = null,
    string? Note = null, string? ShortNote = null)
{
    public bool Editable => FieldPath is not null;
    public string StartText => EditText ?? ValueText;

    /// <summary>The value with its note, as shown when there is room.</summary>
    public string FullText => Note is null ? ValueText : $"{ValueText} {Note}";
}
