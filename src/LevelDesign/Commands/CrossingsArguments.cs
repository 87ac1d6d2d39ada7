namespace LevelDesign.Commands;

/// <summary>The options of <c>leveldesign crossings</c>, as typed.</summary>
public sealed record CrossingsArguments : SweepAxesArguments
{
    /// <summary>--near: operating points (names or values of the swept bias) to rank by.</summary>
    public string[]? Near { get; init; }

    /// <summary>--min-gap: the smallest gap kept, as typed (e.g. 1MHz).</summary>
    public string? MinGap { get; init; }

    /// <summary>--max-gap: the largest gap kept, as typed (default 500MHz).</summary>
    public string? MaxGap { get; init; }

    /// <summary>--levels: lowest labelled states searched for crossings with each other.</summary>
    public int? Levels { get; init; }

    /// <summary>--labels: 'character' or 'order'.</summary>
    public string? Labels { get; init; }

    /// <summary>--json: the crossings as JSON.</summary>
    public bool Json { get; init; }

    /// <summary>--csv: the crossings as CSV.</summary>
    public bool Csv { get; init; }
}
