using LevelDesign.Ui.Session;

namespace LevelDesign.Ui.Text;

/// <summary>
/// The parameter form's rows fitted to its width: names in one column, values after them ("·" before a read-only
/// value). A row too long for the column first shortens its note ("← bias qa_flux" → "← qa_flux"), then lets the
/// value start right after its name, and only then is cut with "…" (Enter on the row shows it whole).
/// </summary>
public static class FormRowText
{
    public static IReadOnlyList<TextLine> Build(IReadOnlyList<FieldRow> fields, int width)
    {
        int nameWidth = Math.Max(6, fields.Select(f => f.Name.Length).DefaultIfEmpty(6).Max());
        return fields.Select(f => new TextLine(Row(f, nameWidth, width))).ToList();
    }

    public static string Row(FieldRow field, int nameWidth, int width)
    {
        string mark = field.Editable ? "" : "·";
        string shortText = field.ShortNote is null ? field.FullText
            : field.ShortNote.Length == 0 ? field.ValueText : $"{field.ValueText} {field.ShortNote}";
        string[] candidates =
        [
            $"{field.Name.PadRight(nameWidth)} {mark}{field.FullText}",
            $"{field.Name.PadRight(nameWidth)} {mark}{shortText}",
            $"{field.Name} {mark}{field.FullText}",
            $"{field.Name} {mark}{shortText}",
        ];
        return candidates.FirstOrDefault(c => c.Length <= width) ?? TextFit.Cut(candidates[1], width);
    }
}
