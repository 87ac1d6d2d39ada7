namespace LevelDesign.Commands;

/// <summary>The options of <c>leveldesign effective</c>, as typed.</summary>
public sealed record EffectiveArguments : DeviceArguments
{
    /// <summary>--pair QA:QB: the qubit pairs (default: every coupled pair).</summary>
    public string[]? Pairs { get; init; }

    /// <summary>--purity: the computational weight below which a result is ill-conditioned.</summary>
    public double? Purity { get; init; }

    /// <summary>--json: the result as JSON.</summary>
    public bool Json { get; init; }
}
