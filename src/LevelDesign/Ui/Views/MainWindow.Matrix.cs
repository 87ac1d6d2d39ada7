using LevelDesign.Core.Analysis;
using LevelDesign.Core.Composite;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Model;
using LevelDesign.Ui.Session;
using LevelDesign.Ui.Text;

namespace LevelDesign.Ui.Views;

/// <summary>The matrix-elements page: ⟨i|op|j⟩ of one element operator between dressed states at the cursor.</summary>
public sealed partial class MainWindow
{
    /// <summary>The operator chosen with Enter as "element.operator"; null: the board's element, its charge operator.</summary>
    private string? _matrixOperator;

    /// <summary>The element and operator the page shows: the chosen one while it exists, else a default.</summary>
    public (string Element, string Operator)? MatrixOperator(Device device)
    {
        if (_matrixOperator is string chosen && Split(chosen) is var (e, o) && device.IndexOf(e) is int i and >= 0
            && device.Elements[i].OperatorNames.Contains(o))
            return (e, o);
        if (device.Elements.Count == 0) return null;
        var element = SelectedItemId(BoardNodeKind.Element) is string id && device.IndexOf(id) >= 0
            ? device.Elements[device.IndexOf(id)] : device.Elements[0];
        string op = element.OperatorNames.Contains("n") ? "n" : element.OperatorNames[0];
        return (element.Id, op);
    }

    private static (string Element, string Operator)? Split(string text)
    {
        int dot = text.IndexOf('.');
        return dot > 0 && dot < text.Length - 1 ? (text[..dot].Trim(), text[(dot + 1)..].Trim()) : null;
    }

    private IReadOnlyList<TextLine> MatrixPage(int width)
    {
        var shown = Shown;
        if (shown is null) return [new TextLine(_point.IsComputing ? "⟳ computing…" : "nothing computed yet")];
        var spectrum = shown.Spectrum;
        string where = Where();
        // module-size sweeps keep no eigenvectors per point; the file's biases always have them
        if (!spectrum.HasVectors)
        {
            if (_point.Snapshot is not { Spectrum.HasVectors: true } fileSnapshot)
                return TextFit.Wrap("no eigenvectors were kept for this point, so its matrix elements cannot be formed", width).Select(l => new TextLine(l)).ToList();
            spectrum = fileSnapshot.Spectrum;
            where = "the biases in the file (this sweep point kept no eigenvectors)";
        }
        if (MatrixOperator(spectrum.Device) is not var (element, op)) return [new TextLine("the device has no elements")];
        int n = MatrixElementsText.StatesThatFit(spectrum, width);
        var matrix = DressedMatrixElements.Matrix(spectrum, element, op, Enumerable.Range(0, n).ToArray());
        return MatrixElementsText.Build(spectrum, element, op, matrix, where, width, Threshold);
    }

    private void AskMatrixOperator()
    {
        if (Shown?.Spectrum.Device is not { } device) { Say("nothing computed yet"); return; }
        var current = MatrixOperator(device);
        string initial = current is var (e, o) ? $"{e}.{o}" : "";
        string offers = current is var (element, _) ? $"; {element} offers {string.Join(", ", device.Elements[device.IndexOf(element)].OperatorNames)}" : "";
        _prompt.Ask($"matrix elements of ELEMENT.OPERATOR{offers}", initial, text =>
        {
            if (Split(text) is not var (id, op)) return $"'{text}': write ELEMENT.OPERATOR, e.g. {initial}";
            int index = device.IndexOf(id);
            if (index < 0)
                return $"no element '{id}'{EditDistance.Suggestion(id, device.Elements.Select(x => x.Id).ToList())}";
            var names = device.Elements[index].OperatorNames;
            if (!names.Contains(op)) return $"{id} has no operator '{op}' (it offers {string.Join(", ", names)})";
            _matrixOperator = $"{id}.{op}";
            RefreshPage();
            return null;
        });
    }
}
