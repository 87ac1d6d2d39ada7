using LevelDesign.Core.Composite;
using LevelDesign.Core.Model;

namespace LevelDesign.Ui.Text;

/// <summary>Bare product labels as designers read them (Core.Presentation.StateNames): "qa1 ra1", "q2:1", "ground".</summary>
public static class LabelNames
{
    public static string Of(Device device, IReadOnlyList<int> levels) =>
        Core.Presentation.StateNames.Of(device.Elements.Select(e => e.Id).ToArray(), levels);

    public static string OfDressed(DressedSpectrum spectrum, int dressedIndex) =>
        Of(spectrum.Device, spectrum.LabelLevels(dressedIndex));

    public static string OfBare(DressedSpectrum spectrum, int bareIndex) =>
        Of(spectrum.Device, spectrum.Basis.States[bareIndex]);
}
