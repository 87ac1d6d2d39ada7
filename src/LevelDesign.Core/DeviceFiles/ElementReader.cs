using LevelDesign.Core.DeviceFiles.Source;
using LevelDesign.Core.Elements;
using LevelDesign.Core.Kinds;

namespace LevelDesign.Core.DeviceFiles;

/// <summary>
/// Reads one [elements.ID] table into an <see cref="Element"/>: finds its kind in <see cref="ElementKindCatalog"/>,
/// checks the keys the kind accepts, the kept levels and basis size, and lets the kind read its values. Every
/// problem is reported at the value that causes it.
/// </summary>
public static class ElementReader
{
    public sealed record Result(Element? Element, int? Levels, int? BasisSize);

    public static Result Read(string id, SourceTable table, SourceTable? operators, ErrorList errors, double? ecFromMatrix)
    {
        string path = "elements." + id;
        var names = ElementKindCatalog.Names;
        var kindEntry = table.Find("kind");
        if (kindEntry is null)
        {
            errors.At(table, path + ".kind", $"missing required value 'kind' (one of: {string.Join(", ", names)})");
            return new Result(null, null, null);
        }
        string kindText = kindEntry.Value.Text ?? "";
        var kind = kindEntry.Value.Kind == SourceValueKind.String ? ElementKindCatalog.Named(kindText) : null;
        if (kind is null)
        {
            errors.At(kindEntry.Value, path + ".kind",
                $"unknown element kind '{kindText}'{EditDistance.Suggestion(kindText, names)} (expected one of: {string.Join(", ", names)})");
            return new Result(null, null, null);
        }
        int before = errors.Count;
        var r = new TableReader(table, path, errors, kind.FileKeys.ToHashSet());
        int? levels = r.Integer("levels", 2, 1000);
        int? basis = kind.MaxBasisSize is int most ? r.Integer("basis_size", 3, most) : null;
        var element = kind.Read(new ElementInput(id, r, ecFromMatrix, levels, operators));
        if (errors.Count > before) element = null;
        return new Result(element, levels, basis);
    }
}
