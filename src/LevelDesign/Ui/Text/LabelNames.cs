using LevelDesign.Core.Composite;
using LevelDesign.Core.Model;

namespace LevelDesign.Ui.Text;

/// <summary>Bare product labels as designers read them: "qa1 ra1", "ground" for all zeros.</summary>
public static class LabelNames
{
    public static string Of(Device device, IReadOnlyList<int> levels)
    {
        var parts = new List<string>();
        for (int i = 0; i < levels.Count; i++)
            if (levels[i] > 0) parts.Add(device.Elements[i].Id + levels[i]);
        return parts.Count == 0 ? "ground" : string.Join(" ", parts);
    }

    public static string OfDressed(DressedSpectrum spectrum, int dressedIndex) =>
        Of(spectrum.Device, spectrum.LabelLevels(dressedIndex));

    public static string OfBare(DressedSpectrum spectrum, int bareIndex) =>
        Of(spectrum.Device, spectrum.Basis.States[bareIndex]);
}
