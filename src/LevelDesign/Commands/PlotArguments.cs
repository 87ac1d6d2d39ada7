namespace LevelDesign.Commands;

/// <summary>The options of <c>leveldesign plot</c>, as typed.</summary>
public sealed record PlotArguments : SweepAxesArguments
{
    /// <summary>--out: the picture, PATH.svg or PATH.png.</summary>
    public string? Output { get; init; }

    /// <summary>--manifold: 1, 2 or all.</summary>
    public string? Manifold { get; init; }

    /// <summary>--width in pixels.</summary>
    public int? Width { get; init; }

    /// <summary>--height in pixels.</summary>
    public int? Height { get; init; }

    /// <summary>--levels: lowest labelled states drawn and searched for crossings.</summary>
    public int? Levels { get; init; }

    /// <summary>--labels: 'character' or 'order'.</summary>
    public string? Labels { get; init; }

    /// <summary>--quantity: quantities drawn instead of the spectrum (repeatable or comma-separated).</summary>
    public string[]? Quantities { get; init; }
}
