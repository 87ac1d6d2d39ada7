using ScottPlot;

namespace LevelDesign.Plots;

/// <summary>
/// One colour per bare state, handed out in order of first use from a 20-colour palette (distinct hues first), and the
/// blend of a level's two main characters by weight: a pure state has its own colour, a 50/50 mix the midpoint.
/// </summary>
public sealed class CharacterColours
{
    private static readonly Color[] Palette = new ScottPlot.Palettes.Category20().Colors;
    /// <summary>Share of the second character below which a line keeps its first character's colour.</summary>
    public const double MixingShown = 0.02;

    private readonly Dictionary<string, (int[] Levels, Color Colour)> _assigned = new();

    /// <summary>Every character that gave a colour, in the order they were first seen (for the legend).</summary>
    public IEnumerable<(int[] Levels, Color Colour)> Used => _assigned.Values;

    public Color Of(int[] levels)
    {
        string key = string.Join(",", levels);
        if (!_assigned.TryGetValue(key, out var entry))
        {
            // even indices first: Category20 pairs a dark and a light shade of each hue
            int n = _assigned.Count % Palette.Length;
            int index = n < 10 ? 2 * n : 2 * (n - 10) + 1;
            entry = (levels, Palette[index]);
            _assigned[key] = entry;
        }
        return entry.Colour;
    }

    public Color Blend(Character character)
    {
        var first = Of(character.First);
        // a trace of another state does not colour the line (nor enter the legend); a real admixture does
        if (character.Second is null || character.SecondWeight < MixingShown * (character.FirstWeight + character.SecondWeight)) return first;
        var second = Of(character.Second);
        double fraction = character.SecondWeight / (character.FirstWeight + character.SecondWeight);
        return first.MixedWith(second, fraction);
    }
}
