using LevelDesign.Core.Composite;

namespace LevelDesign.Plots;

/// <summary>
/// What a dressed level is made of, for colouring: its dominant bare state and the runner-up with their weights
/// (the rest of the weight is ignored for the colour), and the dominant state's excitation number.
/// </summary>
public sealed record Character(int[] First, double FirstWeight, int[]? Second, double SecondWeight)
{
    public int Excitations => First.Sum();

    public static Character Of(DressedSpectrum spectrum, int dressedIndex)
    {
        var components = spectrum.Labels[dressedIndex].Components;
        if (components.Count == 0) return new Character(spectrum.LabelLevels(dressedIndex), 1, null, 0);
        var ordered = components.OrderByDescending(c => c.Weight).ToArray();
        var first = spectrum.Basis.States[ordered[0].BareIndex];
        return ordered.Length > 1
            ? new Character(first, ordered[0].Weight, spectrum.Basis.States[ordered[1].BareIndex], ordered[1].Weight)
            : new Character(first, ordered[0].Weight, null, 0);
    }
}
