namespace LevelDesign.Commands;

/// <summary>The options of <c>leveldesign solve</c>, as typed.</summary>
/// <remarks>--vary is the range BIAS=START:STOP[:SCAN] to search (one axis); --link moves other values with it; no --sweep.</remarks>
public sealed record SolveArguments : SweepAxesArguments
{
    /// <summary>--target: QUANTITY=VALUE.</summary>
    public string? Target { get; init; }

    /// <summary>--levels: dressed states solved at each scan point.</summary>
    public int? Levels { get; init; }

    /// <summary>--json: the roots as JSON.</summary>
    public bool Json { get; init; }

    /// <summary>--purity: roots whose states are less pure than this are listed as hybridized.</summary>
    public double? Purity { get; init; }
}
