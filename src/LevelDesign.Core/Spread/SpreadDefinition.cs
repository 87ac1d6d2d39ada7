namespace LevelDesign.Core.Spread;

/// <summary>A device file's [spread] and [rules] tables: how many samples, the seed, the spread groups and the rules.</summary>
public sealed record SpreadDefinition(int Samples, ulong Seed, IReadOnlyList<SpreadGroup> Groups, IReadOnlyList<SpreadRule> Rules)
{
    public const int DefaultSamples = 200;
    public const ulong DefaultSeed = 1;

    /// <summary>Every spread parameter path, in the order groups and their parameters are written.</summary>
    public IReadOnlyList<string> Paths => Groups.SelectMany(g => g.Paths).ToArray();
}
