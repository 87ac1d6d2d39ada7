using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Model;

namespace LevelDesign.Ui.Session;

/// <summary>
/// Forwards to the <see cref="DeviceDocument"/> contract. The contract has no structural edits yet
/// (add, remove, rename), so those answer with a reason rather than pretending.
/// </summary>
public sealed class DeviceDocumentStore : IDocumentStore
{
    private const string NoStructuralEdits =
        "the device file layer cannot add, remove or rename yet; edit the file and reload (Ctrl+L)";

    public DeviceLoadResult Load(string path) => DeviceDocument.Load(path);
    public DeviceLoadResult Parse(string text, string path) => DeviceDocument.Parse(text, path);
    public DeviceDocument Demo() => DeviceDocument.Demo();

    public DeviceDocument? WithValue(DeviceDocument document, string fieldPath, string text, out string? error)
    {
        var next = document.WithValue(fieldPath, text, out var fileError);
        error = fileError?.Message;
        return fileError is null ? next : null;
    }

    public string ToText(DeviceDocument document) => document.ToText();
    public void Save(DeviceDocument document, string path) => document.Save(path);
    public Device At(DeviceDocument document, IReadOnlyDictionary<string, double> values) => document.At(values);

    public DeviceDocument? AddElement(DeviceDocument document, string kindKey, string id, out string? error)
    {
        error = NoStructuralEdits;
        return null;
    }

    public DeviceDocument? AddCoupler(DeviceDocument document, string kindKey, string id, string elementA, string elementB, string strengthText, out string? error)
    {
        error = NoStructuralEdits;
        return null;
    }

    public DeviceDocument? Remove(DeviceDocument document, string id, out string? error)
    {
        error = NoStructuralEdits;
        return null;
    }

    public DeviceDocument? Rename(DeviceDocument document, string oldId, string newId, out string? error)
    {
        error = NoStructuralEdits;
        return null;
    }
}
