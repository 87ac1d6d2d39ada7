using LevelDesign.Core.DeviceFiles.Source;
using LevelDesign.Core.Elements;
using LevelDesign.Core.Kinds;
using LevelDesign.Core.Model;

namespace LevelDesign.Core.DeviceFiles;

/// <summary>
/// Diagonalises every element at the reference point while reading, so that what only the bare spectra can tell (a
/// basis that does not converge, levels a solver cannot give) is reported at the element's own table with line and
/// column instead of failing later without a location.
/// </summary>
internal static class BareSpectrumCheck
{
    /// <returns>The spectra solved, by element, for the g conversions that follow (so no element is solved twice).</returns>
    public static Dictionary<Element, BareSpectrum> Run(Device device, IReadOnlyList<(string Id, SourceTable Table)> elementTables, ErrorList errors)
    {
        var tables = elementTables.ToDictionary(t => t.Id, t => t.Table);
        var solved = new Dictionary<Element, BareSpectrum>();
        foreach (var element in device.Elements)
        {
            try
            {
                solved[element] = element.Diagonalise(device.Truncation.LevelsOf(element.Id), device.Truncation.BasisSizeOf(element.Id));
            }
            catch (Exception e) when (e is not OutOfMemoryException)   // any failure of a bare solve is a located input error, never a crash
            {
                if (!tables.TryGetValue(element.Id, out var table)) continue;
                var at = (e is ElementLimitException limit ? KeyGiving(element, limit.Parameter, table) : null)
                         ?? table.Find("levels") ?? table.Find("basis_size");
                string field = $"elements.{element.Id}" + (at is null ? "" : "." + at.Key);
                string message = e.Message.StartsWith("element '") ? e.Message : $"element '{element.Id}': {e.Message}";
                if (at is not null) errors.At(at, field, message);
                else errors.At(table, field, message);
            }
        }
        return solved;
    }

    /// <summary>The key in the element's table that gives a model parameter: itself, or a circuit form (ic, rn, ej1 …).</summary>
    private static SourceEntry? KeyGiving(Element element, string parameter, SourceTable table) =>
        table.Find(parameter) ?? ElementKindCatalog.Of(element).Keys.Where(k => k.Gives.Contains(parameter))
            .Select(k => table.Find(k.Name)).FirstOrDefault(e => e is not null);
}
