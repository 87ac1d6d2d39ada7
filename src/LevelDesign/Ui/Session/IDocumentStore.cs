using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Model;

namespace LevelDesign.Ui.Session;

/// <summary>
/// Everything the terminal UI asks of device files, in one thin seam. The default implementation
/// (<see cref="DeviceDocumentStore"/>) forwards to <see cref="DeviceDocument"/>; tests plug in a fake.
/// Structural edits return an error text instead of throwing when the file layer cannot do them.
/// </summary>
public interface IDocumentStore
{
    DeviceLoadResult Load(string path);
    DeviceLoadResult Parse(string text, string path);
    DeviceDocument Demo();
    DeviceDocument? WithValue(DeviceDocument document, string fieldPath, string text, out string? error);
    string ToText(DeviceDocument document);
    void Save(DeviceDocument document, string path);

    /// <summary>The device with named biases or parameter paths set (for sweeps).</summary>
    Device At(DeviceDocument document, IReadOnlyDictionary<string, double> values);

    DeviceDocument? AddElement(DeviceDocument document, string kindKey, string id, out string? error);
    DeviceDocument? AddCoupler(DeviceDocument document, string kindKey, string id, string elementA, string elementB, string strengthText, out string? error);
    DeviceDocument? Remove(DeviceDocument document, string id, out string? error);
    DeviceDocument? Rename(DeviceDocument document, string oldId, string newId, out string? error);
}
